// Fixed shunts (capacitor banks, reactors) to per-unit admittance at 1 pu voltage.
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>Shunt admittance G + jB in pu on the system base; B &gt; 0 is capacitive.</summary>
public sealed record ShuntConversionResult(double G, double B, IReadOnlyList<DerivationStep> Steps);

/// <summary>
/// A shunt rated at 1 pu voltage draws S = V²·Y*, so at V = 1: G = P / S_base and B = Q / S_base,
/// with Q &gt; 0 a capacitor supplying vars.
/// </summary>
public static class ShuntConversion
{
    public static ShuntConversionResult Convert(Shunt shunt, double baseMva, bool recordSteps = true)
    {
        var d = new Derivation(recordSteps);
        double g = d.Step("G", $"pMw / S_base = {N(shunt.PMw)} / {N(baseMva)}", shunt.PMw / baseMva, "pu");
        double b = d.Step("B", $"qMvar / S_base = {N(shunt.QMvar)} / {N(baseMva)} (> 0 capacitive)", shunt.QMvar / baseMva, "pu");
        return new ShuntConversionResult(g, b, d.ToList());
    }
}
