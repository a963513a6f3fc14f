// Rated winding kV against the base kV of the bus each winding connects to.
namespace Study.Core.Model.Validation;

/// <summary>One transformer winding: its rated-kV key and value, and the bus it is connected to.</summary>
internal readonly record struct Winding(string Side, string KvField, double? RatedKv, Bus? Bus);

internal static class WindingKvRules
{
    /// <summary>More than this between rated and base kV is worth a warning; tap ranges stay well inside it.</summary>
    private const double Tolerance = 0.2;

    /// <summary>
    /// Nameplate data on a bus with no base kV is an error (its ratio cannot be formed); a winding far
    /// from its bus's kV is a warning (an error when about 1000 times off: a unit slip), saying so when it matches another winding's bus (swapped sides).
    /// Returns true when it reported swapped sides, so that callers need not say it again.
    /// </summary>
    public static bool Check(ElementScope at, string perUnitHint, params Winding[] windings)
    {
        foreach (Winding w in windings)
        {
            if (w.Bus is { Kv: 0 })
                at.Error(w.Side, $"bus {w.Bus.Id} states no base kV (kv 0), so {w.KvField} cannot be related to it: " +
                    $"give the bus its kv{perUnitHint}");
        }
        bool swapped = false;
        foreach (Winding w in windings)
        {
            if (Plausible(w.RatedKv) is not double rated || Plausible(w.Bus?.Kv) is not double busKv) continue;
            double off = Numbers.RelativeDifference(rated, busKv);
            if (off <= Tolerance) continue;
            Winding? better = null;
            double betterOff = off;
            foreach (Winding other in windings)
            {
                if (other.Side == w.Side || Plausible(other.Bus?.Kv) is not double otherKv) continue;
                double o = Numbers.RelativeDifference(rated, otherKv);
                if (o <= Tolerance && o < betterOff) (better, betterOff) = (other, o);
            }
            swapped |= better is not null;
            if (better is Winding match)
                at.Warning(w.KvField, $"likely swapped sides: {w.KvField} {Numbers.Show(rated)} kV matches {match.Side} bus " +
                    $"{match.Bus!.Id} ({Numbers.Show(match.Bus.Kv)} kV), not {w.Side} bus {w.Bus!.Id} ({Numbers.Show(busKv)} kV)");
            else if (Plausibility.KvHint(rated, busKv) is { Length: > 0 } unitSlip)
                at.Error(w.KvField, $"rated kV {Numbers.Show(rated)} against bus base kV {Numbers.Show(busKv)} (bus {w.Bus!.Id}){unitSlip}");
            else
                at.Warning(w.KvField, $"rated kV {Numbers.Show(rated)} differs from bus base kV {Numbers.Show(busKv)} " +
                    $"(bus {w.Bus!.Id}) {Numbers.Difference(rated, busKv)}: check {w.KvField} and the bus kv");
        }
        return swapped;
    }

    /// <summary>hv rated below lv rated is either a step-up bank entered backwards or a typing slip.</summary>
    public static void CheckOrder(ElementScope at, string highField, double? high, string lowField, double? low)
    {
        if (high is double h && low is double l && double.IsFinite(h) && double.IsFinite(l) && h > 0 && h < l)
            at.Warning(highField, $"{highField} {Numbers.Show(h)} kV is below {lowField} {Numbers.Show(l)} kV: sides swapped? " +
                "The hv winding is the one with the higher rated voltage");
    }

    /// <summary>The kV when it can be compared: stated, finite and not volts (those get their own error).</summary>
    private static double? Plausible(double? kv) =>
        kv is double v && double.IsFinite(v) && v > 0 && v <= ElementScope.HighestPlausibleKv ? v : null;
}
