// Line and cable impedance from its sequence data (per km, whole line or system per unit) to the system base.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// A line on the system base: series Z and total charging B for the positive sequence, and the
/// zero sequence when the data gives it (null otherwise).
/// </summary>
public sealed record LineImpedanceResult(Complex ZPu, double BPu, Complex? Z0Pu, double? B0Pu, IReadOnlyList<DerivationStep> Steps);

/// <summary>
/// Z_pu = Z_ohm / Z_base and B_pu = B_siemens · Z_base, Z_base from the from-bus kV
/// (DEVELOPERS.md, Per-unit rules; common practice). Each sequence converts on its own basis.
/// </summary>
public static class LineImpedance
{
    /// <param name="recordSteps">False when only the numbers are needed (the model build): no derivation steps are kept or formatted.</param>
    /// <exception cref="InputException">No z1, a per-km sequence without km, ohm data on a bus with no kV, or zero series impedance.</exception>
    public static LineImpedanceResult Convert(Line line, Bus fromBus, double baseMva, bool recordSteps = true)
    {
        SequenceImpedance z1 = line.Z1
            ?? throw new InputException("no impedance given: give z1 with per (\"km\", \"line\" or \"pu\"), r and x", elementId: line.Id);
        var d = new Derivation(recordSteps);
        bool inOhm = z1.Per != ImpedanceBasis.PerUnit || line.Z0 is { Per: not ImpedanceBasis.PerUnit };
        double zBaseOhm = 1.0;
        if (inOhm)
        {
            double kv = BaseQuantities.RequireKv(fromBus, line.Id, "give the line per unit (\"per\": \"pu\")");
            d.Step("S_base", "system base", baseMva, "MVA");
            d.Step("U_base", $"base kV of bus {fromBus.Id}", kv, "kV");
            zBaseOhm = d.Step("Z_base", $"kV² / S_base = {N(kv)}² / {N(baseMva)}", BaseQuantities.ZBaseOhm(kv, baseMva), "ohm");
        }
        bool perKm = z1.Per == ImpedanceBasis.PerKm || line.Z0?.Per == ImpedanceBasis.PerKm;
        double lengthKm = perKm ? d.Step("length", "km", BaseQuantities.RequirePositive(line.Km, "km", line.Id), "km") : 1.0;

        var (zPu, bPu) = Sequence(d, "1", z1, lengthKm, zBaseOhm);
        if (zPu == Complex.Zero)
            throw new InputException("zero series impedance: a branch needs impedance (merge the two buses instead)", elementId: line.Id);
        Complex? z0Pu = null;
        double? b0Pu = null;
        if (line.Z0 is { } z0) (z0Pu, b0Pu) = Sequence(d, "0", z0, lengthKm, zBaseOhm);
        return new LineImpedanceResult(zPu, bPu ?? 0.0, z0Pu, b0Pu, d.ToList());
    }

    /// <summary>One sequence to per unit; charging is left null when the data does not give it.</summary>
    private static (Complex Z, double? B) Sequence(Derivation d, string seq, SequenceImpedance z, double lengthKm, double zBaseOhm)
    {
        string key = $"z{seq}";
        if (z.Per == ImpedanceBasis.PerUnit)
        {
            double rPu = d.Step($"r{seq}", $"{key}.r given (pu)", z.R, "pu");
            double xPu = d.Step($"x{seq}", $"{key}.x given (pu)", z.X, "pu");
            double? bPu = z.B is double bGiven ? d.Step($"b{seq}", $"{key}.b given (pu, total)", bGiven, "pu") : null;
            return (new Complex(rPu, xPu), bPu);
        }
        double rOhm, xOhm;
        double? bS = null;
        if (z.Per == ImpedanceBasis.PerKm)
        {
            rOhm = d.Step($"R{seq}", $"{key}.r · km = {N(z.R)} Ω/km · {N(lengthKm)}", z.R * lengthKm, "ohm");
            xOhm = d.Step($"X{seq}", $"{key}.x · km = {N(z.X)} Ω/km · {N(lengthKm)}", z.X * lengthKm, "ohm");
            if (z.B is double bUsPerKm)
                bS = d.Step($"B{seq}", $"{key}.b · km · 1e-6 = {N(bUsPerKm)} µS/km · {N(lengthKm)} · 1e-6", bUsPerKm * lengthKm * 1e-6, "S");
        }
        else
        {
            rOhm = d.Step($"R{seq}", $"{key}.r given (whole line)", z.R, "ohm");
            xOhm = d.Step($"X{seq}", $"{key}.x given (whole line)", z.X, "ohm");
            if (z.B is double bUs)
                bS = d.Step($"B{seq}", $"{key}.b · 1e-6 = {N(bUs)} µS · 1e-6", bUs * 1e-6, "S");
        }
        double rp = d.Step($"r{seq}", $"R / Z_base = {N(rOhm)} / {N(zBaseOhm)}", rOhm / zBaseOhm, "pu");
        double xp = d.Step($"x{seq}", $"X / Z_base = {N(xOhm)} / {N(zBaseOhm)}", xOhm / zBaseOhm, "pu");
        double? bp = bS is double bSiemens
            ? d.Step($"b{seq}", $"B · Z_base = {N(bSiemens)} · {N(zBaseOhm)}", bSiemens * zBaseOhm, "pu")
            : null;
        return (new Complex(rp, xp), bp);
    }
}
