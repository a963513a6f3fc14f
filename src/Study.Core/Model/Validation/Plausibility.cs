// Values that are valid numbers but far outside what plant has: most often a unit slip (VA for MVA,
// mΩ for Ω, per unit for percent) or a branch that should be a bus merge. Each finding is a warning
// that names the element, the key and the likely cause, so a confident wrong answer is never silent.
namespace Study.Core.Model.Validation;

internal static class Plausibility
{
    /// <summary>
    /// Below this on the system base a branch is a busbar joint, not a branch: its admittance is a
    /// million times a typical one, and a mismatch of 1e-8 pu is then below what double precision
    /// resolves across it, so Newton-Raphson stalls.
    /// </summary>
    public const double NearZeroPu = 1e-6;

    /// <summary>
    /// Above this on the system base a branch carries next to nothing (an open circuit in effect). A
    /// long 0.4 kV cable on a 100 MVA base reaches about 2000 pu, so this is beyond any real branch.
    /// </summary>
    public const double FarAbovePu = 1e4;

    /// <summary>Largest system base accepted: bases are 1 to 1000 MVA in practice (100 is usual).</summary>
    public const double HighestBaseMva = 10_000;

    /// <summary>More identical units than any substation has in one bank.</summary>
    public const int MostUnits = 100;

    /// <summary>A branch's series impedance magnitude on the system base against the two limits above.</summary>
    public static void SeriesOnSystemBase(ElementScope at, string field, double zPu)
    {
        if (!double.IsFinite(zPu) || zPu == 0) return;
        if (zPu < NearZeroPu)
            at.Warning(field, $"series impedance {Numbers.Show(zPu)} pu on the system base is next to nothing: the load flow " +
                "cannot resolve a branch this short and will stall; merge its two buses into one (a closed breaker or a " +
                "busbar joint needs no branch), or check the value and its unit");
        else if (zPu > FarAbovePu)
            at.Warning(field, $"series impedance {Numbers.Show(zPu)} pu on the system base is far above any branch " +
                "(it carries next to nothing): check the value and its unit");
    }

    /// <summary>|r + jx| on the system base of a line block, or null when it cannot be formed (no kV, no km).</summary>
    public static double? LineOnSystemBase(SequenceImpedance z, double? km, Bus? from, double baseMva)
    {
        double ohmOrPu = Math.Sqrt(z.R * z.R + z.X * z.X);
        if (z.Per == ImpedanceBasis.PerUnit) return ohmOrPu;
        if (from is not { Kv: > 0 } || !(baseMva > 0) || !double.IsFinite(baseMva)) return null;
        double zBase = from.Kv * from.Kv / baseMva;
        if (z.Per == ImpedanceBasis.WholeLine) return ohmOrPu / zBase;
        return km is double length && length > 0 ? ohmOrPu * length / zBase : null;
    }

    /// <summary>A per-km value against the range of real lines and cables, saying which unit it probably is in.</summary>
    public static void PerKm(ElementScope at, string key, SequenceImpedance z)
    {
        if (z.Per != ImpedanceBasis.PerKm) return;
        // Overhead lines have x about 0.3 to 0.45 Ω/km and cables 0.07 to 0.2; r reaches about 5 Ω/km
        // for the smallest LV cables (common practice, manufacturers' tables).
        if (Math.Abs(z.X) > 3)
            at.Warning($"{key}.x", $"{key}.x {Numbers.Show(z.X)} Ω/km is far above any line or cable (0.07 to 0.45 Ω/km): " +
                "is it in mΩ/km, or the whole line's ohms (give \"per\": \"line\")?");
        if (Math.Abs(z.R) > 20)
            at.Warning($"{key}.r", $"{key}.r {Numbers.Show(z.R)} Ω/km is far above any line or cable (0.01 to 5 Ω/km): " +
                "is it in mΩ/km, or the whole line's ohms (give \"per\": \"line\")?");
    }

    /// <summary>A nameplate impedance in percent against the range transformers are built with.</summary>
    public static void Percent(ElementScope at, string field, double? zPercent)
    {
        if (zPercent is not double z || !double.IsFinite(z) || z <= 0) return;
        // Power transformers are built with 2 to 25 % (IEC 60076-5 minimum values start at 4 % for
        // units above 630 kVA, from memory); outside 0.5 to 50 % the figure is in another unit.
        if (z < 0.5)
            at.Warning(field, $"{field} {Numbers.Show(z)} % is far below any transformer (4 to 20 % is usual): " +
                $"is it per unit rather than percent ({Numbers.Show(z)} pu = {Numbers.Show(z * 100)} %)?");
        else if (z > 50)
            at.Warning(field, $"{field} {Numbers.Show(z)} % is far above any transformer (4 to 20 % is usual): check the value");
    }

    /// <summary>The number of identical units in a bank.</summary>
    public static void Units(ElementScope at, int units)
    {
        if (units > MostUnits)
            at.Warning("units", $"units {Numbers.Show(units)} is more identical units than any bank has (1 to 4 is usual): " +
                "the bank's impedance is divided by it; check the value");
    }

    /// <summary>A rated or base kV against the kV of a neighbouring bus (a line's other end, a machine's bus).</summary>
    public static string KvHint(double kv, double neighbourKv) =>
        Numbers.Factor(kv, neighbourKv) is double f && f > 500 && f < 2000
            ? "; the two differ by a factor of about 1000, so one of them is probably in V or MV rather than kV"
            : "";
}
