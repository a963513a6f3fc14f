// Bus loads to per unit at 1 pu voltage, scaled by the scenario.
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>A load in pu on the system base, with its ZIP mix kept for the voltage dependence.</summary>
public sealed record LoadConversionResult(double P, double Q, ZipMix Zip, IReadOnlyList<DerivationStep> Steps);

/// <summary>P = pMw · loadScale / S_base, Q = qMvar · loadScale / S_base.</summary>
public static class LoadConversion
{
    public static LoadConversionResult Convert(Load load, double loadScale, double baseMva, bool recordSteps = true)
    {
        var d = new Derivation(recordSteps);
        d.Step("load scale", "scenario loadScale", loadScale, "");
        double p = d.Step("P", $"pMw · scale / S_base = {N(load.PMw)} · {N(loadScale)} / {N(baseMva)}", load.PMw * loadScale / baseMva, "pu");
        double q = d.Step("Q", $"qMvar · scale / S_base = {N(load.QMvar)} · {N(loadScale)} / {N(baseMva)}", load.QMvar * loadScale / baseMva, "pu");
        ZipMix zip = load.Zip ?? ZipMix.ConstantPower;
        if (load.Zip is null)
            d.Assumed("ZIP", "z 0, i 0, p 1", 1.0, "", "zip not given: constant power (default)");
        else
            d.Step("ZIP", $"z {N(zip.Z)}, i {N(zip.I)}, p {N(zip.P)}", zip.Z + zip.I + zip.P, "");
        return new LoadConversionResult(p, q, zip, d.ToList());
    }
}
