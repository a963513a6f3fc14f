// Two-winding transformer checks: ends, exactly one data form (nameplate or per unit), kV against buses, tap.
namespace Study.Core.Model.Validation;

internal static class TransformerRules
{
    public static void Check(ValidationContext context, Transformer t)
    {
        ElementScope at = context.At(ElementKind.Transformer, t.Id);
        Bus? hv = at.BusRef("hv", t.Hv);
        Bus? lv = at.BusRef("lv", t.Lv);
        at.DistinctEnds("hv", t.Hv, "lv", t.Lv);
        at.AllFinite(("mva", t.Mva), ("hvKv", t.HvKv), ("lvKv", t.LvKv), ("zPercent", t.ZPercent), ("xr", t.Xr),
            ("z0Percent", t.Z0Percent), ("phaseShiftDeg", t.PhaseShiftDeg), ("ratingMva", t.RatingMva),
            ("rPu", t.RPu), ("xPu", t.XPu), ("bPu", t.BPu), ("ratio", t.Ratio));

        // Rated kV do not decide the form: an imported per-unit branch may state them for information.
        var nameplate = ImpedanceForm.Of("nameplate", ("mva", t.Mva), ("zPercent", t.ZPercent), ("xr", t.Xr), ("z0Percent", t.Z0Percent));
        var perUnit = ImpedanceForm.Of("per unit", ("rPu", t.RPu), ("xPu", t.XPu), ("bPu", t.BPu), ("ratio", t.Ratio));
        ImpedanceForm? form = ImpedanceForm.Single(at,
            "gives neither nameplate data (mva, hvKv, lvKv, zPercent, xr) nor per-unit data (xPu, with rPu and ratio)",
            nameplate, perUnit);
        if (form == nameplate) CheckNameplate(at, t, hv, lv);
        else if (form == perUnit) CheckPerUnit(at, t);

        if (t.Units < 1)
            at.Error("units", $"units is {Numbers.Show(t.Units)}: give the number of identical units in the bank, 1 or more");
        else
            Plausibility.Units(at, t.Units);
        if (SystemBaseImpedance(t, lv, context.Network.BaseMva) is double zPu)
            Plausibility.SeriesOnSystemBase(at, form == perUnit ? "xPu" : "zPercent", zPu);
        at.NotNegative("ratingMva", t.RatingMva, "a thermal rating (MVA)");
        at.Positive("xr", t.Xr, "the X/R ratio");
        at.Positive("z0Percent", t.Z0Percent, "the zero-sequence impedance (percent)");
        VectorGroupRules.Check(at, t.VectorGroup, t.Id, threeWinding: false);
        EarthingRules.Check(at, "hvNeutral", t.HvNeutral);
        EarthingRules.Check(at, "lvNeutral", t.LvNeutral);
        if (form == nameplate) CheckNoLoad(at, t.NoLoad, t.Mva);
        TapRules.Check(at, t.Tap, hasMvWinding: false);
    }

    /// <summary>
    /// No-load current and iron loss, shared with three-winding transformers. The loss is the
    /// in-phase part of the no-load current, so p0Kw cannot exceed i0Percent/100 · mva · 1000.
    /// </summary>
    public static void CheckNoLoad(ElementScope at, NoLoadLoss? noLoad, double? mva)
    {
        if (noLoad is null) return;
        if (!at.AllFinite(("noLoad.i0Percent", noLoad.I0Percent), ("noLoad.p0Kw", noLoad.P0Kw))) return;
        at.NotNegative("noLoad.i0Percent", noLoad.I0Percent, "the no-load current");
        at.NotNegative("noLoad.p0Kw", noLoad.P0Kw, "the no-load loss");
        if (mva is double s && double.IsFinite(s) && s > 0 && noLoad.I0Percent >= 0)
        {
            double mostKw = noLoad.I0Percent / 100 * s * 1000;
            if (noLoad.P0Kw > mostKw * (1 + 1e-12))
                at.Error("noLoad.p0Kw", $"noLoad.p0Kw {Numbers.Show(noLoad.P0Kw)} kW is more than i0Percent " +
                    $"{Numbers.Show(noLoad.I0Percent)} % of {Numbers.Show(s)} MVA allows ({Numbers.Show(mostKw)} kW): check both values");
        }
    }

    private static void CheckNameplate(ElementScope at, Transformer t, Bus? hv, Bus? lv)
    {
        Require(at, "mva", t.Mva, "the rated power of one unit in MVA");
        Require(at, "hvKv", t.HvKv, "the hv rated voltage in kV");
        Require(at, "lvKv", t.LvKv, "the lv rated voltage in kV");
        Require(at, "zPercent", t.ZPercent, "the short-circuit impedance in percent on the unit rating");
        Require(at, "xr", t.Xr, "the X/R ratio of the short-circuit impedance");
        at.Positive("mva", t.Mva, "the rated power (MVA)");
        at.Kv("hvKv", t.HvKv, zeroAllowed: false);
        at.Kv("lvKv", t.LvKv, zeroAllowed: false);
        if (t.ZPercent == 0)
            at.Error("zPercent", "zPercent is 0: a zero-impedance connection belongs in a bus merge, not a branch");
        else if (t.ZPercent < 0)
            at.Error("zPercent", $"zPercent is {Numbers.Show(t.ZPercent.Value)}: the nameplate impedance is a magnitude, " +
                "above 0 (give a negative reactance in per-unit form, xPu)");
        Plausibility.Percent(at, "zPercent", t.ZPercent);
        Plausibility.Percent(at, "z0Percent", t.Z0Percent);
        if (t.Mva is double mva && double.IsFinite(mva) && mva > LargestUnitMva)
            at.Warning("mva", $"mva {Numbers.Show(mva)} is beyond any transformer unit (the largest are about 2000 MVA): is it in kVA?");
        else if (t.Mva is double rated && t.LvKv is double lvKv && double.IsFinite(rated) && lvKv > 0
                 && rated / (Math.Sqrt(3) * lvKv) > LargestWindingKa)
            at.Warning("mva", $"mva {Numbers.Show(rated)} at {Numbers.Show(lvKv)} kV is a rated current of " +
                $"{Numbers.Show(Math.Round(rated / (Math.Sqrt(3) * lvKv)))} kA on the lv side, beyond any transformer winding (about {Numbers.Show(LargestWindingKa)} kA at most): is it in kVA?");
        bool swapped = WindingKvRules.Check(at, ", or give the transformer as rPu, xPu and ratio",
            new Winding("hv", "hvKv", t.HvKv, hv), new Winding("lv", "lvKv", t.LvKv, lv));
        if (!swapped) WindingKvRules.CheckOrder(at, "hvKv", t.HvKv, "lvKv", t.LvKv);
    }

    private static void CheckPerUnit(ElementScope at, Transformer t)
    {
        Require(at, "xPu", t.XPu, "the series reactance in per unit on the system base");
        Require(at, "rPu", t.RPu, "the series resistance in per unit on the system base (0 where nil)");
        SeriesImpedance.Check(at, "rPu", t.RPu, "xPu", t.XPu);
        // Ratio 0 means nominal, as in the Common Format.
        at.NotNegative("ratio", t.Ratio, "the off-nominal turns ratio (1 or 0 = nominal)");
        foreach ((string key, double? kv) in new[] { ("hvKv", t.HvKv), ("lvKv", t.LvKv) })
        {
            if (kv is double v)
                at.Warning(key, $"{key} {Numbers.Show(v)} is not used: the per-unit form takes xPu and ratio as they stand");
        }
        if (t.NoLoad is not null)
            at.Error("noLoad", "noLoad needs the nameplate form (mva, hvKv, lvKv, zPercent, xr): give the magnetising branch as bPu instead");
    }

    /// <summary>Larger than any transformer unit built: a rating this large is kVA typed as MVA.</summary>
    private const double LargestUnitMva = 5000;

    /// <summary>
    /// Beyond the rated current of any winding (large generator step-up units carry some 40 kA at 20–27 kV):
    /// a 1.6 MVA 415 V unit typed as 1600 MVA would carry about 2000 kA.
    /// </summary>
    private const double LargestWindingKa = 100;

    /// <summary>
    /// |z| of the bank on the system base (DEVELOPERS.md, Per-unit rules): z · S_base / (mva · units) ·
    /// (lvKv / kV_lv bus)² for nameplate data, |rPu + jxPu| / units for the per-unit form; null when a
    /// value it needs is missing or not usable (other rules report those).
    /// </summary>
    private static double? SystemBaseImpedance(Transformer t, Bus? lv, double baseMva)
    {
        if (t.Units < 1 || !(baseMva > 0) || !double.IsFinite(baseMva)) return null;
        if (t.RPu is double r && t.XPu is double x)
            return Math.Sqrt(r * r + x * x) / t.Units;
        if (t.ZPercent is double z && z > 0 && t.Mva is double mva && mva > 0 && t.LvKv is double lvKv && lvKv > 0
            && lv is { Kv: > 0 } && t.RPu is null && t.XPu is null)
            return z / 100 * baseMva / (mva * t.Units) * Math.Pow(lvKv / lv.Kv, 2);
        return null;
    }

    private static void Require(ElementScope at, string field, double? value, string what)
    {
        if (value is null) at.Error(field, $"{field} is missing: give {what}");
    }
}
