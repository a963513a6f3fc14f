// Line and cable checks: ends, the sequence data on its basis, and ohm values only on buses with a base kV.
namespace Study.Core.Model.Validation;

internal static class LineRules
{
    /// <summary>A line joins buses of one voltage; beyond this difference a transformer is probably missing.</summary>
    private const double KvMismatch = 0.2;

    /// <summary>Beyond this a length in km is more likely metres: AC lines stop well short of it.</summary>
    private const double LongestKm = 1500;

    public static void Check(ValidationContext context, Line line)
    {
        ElementScope at = context.At(ElementKind.Line, line.Id);
        Bus? from = at.BusRef("from", line.From);
        Bus? to = at.BusRef("to", line.To);
        at.DistinctEnds("from", line.From, "to", line.To);
        at.AllFinite(("km", line.Km), ("ratingMva", line.RatingMva));
        at.NotNegative("ratingMva", line.RatingMva, "a thermal rating (MVA)");
        at.Positive("km", line.Km, "a length (km)");

        if (line.Z1 is null)
            at.Error("z1", "gives no impedance: give z1 with per (\"km\", \"line\" or \"pu\"), r and x");
        Sequence(at, "z1", line.Z1, line.Km, positive: true);
        Sequence(at, "z0", line.Z0, line.Km, positive: false);

        bool perKm = line.Z1?.Per == ImpedanceBasis.PerKm || line.Z0?.Per == ImpedanceBasis.PerKm;
        if (!perKm && line.Km is double km && line.Z1 is not null)
            at.Warning("km", $"km {Numbers.Show(km)} is not used: the impedance is given per {(line.Z1.Per == ImpedanceBasis.PerUnit ? "unit" : "line")}, not per km");
        bool inOhm = line.Z1 is { Per: not ImpedanceBasis.PerUnit } || line.Z0 is { Per: not ImpedanceBasis.PerUnit };
        if (inOhm)
        {
            RequireBaseKv(at, "from", from);
            RequireBaseKv(at, "to", to);
        }
        if (from is { Kv: > 0 } && to is { Kv: > 0 } && Numbers.RelativeDifference(to.Kv, from.Kv) > KvMismatch)
            at.WarningUnlessUnitSlip(Plausibility.KvHint(from.Kv, to.Kv).Length > 0, "to", $"joins bus {from.Id} ({Numbers.Show(from.Kv)} kV) and bus {to.Id} ({Numbers.Show(to.Kv)} kV): " +
                $"a line joins buses of one voltage; is a transformer missing, or a bus kv wrong?{Plausibility.KvHint(from.Kv, to.Kv)}");
        if (line.Km is double length && double.IsFinite(length) && length > LongestKm)
            at.Warning("km", $"km {Numbers.Show(length)} is longer than any AC line (up to about {Numbers.Show(LongestKm)} km): is it in metres?");
        if (line.Z1 is { } z1 && Finite(z1))
        {
            Plausibility.PerKm(at, "z1", z1);
            if (Plausibility.LineOnSystemBase(z1, line.Km, from, context.Network.BaseMva) is double zPu)
                Plausibility.SeriesOnSystemBase(at, "z1", zPu);
        }
        if (line.Z0 is { } z0 && Finite(z0)) Plausibility.PerKm(at, "z0", z0);
    }

    private static bool Finite(SequenceImpedance z) => double.IsFinite(z.R) && double.IsFinite(z.X);

    /// <summary>
    /// One sequence: finite numbers; per km needs the length; charging not negative. The positive
    /// sequence then meets the zero and negative impedance rules; a zero-sequence impedance of zero is
    /// as wrong as a positive one.
    /// </summary>
    private static void Sequence(ElementScope at, string key, SequenceImpedance? z, double? km, bool positive)
    {
        if (z is null) return;
        if (!at.AllFinite(($"{key}.r", z.R), ($"{key}.x", z.X), ($"{key}.b", z.B))) return;
        if (z.Per == ImpedanceBasis.PerKm && km is null)
            at.Error("km", $"{key} is given per km but the line has no km: give the route length in km");
        if (positive)
            SeriesImpedance.Check(at, $"{key}.r", z.R, $"{key}.x", z.X);
        else if (z.R == 0 && z.X == 0)
            at.Error($"{key}.x", $"{key} is zero ({key}.r 0, {key}.x 0): give the zero-sequence impedance, or leave {key} out");
        if (z.B is double b && b < 0)
            at.Error($"{key}.b", $"{key}.b is {Numbers.Show(b)}: line charging is capacitive, give it as a positive susceptance");
    }

    /// <summary>Ohm values need Z_base = kV²/MVA of the bus (DEVELOPERS.md, Per-unit rules).</summary>
    private static void RequireBaseKv(ElementScope at, string field, Bus? bus)
    {
        if (bus is { Kv: 0 })
            at.Error(field, $"bus {bus.Id} states no base kV (kv 0), so ohm values cannot be put in per unit: " +
                "give the bus its kv, or give the line's data per unit (\"per\": \"pu\")");
    }
}
