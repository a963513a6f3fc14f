// Tap changer checks: range, step, position, and the on-load regulation band.
namespace Study.Core.Model.Validation;

internal static class TapRules
{
    /// <summary>Steps above this are rare (0.6 to 2.5 % is usual); a larger figure is often the whole range.</summary>
    private const double LargestUsualStepPercent = 5;

    public static void Check(ElementScope at, TapChanger? tap, bool hasMvWinding)
    {
        if (tap is null) return;
        if (tap.Side == TapSide.Mv && !hasMvWinding)
            at.Error("tap.side", "tap.side is mv, but a two-winding transformer has only hv and lv windings");
        at.AllFinite(("tap.stepPercent", tap.StepPercent));
        if (tap.Min > tap.Max)
            at.Error("tap.min", $"tap.min {Numbers.Show(tap.Min)} is above tap.max {Numbers.Show(tap.Max)}: swap them");
        else if (tap.Position < tap.Min || tap.Position > tap.Max)
            at.Error("tap.position", $"tap.position {Numbers.Show(tap.Position)} is outside the range " +
                $"{Numbers.Show(tap.Min)}..{Numbers.Show(tap.Max)}");
        if (tap.Min < tap.Max && tap.StepPercent <= 0)
            at.Error("tap.stepPercent", $"tap.stepPercent is {Numbers.Show(tap.StepPercent)} with a range " +
                $"{Numbers.Show(tap.Min)}..{Numbers.Show(tap.Max)}: give the voltage change of one step in percent, above 0");
        if (double.IsFinite(tap.StepPercent) && tap.StepPercent > LargestUsualStepPercent)
            at.Warning("tap.stepPercent", $"tap.stepPercent {Numbers.Show(tap.StepPercent)} % is large for one step " +
                "(0.6 to 2.5 % is usual): is it the whole range?");
        CheckRegulation(at, tap);
    }

    private static void CheckRegulation(ElementScope at, TapChanger tap)
    {
        if (tap.Regulate is not TapRegulation regulate) return;
        at.BusRef("tap.regulate.bus", regulate.Bus);
        at.AllFinite(("tap.regulate.vTarget", regulate.VTarget), ("tap.regulate.bandPu", regulate.BandPu));
        if (double.IsFinite(regulate.VTarget) && (regulate.VTarget < 0.8 || regulate.VTarget > 1.2))
            at.Warning("tap.regulate.vTarget", $"tap.regulate.vTarget {Numbers.Show(regulate.VTarget)} pu is outside 0.8..1.2 pu: " +
                "give the target in per unit, not kV");
        if (regulate.BandPu <= 0)
            at.Error("tap.regulate.bandPu", $"tap.regulate.bandPu is {Numbers.Show(regulate.BandPu)}: the dead band must be " +
                "wider than 0 pu, or the tap never rests");
        else if (double.IsFinite(regulate.BandPu) && tap.StepPercent > 0 && regulate.BandPu < tap.StepPercent / 100)
            // One step moves the voltage by about stepPercent; a narrower band can be stepped over.
            at.Warning("tap.regulate.bandPu", $"tap.regulate.bandPu {Numbers.Show(regulate.BandPu)} pu is narrower than one " +
                $"tap step ({Numbers.Show(tap.StepPercent / 100)} pu): the tap may hunt between two positions");
    }
}
