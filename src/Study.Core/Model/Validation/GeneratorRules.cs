// Generator checks: control mode set points, reactive limits and the fault-study data.
namespace Study.Core.Model.Validation;

internal static class GeneratorRules
{
    /// <summary>A machine runs within ±10 % of its rating; beyond 20 % from the bus kV the data disagree.</summary>
    private const double KvMismatch = 0.2;

    public static void Check(ValidationContext context, Generator g)
    {
        ElementScope at = context.At(ElementKind.Generator, g.Id);
        Bus? bus = at.BusRef("bus", g.Bus);
        at.AllFinite(("pMw", g.PMw), ("qMvar", g.QMvar), ("vSet", g.VSet), ("angleDeg", g.AngleDeg), ("qMinMvar", g.QMinMvar),
            ("qMaxMvar", g.QMaxMvar), ("mva", g.Mva), ("kv", g.Kv), ("xdppPu", g.XdppPu), ("x2Pu", g.X2Pu),
            ("x0Pu", g.X0Pu), ("xr", g.Xr), ("powerFactor", g.PowerFactor));
        if (g.QMinMvar > g.QMaxMvar)
            at.Error("qMinMvar", $"qMinMvar {Numbers.Show(g.QMinMvar.Value)} Mvar is above qMaxMvar " +
                $"{Numbers.Show(g.QMaxMvar.Value)} Mvar: swap them, or give 0 and 0 for \"no limits stated\"");
        // A PQ machine holds no voltage, so its vSet is never used.
        if (g.Mode != GeneratorMode.Pq) SetPoint.Check(at, g.VSet);
        if (g.Mode != GeneratorMode.Slack && g.AngleDeg is double angle && angle != 0)
            at.Warning("angleDeg", $"angleDeg {Numbers.Show(angle)}° is not used: only a slack generator holds an angle (mode is {g.Mode.ToString().ToLowerInvariant()})");
        at.Positive("mva", g.Mva, "the rated power (MVA)");
        if (at.Kv("kv", g.Kv, zeroAllowed: false) && bus is { Kv: > 0 } && bus.Kv <= ElementScope.HighestPlausibleKv
            && Numbers.RelativeDifference(g.Kv!.Value, bus.Kv) > KvMismatch)
            at.WarningUnlessUnitSlip(Plausibility.KvHint(g.Kv.Value, bus.Kv).Length > 0, "kv", $"rated kV {Numbers.Show(g.Kv.Value)} differs from bus {bus.Id} ({Numbers.Show(bus.Kv)} kV) " +
                $"{Numbers.Difference(g.Kv.Value, bus.Kv)}: is a unit transformer missing, or a kV wrong?{Plausibility.KvHint(g.Kv.Value, bus.Kv)}");
        at.Positive("xdppPu", g.XdppPu, "the subtransient reactance x''d");
        at.Positive("x2Pu", g.X2Pu, "the negative-sequence reactance");
        at.NotNegative("x0Pu", g.X0Pu, "the zero-sequence reactance");
        at.Positive("xr", g.Xr, "the X/R ratio");
        if (g.PowerFactor is double pf && double.IsFinite(pf) && (pf <= 0 || pf > 1))
            at.Error("powerFactor", $"powerFactor is {Numbers.Show(pf)}: a rated power factor lies above 0 and at most 1 (0.85 is usual)");
        EarthingRules.Check(at, "neutral", g.Neutral);
    }
}
