// Line and cable checks: ends, exactly one impedance form, and ohm values only on buses with a base kV.
namespace Study.Core.Model.Validation;

internal static class LineRules
{
    /// <summary>Positive-sequence data is required; zero-sequence data is optional (fault studies only).</summary>
    private enum Sequence
    {
        Positive,
        Zero,
    }

    /// <summary>A line joins buses of one voltage; beyond this difference a transformer is probably missing.</summary>
    private const double KvMismatch = 0.2;

    public static void Check(ValidationContext context, Line line)
    {
        ElementScope at = context.At(ElementKind.Line, line.Id);
        Bus? from = at.BusRef("from", line.From);
        Bus? to = at.BusRef("to", line.To);
        at.DistinctEnds("from", line.From, "to", line.To);
        at.AllFinite(("lengthKm", line.LengthKm), ("rOhmPerKm", line.ROhmPerKm), ("xOhmPerKm", line.XOhmPerKm),
            ("bUsPerKm", line.BUsPerKm), ("r0OhmPerKm", line.R0OhmPerKm), ("x0OhmPerKm", line.X0OhmPerKm),
            ("b0UsPerKm", line.B0UsPerKm), ("rOhm", line.ROhm), ("xOhm", line.XOhm), ("bUs", line.BUs),
            ("r0Ohm", line.R0Ohm), ("x0Ohm", line.X0Ohm), ("b0Us", line.B0Us), ("rPu", line.RPu), ("xPu", line.XPu),
            ("bPu", line.BPu), ("r0Pu", line.R0Pu), ("x0Pu", line.X0Pu), ("b0Pu", line.B0Pu), ("ratingMva", line.RatingMva));
        at.NotNegative("ratingMva", line.RatingMva, "a thermal rating (MVA)");
        at.Positive("lengthKm", line.LengthKm, "a length (km)");

        var perKm = ImpedanceForm.Of("per km", ("rOhmPerKm", line.ROhmPerKm), ("xOhmPerKm", line.XOhmPerKm),
            ("bUsPerKm", line.BUsPerKm), ("r0OhmPerKm", line.R0OhmPerKm), ("x0OhmPerKm", line.X0OhmPerKm), ("b0UsPerKm", line.B0UsPerKm));
        var totals = ImpedanceForm.Of("ohm totals", ("rOhm", line.ROhm), ("xOhm", line.XOhm), ("bUs", line.BUs),
            ("r0Ohm", line.R0Ohm), ("x0Ohm", line.X0Ohm), ("b0Us", line.B0Us));
        var perUnit = ImpedanceForm.Of("per unit", ("rPu", line.RPu), ("xPu", line.XPu), ("bPu", line.BPu),
            ("r0Pu", line.R0Pu), ("x0Pu", line.X0Pu), ("b0Pu", line.B0Pu));
        ImpedanceForm? form = ImpedanceForm.Single(at,
            "gives no impedance: give rOhmPerKm and xOhmPerKm with lengthKm, or totals rOhm and xOhm, or per-unit rPu and xPu",
            perKm, totals, perUnit);

        if (form == perKm)
        {
            if (line.LengthKm is null) at.Error("lengthKm", "gives values per km but no lengthKm: give the route length in km");
            Complete(at, Sequence.Positive, "rOhmPerKm", line.ROhmPerKm, "xOhmPerKm", line.XOhmPerKm);
            Complete(at, Sequence.Zero, "r0OhmPerKm", line.R0OhmPerKm, "x0OhmPerKm", line.X0OhmPerKm);
        }
        else if (form == totals)
        {
            Complete(at, Sequence.Positive, "rOhm", line.ROhm, "xOhm", line.XOhm);
            Complete(at, Sequence.Zero, "r0Ohm", line.R0Ohm, "x0Ohm", line.X0Ohm);
        }
        else if (form == perUnit)
        {
            Complete(at, Sequence.Positive, "rPu", line.RPu, "xPu", line.XPu);
            Complete(at, Sequence.Zero, "r0Pu", line.R0Pu, "x0Pu", line.X0Pu);
        }
        if (form is not null && form != perKm && line.LengthKm is double km)
            at.Warning("lengthKm", $"lengthKm {Numbers.Show(km)} is not used: the impedance is given as {form.Describe()}, not per km");
        if (form is not null && form != perUnit)
        {
            RequireBaseKv(at, "from", from);
            RequireBaseKv(at, "to", to);
        }
        if (from is { Kv: > 0 } && to is { Kv: > 0 } && Numbers.RelativeDifference(to.Kv, from.Kv) > KvMismatch)
            at.Warning("to", $"joins bus {from.Id} ({Numbers.Show(from.Kv)} kV) and bus {to.Id} ({Numbers.Show(to.Kv)} kV): " +
                "a line joins buses of one voltage; is a transformer missing, or a bus kv wrong?");
    }

    /// <summary>
    /// A sequence impedance is r and x together: one without the other is an error, as the per-unit
    /// conversion cannot guess the missing part; a complete positive sequence then meets the zero and
    /// negative impedance rules.
    /// </summary>
    private static void Complete(ElementScope at, Sequence sequence, string rKey, double? r, string xKey, double? x)
    {
        bool positiveSequence = sequence == Sequence.Positive;
        if (r is null && x is null)
        {
            if (positiveSequence) at.Error(xKey, $"{rKey} and {xKey} are missing: give the series resistance and reactance");
        }
        else if (r is null || x is null)
        {
            string missing = r is null ? rKey : xKey;
            at.Error(missing, $"{missing} is missing: give {rKey} and {xKey} together (0 where the value is nil)");
        }
        else if (positiveSequence)
        {
            SeriesImpedance.Check(at, rKey, r, xKey, x);
        }
    }

    /// <summary>Ohm values need Z_base = kV²/MVA of the bus (DEVELOPERS.md, Per-unit rules).</summary>
    private static void RequireBaseKv(ElementScope at, string field, Bus? bus)
    {
        if (bus is { Kv: 0 })
            at.Error(field, $"bus {bus.Id} states no base kV (kv 0), so ohm values cannot be put in per unit: " +
                "give the bus its kv, or give the line as rPu and xPu");
    }
}
