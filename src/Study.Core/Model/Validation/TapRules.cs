// Tap changer checks: range, step, position, and the on-load regulation band.
namespace Study.Core.Model.Validation;

internal static class TapRules
{
    /// <summary>Steps above this are rare (0.6 to 2.5 % is usual); a larger figure is often the whole range.</summary>
    private const double LargestUsualStepPercent = 5;

    /// <summary>On-load changers have up to about 35 positions (±16 is common); far more is a slip in the range.</summary>
    private const int MostUsualPositions = 100;

    public static void Check(ElementScope at, TapChanger? tap, bool hasMvWinding)
    {
        if (tap is null) return;
        if (tap.Winding == TapWinding.Mv && !hasMvWinding)
            at.Error("tap.winding", "tap.winding is mv, but a two-winding transformer has only hv and lv windings");
        at.AllFinite(("tap.percentPerStep", tap.PercentPerStep));
        (int lowest, int highest) = (tap.Range.Lowest, tap.Range.Highest);
        string range = $"[{Numbers.Show(lowest)}, {Numbers.Show(highest)}]";
        if (lowest > highest)
            at.Error("tap.range", $"tap.range {range} runs backwards: give the lowest position first");
        else if (!tap.Range.Contains(tap.Position))
            at.Error("tap.position", $"tap.position {Numbers.Show(tap.Position)} is outside the range {range}");
        if (lowest <= highest && (long)highest - lowest + 1 > MostUsualPositions)
            at.Warning("tap.range", $"tap.range {range} has {Numbers.Show((double)highest - lowest + 1)} positions: tap changers have up to " +
                "about 35; check the range");
        if (lowest < highest && tap.PercentPerStep <= 0)
            at.Error("tap.percentPerStep", $"tap.percentPerStep is {Numbers.Show(tap.PercentPerStep)} with a range {range}: " +
                "give the voltage change of one step in percent, above 0");
        if (double.IsFinite(tap.PercentPerStep) && tap.PercentPerStep > LargestUsualStepPercent)
            at.Warning("tap.percentPerStep", $"tap.percentPerStep {Numbers.Show(tap.PercentPerStep)} % is large for one step " +
                "(0.6 to 2.5 % is usual): is it the whole range?");
        // The tapped winding's voltage at a position is (1 + p·step/100) times rated: at or below zero
        // the ratio is not a transformer at all (the worst position is the end furthest below zero).
        if (double.IsFinite(tap.PercentPerStep) && lowest <= highest)
        {
            int worst = tap.PercentPerStep >= 0 ? lowest : highest;
            if (tap.FactorAt(worst) <= 0)
                at.Error("tap.range", $"at position {Numbers.Show(worst)} the tapped winding would be at " +
                    $"{Numbers.Show(100 * tap.FactorAt(worst))} % of its rated voltage: every position of {range} must give a ratio above 0");
        }
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
        else if (double.IsFinite(regulate.BandPu) && tap.PercentPerStep > 0 && regulate.BandPu < tap.PercentPerStep / 100)
            // One step moves the voltage by about stepPercent; a narrower band can be stepped over.
            at.Warning("tap.regulate.bandPu", $"tap.regulate.bandPu {Numbers.Show(regulate.BandPu)} pu is narrower than one " +
                $"tap step ({Numbers.Show(tap.PercentPerStep / 100)} pu): the tap may hunt between two positions");
    }
}
