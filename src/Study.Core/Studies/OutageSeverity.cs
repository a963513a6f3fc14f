// The severity score that ranks outages: no convergence, then lost load, then the size of new violations.
namespace Study.Core.Studies;

/// <summary>
/// Severity of one outage, in three tiers so that a worse kind of consequence always outranks a
/// milder one, however large the milder one is:
/// <list type="bullet">
/// <item>1000 — the load flow does not converge with the element out (nothing else is known).</item>
/// <item>100 + 899 × (lost load ÷ the scenario's intact load) — load is lost (its island has no source):
/// 100 for a sliver, 999 for the whole system.</item>
/// <item>min(stress, 99.9) — otherwise, where stress is the sum over new or worsened violations of the
/// overload above 100 % (percent of rating) and of the voltage outside the band (percent of nominal,
/// 100 × |V − limit|), so 1 % overload and 1 % voltage excursion weigh alike.</item>
/// </list>
/// 0 means secure: nothing new breaks. Outages with equal severity rank by stress.
/// </summary>
public static class OutageSeverity
{
    public const double NoConvergence = 1000;
    public const double LostLoadBase = 100;
    public const double LostLoadSpan = 899;
    public const double StressCap = 99.9;

    public static double Score(bool converged, double lostLoadMw, double intactLoadMw, double stressPercent)
    {
        if (!converged) return NoConvergence;
        if (lostLoadMw > 1e-6)
        {
            double share = intactLoadMw > 0 ? Math.Clamp(lostLoadMw / intactLoadMw, 0, 1) : 1;
            return LostLoadBase + LostLoadSpan * share;
        }
        return Math.Min(stressPercent, StressCap);
    }

    /// <summary>How far one violation lies outside its limit, percent (of rating or of nominal voltage).</summary>
    public static double Excursion(OutageViolation v) => v.Type switch
    {
        LoadFlow.ViolationKind.Overload => v.Value - v.Limit,
        LoadFlow.ViolationKind.Low or LoadFlow.ViolationKind.High => 100 * Math.Abs(v.Value - v.Limit),
        _ => 0,
    };
}
