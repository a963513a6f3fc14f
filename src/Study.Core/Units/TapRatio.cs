// Off-nominal turns ratio of a tapped winding pair, with the steps that explain it.
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// t = (hvKv · f_hv / kV_hv bus) / (lvKv · f_lv / kV_lv bus), f = 1 + position · percentPerStep / 100
/// on the tapped winding and 1 on the other (DEVELOPERS.md, Per-unit rules). The same formula as
/// <see cref="PuTap.RatioAt"/>, which the builder checks by constructing the tap from these factors.
/// </summary>
internal static class TapRatio
{
    public static double Factor(int position, double percentPerStep) => 1.0 + position * percentPerStep / 100.0;

    /// <summary>Ratio at the tap's own position; hvFactor and lvFactor are rated kV over bus kV.</summary>
    public static double Compute(Derivation d, TapChanger? tap, double hvFactor, double lvFactor)
    {
        if (tap is null)
            return d.Step("t", $"(hvKv / kV_hv bus) / (lvKv / kV_lv bus) = {N(hvFactor)} / {N(lvFactor)}", hvFactor / lvFactor, "pu");
        double f = d.Step("tap factor", $"1 + position · percentPerStep / 100 = 1 + {tap.Position} · {N(tap.PercentPerStep)} / 100",
            Factor(tap.Position, tap.PercentPerStep), "pu");
        return tap.Winding == TapWinding.Lv
            ? d.Step("t", $"(hvKv / kV_hv bus) / (lvKv · f / kV_lv bus) = {N(hvFactor)} / ({N(lvFactor)} · {N(f)})", hvFactor / (lvFactor * f), "pu")
            : d.Step("t", $"(hvKv · f / kV_hv bus) / (lvKv / kV_lv bus) = {N(hvFactor)} · {N(f)} / {N(lvFactor)}", hvFactor * f / lvFactor, "pu");
    }
}
