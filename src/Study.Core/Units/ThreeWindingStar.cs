// Three-winding transformer: pairwise short-circuit impedances to a star of three winding branches.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// One winding branch of the star, from its terminal bus to the internal star bus: ideal ratio
/// <see cref="Ratio"/>:1 at the terminal, series Z on the star side. WindingFactor is rated winding kV
/// over terminal bus kV (the <see cref="PuTap.HvFactor"/> of a tap on this winding).
/// </summary>
public sealed record StarWinding(string Winding, Complex ZPu, double Ratio, double WindingFactor, double RatingMva)
{
    /// <summary>Phase displacement φ of the winding's ideal ratio, from the vector group (<see cref="PhaseDisplacement.Winding"/>).</summary>
    public double ShiftRad { get; init; }
}

/// <summary>The star equivalent on the system base, with the magnetising admittance at the hv terminal.</summary>
public sealed record ThreeWindingStarResult(
    StarWinding Hv, StarWinding Mv, StarWinding Lv, Complex MagnetisingY, double StarBaseKv, IReadOnlyList<DerivationStep> Steps)
{
    public IReadOnlyList<StarWinding> Windings => [Hv, Mv, Lv];
}

/// <summary>
/// Star from pairwise impedances (common practice; DEVELOPERS.md, Per-unit rules): Z_H = (Z_HM + Z_HL − Z_ML)/2,
/// Z_M = (Z_HM + Z_ML − Z_HL)/2, Z_L = (Z_HL + Z_ML − Z_HM)/2, all on zBaseMva with one X/R.
/// </summary>
public static class ThreeWindingStar
{
    public const string ThreeWindingZ0Note =
        "zero sequence not given for three-winding transformers: each star branch taken equal to its positive sequence (default, not data)";

    public static string StarBusId(string transformerId) => transformerId + "/star";

    /// <summary>
    /// The star bus has base kV = hvKv, so its per-unit voltage is 1 when every winding is at rated
    /// voltage. Each winding branch carries the ideal ratio t_w = winding kV · f / terminal bus kV at its
    /// terminal, and its series impedance sits on the star side, already on the rated-voltage base:
    /// only the MVA base changes, z_sys = z · S_base / zBaseMva. (Putting the impedance at the
    /// terminal instead would call for the factor (winding kV / bus kV)²; the two are the same circuit.)
    /// </summary>
    public static ThreeWindingStarResult Convert(ThreeWindingTransformer t, Bus hvBus, Bus mvBus, Bus lvBus, double baseMva, bool recordSteps = true)
    {
        const string hint = "a three-winding transformer needs kV (it has no per-unit form)";
        double hvBusKv = BaseQuantities.RequireKv(hvBus, t.Id, hint);
        double mvBusKv = BaseQuantities.RequireKv(mvBus, t.Id, hint);
        double lvBusKv = BaseQuantities.RequireKv(lvBus, t.Id, hint);
        double hvKv = BaseQuantities.RequirePositive(t.HvKv, "hvKv", t.Id);
        double mvKv = BaseQuantities.RequirePositive(t.MvKv, "mvKv", t.Id);
        double lvKv = BaseQuantities.RequirePositive(t.LvKv, "lvKv", t.Id);
        double zBaseMva = BaseQuantities.RequirePositive(t.ZBaseMva, "zBaseMva", t.Id);
        if (t.Xr < 0) throw new InputException($"xr must not be negative (got {N(t.Xr)})", elementId: t.Id);

        var d = new Derivation(recordSteps);
        double zHm = d.Step("z_HM", $"zHmPercent / 100 = {N(t.ZHmPercent)} / 100 (on {N(zBaseMva)} MVA)", t.ZHmPercent / 100.0, "pu");
        double zHl = d.Step("z_HL", $"zHlPercent / 100 = {N(t.ZHlPercent)} / 100", t.ZHlPercent / 100.0, "pu");
        double zMl = d.Step("z_ML", $"zMlPercent / 100 = {N(t.ZMlPercent)} / 100", t.ZMlPercent / 100.0, "pu");
        double zH = d.Step("z_H", $"(z_HM + z_HL − z_ML) / 2 = ({N(zHm)} + {N(zHl)} − {N(zMl)}) / 2", (zHm + zHl - zMl) / 2, "pu");
        double zM = d.Step("z_M", $"(z_HM + z_ML − z_HL) / 2 = ({N(zHm)} + {N(zMl)} − {N(zHl)}) / 2", (zHm + zMl - zHl) / 2, "pu");
        double zL = d.Step("z_L", $"(z_HL + z_ML − z_HM) / 2 = ({N(zHl)} + {N(zMl)} − {N(zHm)}) / 2", (zHl + zMl - zHm) / 2, "pu");
        double k = d.Step("base change", $"S_base / zBaseMva = {N(baseMva)} / {N(zBaseMva)}", baseMva / zBaseMva, "");

        var hv = Winding(d, "hv", zH, k, t.Xr, hvKv, hvBusKv, t.MvaHv, TapOn(t, TapWinding.Hv));
        var mv = Winding(d, "mv", zM, k, t.Xr, mvKv, mvBusKv, t.MvaMv, TapOn(t, TapWinding.Mv))
            with { ShiftRad = PhaseDisplacement.Winding(d, t, "mv").Rad };
        var lv = Winding(d, "lv", zL, k, t.Xr, lvKv, lvBusKv, t.MvaLv, TapOn(t, TapWinding.Lv))
            with { ShiftRad = PhaseDisplacement.Winding(d, t, "lv").Rad };
        if (hv.ZPu == Complex.Zero || mv.ZPu == Complex.Zero || lv.ZPu == Complex.Zero)
            throw new InputException("a star winding has zero impedance: check zHmPercent, zHlPercent, zMlPercent", elementId: t.Id);

        d.Assumed("Z0/Z1 (each winding)", "= 1", 1.0, "", ThreeWindingZ0Note);

        Complex ym = Complex.Zero;
        if (t.NoLoad is not null)
            ym = MagnetisingBranch.Convert(d, t.NoLoad, BaseQuantities.RequirePositive(t.MvaHv, "mvaHv", t.Id), 1, hvKv, hvBusKv, baseMva, t.Id);
        return new ThreeWindingStarResult(hv, mv, lv, ym, hvKv, d.ToList());
    }

    private static TapChanger? TapOn(ThreeWindingTransformer t, TapWinding winding) => t.Tap is { } tap && tap.Winding == winding ? tap : null;

    private static StarWinding Winding(Derivation d, string name, double zOwn, double k, double xr, double windingKv, double busKv,
        double ratingMva, TapChanger? tap)
    {
        double r = d.Step($"r_{name}", $"z_{name} / √(1 + (X/R)²) · factor = {N(zOwn)} / √(1 + {N(xr)}²) · {N(k)}", zOwn / Math.Sqrt(1 + xr * xr) * k, "pu");
        double x = d.Step($"x_{name}", $"r_{name} · X/R = {N(r)} · {N(xr)}", r * xr, "pu");
        double w = d.Step($"{name} winding / bus", $"{name}Kv / kV_{name} bus = {N(windingKv)} / {N(busKv)}", windingKv / busKv, "pu");
        double ratio = w;
        if (tap is not null)
        {
            double f = d.Step($"tap factor ({name})", $"1 + position · percentPerStep / 100 = 1 + {tap.Position} · {N(tap.PercentPerStep)} / 100",
                TapRatio.Factor(tap.Position, tap.PercentPerStep), "pu");
            ratio = d.Step($"t_{name}", $"{name}Kv · f / kV_{name} bus = {N(w)} · {N(f)}", w * f, "pu");
        }
        else
        {
            d.Step($"t_{name}", $"{name}Kv / kV_{name} bus = {N(w)}", ratio, "pu");
        }
        return new StarWinding(name, new Complex(r, x), ratio, w, ratingMva);
    }
}
