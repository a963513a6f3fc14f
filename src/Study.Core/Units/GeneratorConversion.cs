// Generator set points and sequence reactances to the system base.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// A generator on the system base: load-flow set points and, when x''d is given, its subtransient
/// sequence impedances (null otherwise; Z0 null when x0 is not given).
/// </summary>
public sealed record GeneratorConversionResult(
    double P, double Q, double VSet, double AngleRad, double? QMin, double? QMax,
    Complex? Z1Pu, Complex? Z2Pu, Complex? Z0Pu, IReadOnlyList<DerivationStep> Steps);

/// <summary>
/// P, Q in MW/Mvar over S_base; reactances on the machine rating changed to the system base by
/// z_sys = z · (S_base / S_rG) · (U_rG / U_bus)² (base change, common practice).
/// </summary>
public static class GeneratorConversion
{
    /// <param name="generationScale">Scenario scale on active power; not applied to a slack generator.</param>
    public static GeneratorConversionResult Convert(Generator g, Bus bus, double baseMva, double generationScale = 1.0, bool recordSteps = true)
    {
        var d = new Derivation(recordSteps);
        double scale = g.Mode == GeneratorMode.Slack ? 1.0 : generationScale;
        double p = scale == 1.0
            ? d.Step("P", $"pMw / S_base = {N(g.PMw)} / {N(baseMva)}", g.PMw / baseMva, "pu")
            : d.Step("P", $"pMw · generationScale / S_base = {N(g.PMw)} · {N(scale)} / {N(baseMva)}", g.PMw * scale / baseMva, "pu");
        double q = d.Step("Q", $"qMvar / S_base = {N(g.QMvar)} / {N(baseMva)}", g.QMvar / baseMva, "pu");
        double vSet = d.Step("V_set", "vSet given", g.VSet, "pu");
        // Only a slack source holds an angle: the island's reference, so every angle reported is measured from it.
        double angle = g.Mode == GeneratorMode.Slack
            ? d.Step("angle", $"angleDeg · π / 180 = {N(g.AngleDeg ?? 0)} · π / 180 (the island's reference angle)",
                (g.AngleDeg ?? 0) * Math.PI / 180.0, "rad")
            : 0.0;

        // Q limits of 0 and 0 mean "no limits stated" (README, Network files).
        bool noLimits = g.QMinMvar is null or 0 && g.QMaxMvar is null or 0;
        double? qMin = noLimits || g.QMinMvar is null ? null
            : d.Step("Q_min", $"qMinMvar / S_base = {N(g.QMinMvar.Value)} / {N(baseMva)}", g.QMinMvar.Value / baseMva, "pu");
        double? qMax = noLimits || g.QMaxMvar is null ? null
            : d.Step("Q_max", $"qMaxMvar / S_base = {N(g.QMaxMvar.Value)} / {N(baseMva)}", g.QMaxMvar.Value / baseMva, "pu");

        Complex? z1 = null, z2 = null, z0 = null;
        if (g.XdppPu is double xdpp && g.Mva is double mva && mva > 0)
        {
            double voltage = 1.0;
            if (g.Kv is double kv && kv > 0 && bus.Kv > 0)
                voltage = d.Step("voltage factor", $"(kv / kV_bus)² = ({N(kv)} / {N(bus.Kv)})²", Math.Pow(kv / bus.Kv, 2), "");
            else
                d.Assumed("voltage factor", "= 1", 1.0, "", "rated kV or bus kV not stated: machine taken at the bus base voltage");
            double k = d.Step("base change", $"S_base / mva · voltage factor = {N(baseMva)} / {N(mva)} · {N(voltage)}", baseMva / mva * voltage, "");
            double rOverX = ROverX(d, g, mva);
            z1 = Reactance(d, "x''d", xdpp, rOverX, k);
            z2 = g.X2Pu is double x2
                ? Reactance(d, "x2", x2, rOverX, k)
                : Assumed(d, z1.Value, "x2 not given: taken equal to x''d (default, not data)");
            if (g.X0Pu is double x0) z0 = Reactance(d, "x0", x0, rOverX, k);
        }
        return new GeneratorConversionResult(p, q, vSet, angle, qMin, qMax, z1, z2, z0, d.ToList());
    }

    /// <summary>
    /// R/X from the given X/R, else the fictitious resistance of IEC 60909-0 (from memory):
    /// R_Gf = 0.05·X''d above 1 kV and ≥ 100 MVA, 0.07·X''d above 1 kV below 100 MVA, 0.15·X''d at or below 1 kV.
    /// </summary>
    private static double ROverX(Derivation d, Generator g, double mva)
    {
        if (g.Xr is double xr && xr > 0)
            return d.Step("R/X", $"1 / xr = 1 / {N(xr)}", 1.0 / xr, "");
        double fictitious = g.Kv is double kv && kv <= 1.0 ? 0.15 : mva >= 100 ? 0.05 : 0.07;
        return d.Assumed("R/X", $"= {N(fictitious)}", fictitious, "", "xr not given: fictitious R_Gf of IEC 60909-0 assumed (from memory)");
    }

    private static Complex Reactance(Derivation d, string name, double xOwn, double rOverX, double k)
    {
        double x = d.Step(name, $"{name} · factor = {N(xOwn)} · {N(k)}", xOwn * k, "pu");
        double r = d.Step($"r ({name})", $"{name} · R/X = {N(x)} · {N(rOverX)}", x * rOverX, "pu");
        return new Complex(r, x);
    }

    private static Complex Assumed(Derivation d, Complex z, string note)
    {
        d.Assumed("x2", $"= x''d = {N(z.Imaginary)}", z.Imaginary, "pu", note);
        return z;
    }
}
