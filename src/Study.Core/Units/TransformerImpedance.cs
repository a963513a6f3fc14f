// Two-winding transformer from nameplate (or system per-unit) data to its π model on the system base.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>How a transformer's impedance was given in the file.</summary>
public enum TransformerDataForm
{
    Nameplate,
    PerUnit,
}

/// <summary>
/// A two-winding bank on the system base: ideal ratio t·e^{jφ}:1 at the hv terminal, series Z towards
/// lv, magnetising Y_m = G − jB at the hv terminal. HvFactor and LvFactor are the rated-kV-over-bus-kV
/// factors a <see cref="PuTap"/> needs to give the same ratio at any position.
/// </summary>
public sealed record TransformerImpedanceResult
{
    public TransformerDataForm Form { get; init; }
    public Complex ZPu { get; init; }
    public Complex Z0Pu { get; init; }
    /// <summary>True when the zero sequence was not given and is taken equal to the positive sequence.</summary>
    public bool Z0IsDefault { get; init; }
    /// <summary>Total charging susceptance of the per-unit form (imported cases); 0 for nameplate data.</summary>
    public double BPu { get; init; }
    public double Ratio { get; init; } = 1.0;
    public double ShiftRad { get; init; }
    /// <summary>True when <see cref="ShiftRad"/> is the vector group's clock displacement (not a given phaseShiftDeg).</summary>
    public bool ShiftFromGroup { get; init; }
    public Complex MagnetisingY { get; init; }
    public double HvFactor { get; init; } = 1.0;
    public double LvFactor { get; init; } = 1.0;
    public double? RatingMva { get; init; }
    public IReadOnlyList<DerivationStep> Steps { get; init; } = [];
}

/// <summary>
/// z = zPercent/100 on the unit's own MVA, r = z/√(1 + (X/R)²), x = r·X/R, then
/// z_sys = z · (S_base / (S_r · units)) · (lvKv / kV_lv bus)² (base change, common practice;
/// DEVELOPERS.md, Per-unit rules). The series impedance sits on the lv side of the ideal ratio,
/// so it is referred to the lv winding and the lv bus base.
/// </summary>
public static class TransformerImpedance
{
    public const string Z0DefaultNote = "z0Percent not given: taken equal to zPercent (default, not data)";

    public static TransformerImpedanceResult Convert(Transformer t, Bus hvBus, Bus lvBus, double baseMva, bool recordSteps = true)
    {
        if (t.Units < 1)
            throw new InputException($"units must be at least 1 (got {t.Units})", elementId: t.Id);
        if (t.Tap is { Winding: TapWinding.Mv })
            throw new InputException("tap winding mv on a two-winding transformer: use hv or lv", elementId: t.Id);
        return FormOf(t) == TransformerDataForm.Nameplate ? Nameplate(t, hvBus, lvBus, baseMva, recordSteps) : PerUnit(t, baseMva, recordSteps);
    }

    public static TransformerDataForm FormOf(Transformer t)
    {
        bool nameplate = t.ZPercent is not null || t.Mva is not null || t.Xr is not null || t.Z0Percent is not null;
        bool perUnit = t.RPu is not null || t.XPu is not null || t.BPu is not null || t.Ratio is not null;
        if (nameplate && perUnit)
            throw new InputException("impedance given both as nameplate (mva, zPercent, xr) and per unit (rPu, xPu, ratio): give exactly one", elementId: t.Id);
        if (!nameplate && !perUnit)
            throw new InputException("no impedance given: give mva, hvKv, lvKv, zPercent and xr, or rPu/xPu", elementId: t.Id);
        return nameplate ? TransformerDataForm.Nameplate : TransformerDataForm.PerUnit;
    }

    private static TransformerImpedanceResult Nameplate(Transformer t, Bus hvBus, Bus lvBus, double baseMva, bool recordSteps)
    {
        const string hint = "give rPu/xPu";
        double hvBusKv = BaseQuantities.RequireKv(hvBus, t.Id, hint);
        double lvBusKv = BaseQuantities.RequireKv(lvBus, t.Id, hint);
        double mva = BaseQuantities.RequirePositive(t.Mva, "mva", t.Id);
        double hvKv = BaseQuantities.RequirePositive(t.HvKv, "hvKv", t.Id);
        double lvKv = BaseQuantities.RequirePositive(t.LvKv, "lvKv", t.Id);
        double zPercent = BaseQuantities.RequirePositive(t.ZPercent, "zPercent", t.Id);
        double xr = BaseQuantities.Require(t.Xr, "xr", t.Id);
        if (xr < 0) throw new InputException($"xr must not be negative (got {N(xr)})", elementId: t.Id);

        var d = new Derivation(recordSteps);
        double z = d.Step("z (own base)", $"zPercent / 100 = {N(zPercent)} / 100", zPercent / 100.0, "pu");
        double r = d.Step("r (own base)", $"z / √(1 + (X/R)²) = {N(z)} / √(1 + {N(xr)}²)", z / Math.Sqrt(1 + xr * xr), "pu");
        double x = d.Step("x (own base)", $"r · X/R = {N(r)} · {N(xr)}", r * xr, "pu");
        double k = d.Step("base change", $"(S_base / (mva · units)) · (lvKv / kV_lv bus)² = ({N(baseMva)} / ({N(mva)} · {t.Units})) · ({N(lvKv)} / {N(lvBusKv)})²",
            baseMva / (mva * t.Units) * Math.Pow(lvKv / lvBusKv, 2), "");
        d.Step("|z| (system base)", $"z · factor = {N(z)} · {N(k)}", z * k, "pu");
        double rSys = d.Step("r", $"r · factor = {N(r)} · {N(k)}", r * k, "pu");
        double xSys = d.Step("x", $"x · factor = {N(x)} · {N(k)}", x * k, "pu");

        bool z0Default = t.Z0Percent is null;
        double z0Percent = z0Default
            ? d.Assumed("z0Percent", $"= zPercent = {N(zPercent)}", zPercent, "%", Z0DefaultNote)
            : d.Step("z0Percent", "z0Percent given", t.Z0Percent!.Value, "%");
        double r0Sys = d.Step("r0", $"z0Percent / 100 / √(1 + (X/R)²) · factor = {N(z0Percent)} / 100 / √(1 + {N(xr)}²) · {N(k)}",
            z0Percent / 100.0 / Math.Sqrt(1 + xr * xr) * k, "pu");
        double x0Sys = d.Step("x0", $"r0 · X/R = {N(r0Sys)} · {N(xr)}", r0Sys * xr, "pu");

        double hvFactor = d.Step("hv winding / bus", $"hvKv / kV_hv bus = {N(hvKv)} / {N(hvBusKv)}", hvKv / hvBusKv, "pu");
        double lvFactor = d.Step("lv winding / bus", $"lvKv / kV_lv bus = {N(lvKv)} / {N(lvBusKv)}", lvKv / lvBusKv, "pu");
        double ratio = TapRatio.Compute(d, t.Tap, hvFactor, lvFactor);
        Displacement shift = PhaseDisplacement.TwoWinding(d, t);

        Complex ym = t.NoLoad is null
            ? Complex.Zero
            : MagnetisingBranch.Convert(d, t.NoLoad, mva, t.Units, hvKv, hvBusKv, baseMva, t.Id);

        return new TransformerImpedanceResult
        {
            Form = TransformerDataForm.Nameplate,
            ZPu = new Complex(rSys, xSys),
            Z0Pu = new Complex(r0Sys, x0Sys),
            Z0IsDefault = z0Default,
            Ratio = ratio,
            ShiftRad = shift.Rad,
            ShiftFromGroup = shift.FromGroup,
            MagnetisingY = ym,
            HvFactor = hvFactor,
            LvFactor = lvFactor,
            RatingMva = t.RatingMva ?? mva * t.Units,
            Steps = d.ToList(),
        };
    }

    /// <summary>Imported cases: r, x, b already on the system base for one unit; parallel units divide z and multiply b.</summary>
    private static TransformerImpedanceResult PerUnit(Transformer t, double baseMva, bool recordSteps)
    {
        double rPu = BaseQuantities.Require(t.RPu, "rPu", t.Id);
        double xPu = BaseQuantities.Require(t.XPu, "xPu", t.Id);
        if (rPu == 0 && xPu == 0)
            throw new InputException("zero series impedance: a branch needs impedance (merge the two buses instead)", elementId: t.Id);
        if (t.NoLoad is not null)
            throw new InputException("noLoad needs the nameplate form (mva, hvKv, lvKv, zPercent)", elementId: t.Id);

        var d = new Derivation(recordSteps);
        double n = t.Units;
        double r = d.Step("r", $"rPu / units = {N(rPu)} / {t.Units}", rPu / n, "pu");
        double x = d.Step("x", $"xPu / units = {N(xPu)} / {t.Units}", xPu / n, "pu");
        double b = d.Step("b", $"bPu · units = {N(t.BPu ?? 0)} · {t.Units}", (t.BPu ?? 0) * n, "pu");
        d.Assumed("z0", $"= z = {N(r)} + j{N(x)}", Math.Sqrt(r * r + x * x), "pu",
            "zero sequence not given: taken equal to the positive sequence (default, not data)");

        double given = t.Ratio is null or 0 ? 1.0 : t.Ratio.Value;
        double ratio = t.Ratio is null or 0
            ? d.Assumed("t", "ratio not given (or 0): 1", 1.0, "pu", "ratio 0 or absent means nominal (1)")
            : d.Step("t", "ratio given (at the tap's present position)", given, "pu");
        double hvFactor = ratio, lvFactor = 1.0;
        if (t.Tap is { } tap)
        {
            // The given ratio is the ratio at the tap's present position; factor it so RatioAt(p) reproduces it.
            double f = d.Step("tap factor", $"1 + {tap.Position} · {N(tap.PercentPerStep)} / 100",
                TapRatio.Factor(tap.Position, tap.PercentPerStep), "pu");
            hvFactor = tap.Winding == TapWinding.Lv ? ratio * f : ratio / f;
        }
        Displacement displacement = PhaseDisplacement.TwoWinding(d, t);
        return new TransformerImpedanceResult
        {
            Form = TransformerDataForm.PerUnit,
            ZPu = new Complex(r, x),
            Z0Pu = new Complex(r, x),
            Z0IsDefault = true,
            BPu = b,
            Ratio = ratio,
            ShiftRad = displacement.Rad,
            ShiftFromGroup = displacement.FromGroup,
            HvFactor = hvFactor,
            LvFactor = lvFactor,
            RatingMva = t.RatingMva,
            Steps = d.ToList(),
        };
    }
}
