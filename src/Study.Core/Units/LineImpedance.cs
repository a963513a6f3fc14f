// Line and cable impedance from per-km data, ohm totals or system per-unit, to the system base.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>How a line's impedance was given in the file.</summary>
public enum LineDataForm
{
    PerKm,
    Ohm,
    PerUnit,
}

/// <summary>
/// A line on the system base: series Z and total charging B for the positive sequence, and the
/// zero sequence when the data gives it (null otherwise).
/// </summary>
public sealed record LineImpedanceResult(
    LineDataForm Form, Complex ZPu, double BPu, Complex? Z0Pu, double? B0Pu, IReadOnlyList<DerivationStep> Steps);

/// <summary>
/// Z_pu = Z_ohm / Z_base and B_pu = B_siemens · Z_base, Z_base from the from-bus kV
/// (DEVELOPERS.md, Per-unit rules; common practice). Exactly one data form per line.
/// </summary>
public static class LineImpedance
{
    /// <param name="recordSteps">False when only the numbers are needed (the model build): no derivation steps are kept or formatted.</param>
    public static LineImpedanceResult Convert(Line line, Bus fromBus, double baseMva, bool recordSteps = true)
    {
        LineDataForm form = FormOf(line);
        var d = new Derivation(recordSteps);
        double lengthKm = 1.0;
        double zBaseOhm = 1.0;
        if (form != LineDataForm.PerUnit)
        {
            double kv = BaseQuantities.RequireKv(fromBus, line.Id, "give rPu/xPu");
            d.Step("S_base", "system base", baseMva, "MVA");
            d.Step("U_base", $"base kV of bus {fromBus.Id}", kv, "kV");
            zBaseOhm = d.Step("Z_base", $"kV² / S_base = {N(kv)}² / {N(baseMva)}", BaseQuantities.ZBaseOhm(kv, baseMva), "ohm");
        }
        if (form == LineDataForm.PerKm)
            lengthKm = d.Step("length", "lengthKm", BaseQuantities.RequirePositive(line.LengthKm, "lengthKm", line.Id), "km");

        var (r, x, b) = Pick(form, line.ROhmPerKm, line.XOhmPerKm, line.BUsPerKm, line.ROhm, line.XOhm, line.BUs, line.RPu, line.XPu, line.BPu);
        var (r0, x0, b0) = Pick(form, line.R0OhmPerKm, line.X0OhmPerKm, line.B0UsPerKm, line.R0Ohm, line.X0Ohm, line.B0Us, line.R0Pu, line.X0Pu, line.B0Pu);
        if (r is null || x is null)
            throw new InputException($"series impedance incomplete: give both r and x ({FieldHint(form)})", elementId: line.Id);
        var (z1, b1) = Sequence(d, "1", form, r.Value, x.Value, b, lengthKm, zBaseOhm);
        if (z1 == Complex.Zero)
            throw new InputException("zero series impedance: a branch needs impedance (merge the two buses instead)", elementId: line.Id);

        Complex? z0 = null;
        double? b0Pu = null;
        if (r0 is not null || x0 is not null)
        {
            if (r0 is null || x0 is null)
                throw new InputException("zero-sequence impedance incomplete: give both r0 and x0", elementId: line.Id);
            (z0, b0Pu) = Sequence(d, "0", form, r0.Value, x0.Value, b0, lengthKm, zBaseOhm);
        }
        return new LineImpedanceResult(form, z1, b1 ?? 0.0, z0, b0Pu, d.ToList());
    }

    /// <summary>The one form the line gives; none or several is an input error.</summary>
    public static LineDataForm FormOf(Line line)
    {
        bool perKm = Any(line.ROhmPerKm, line.XOhmPerKm, line.BUsPerKm, line.R0OhmPerKm, line.X0OhmPerKm, line.B0UsPerKm);
        bool ohm = Any(line.ROhm, line.XOhm, line.BUs, line.R0Ohm, line.X0Ohm, line.B0Us);
        bool pu = Any(line.RPu, line.XPu, line.BPu, line.R0Pu, line.X0Pu, line.B0Pu);
        int forms = (perKm ? 1 : 0) + (ohm ? 1 : 0) + (pu ? 1 : 0);
        if (forms == 0)
            throw new InputException("no impedance given: give rOhmPerKm/xOhmPerKm with lengthKm, rOhm/xOhm, or rPu/xPu", elementId: line.Id);
        if (forms > 1)
            throw new InputException("impedance given in more than one form (per km, ohm totals, per unit): give exactly one", elementId: line.Id);
        return perKm ? LineDataForm.PerKm : ohm ? LineDataForm.Ohm : LineDataForm.PerUnit;
    }

    /// <summary>One sequence to per unit; charging is left null when the data does not give it.</summary>
    private static (Complex Z, double? B) Sequence(
        Derivation d, string seq, LineDataForm form, double r, double x, double? b, double lengthKm, double zBaseOhm)
    {
        if (form == LineDataForm.PerUnit)
        {
            double rPu = d.Step($"r{seq}", $"r{seq}Pu given", r, "pu");
            double xPu = d.Step($"x{seq}", $"x{seq}Pu given", x, "pu");
            double? bPu = b is null ? null : d.Step($"b{seq}", $"b{seq}Pu given (total)", b.Value, "pu");
            return (new Complex(rPu, xPu), bPu);
        }
        double rOhm, xOhm;
        double? bS = null;
        if (form == LineDataForm.PerKm)
        {
            rOhm = d.Step($"R{seq}", $"r · length = {N(r)} · {N(lengthKm)}", r * lengthKm, "ohm");
            xOhm = d.Step($"X{seq}", $"x · length = {N(x)} · {N(lengthKm)}", x * lengthKm, "ohm");
            if (b is double bUsPerKm)
                bS = d.Step($"B{seq}", $"b · length · 1e-6 = {N(bUsPerKm)} µS/km · {N(lengthKm)} · 1e-6", bUsPerKm * lengthKm * 1e-6, "S");
        }
        else
        {
            rOhm = d.Step($"R{seq}", $"r{seq}Ohm given", r, "ohm");
            xOhm = d.Step($"X{seq}", $"x{seq}Ohm given", x, "ohm");
            if (b is double bUs)
                bS = d.Step($"B{seq}", $"b{seq}Us · 1e-6 = {N(bUs)} · 1e-6", bUs * 1e-6, "S");
        }
        double rp = d.Step($"r{seq}", $"R / Z_base = {N(rOhm)} / {N(zBaseOhm)}", rOhm / zBaseOhm, "pu");
        double xp = d.Step($"x{seq}", $"X / Z_base = {N(xOhm)} / {N(zBaseOhm)}", xOhm / zBaseOhm, "pu");
        double? bp = bS is double bSiemens
            ? d.Step($"b{seq}", $"B · Z_base = {N(bSiemens)} · {N(zBaseOhm)}", bSiemens * zBaseOhm, "pu")
            : null;
        return (new Complex(rp, xp), bp);
    }

    private static (double? R, double? X, double? B) Pick(LineDataForm form,
        double? rPerKm, double? xPerKm, double? bPerKm, double? rOhm, double? xOhm, double? bUs, double? rPu, double? xPu, double? bPu) =>
        form switch
        {
            LineDataForm.PerKm => (rPerKm, xPerKm, bPerKm),
            LineDataForm.Ohm => (rOhm, xOhm, bUs),
            _ => (rPu, xPu, bPu),
        };

    private static string FieldHint(LineDataForm form) => form switch
    {
        LineDataForm.PerKm => "rOhmPerKm, xOhmPerKm",
        LineDataForm.Ohm => "rOhm, xOhm",
        _ => "rPu, xPu",
    };

    private static bool Any(params double?[] values) => values.Any(v => v is not null);
}
