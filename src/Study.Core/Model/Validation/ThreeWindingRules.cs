// Three-winding transformer checks: three distinct ends, nameplate data, pairwise impedances, kV, tap.
namespace Study.Core.Model.Validation;

internal static class ThreeWindingRules
{
    public static void Check(ValidationContext context, ThreeWindingTransformer t)
    {
        ElementScope at = context.At(ElementKind.ThreeWindingTransformer, t.Id);
        Bus? hv = at.BusRef("hv", t.Hv);
        Bus? mv = at.BusRef("mv", t.Mv);
        Bus? lv = at.BusRef("lv", t.Lv);
        at.DistinctEnds("hv", t.Hv, "mv", t.Mv);
        at.DistinctEnds("hv", t.Hv, "lv", t.Lv);
        at.DistinctEnds("mv", t.Mv, "lv", t.Lv);
        bool finite = at.AllFinite(("hvKv", t.HvKv), ("mvKv", t.MvKv), ("lvKv", t.LvKv), ("mvaHv", t.MvaHv),
            ("mvaMv", t.MvaMv), ("mvaLv", t.MvaLv), ("zHmPercent", t.ZHmPercent), ("zHlPercent", t.ZHlPercent),
            ("zMlPercent", t.ZMlPercent), ("zBaseMva", t.ZBaseMva), ("xr", t.Xr));

        at.Kv("hvKv", t.HvKv, zeroAllowed: false);
        at.Kv("mvKv", t.MvKv, zeroAllowed: false);
        at.Kv("lvKv", t.LvKv, zeroAllowed: false);
        bool swapped = WindingKvRules.Check(at, "", new Winding("hv", "hvKv", t.HvKv, hv),
            new Winding("mv", "mvKv", t.MvKv, mv), new Winding("lv", "lvKv", t.LvKv, lv));
        if (!swapped)
        {
            WindingKvRules.CheckOrder(at, "hvKv", t.HvKv, "mvKv", t.MvKv);
            WindingKvRules.CheckOrder(at, "mvKv", t.MvKv, "lvKv", t.LvKv);
        }

        at.NotNegative("mvaHv", t.MvaHv, "a winding rating (MVA)");
        at.NotNegative("mvaMv", t.MvaMv, "a winding rating (MVA)");
        at.NotNegative("mvaLv", t.MvaLv, "a winding rating (MVA)");
        at.Positive("zBaseMva", t.ZBaseMva, "the MVA base on which zHmPercent, zHlPercent and zMlPercent are stated");
        at.Positive("xr", t.Xr, "the X/R ratio");
        PairImpedance(at, "zHmPercent", t.ZHmPercent);
        PairImpedance(at, "zHlPercent", t.ZHlPercent);
        PairImpedance(at, "zMlPercent", t.ZMlPercent);
        Plausibility.Percent(at, "zHmPercent", t.ZHmPercent);
        Plausibility.Percent(at, "zHlPercent", t.ZHlPercent);
        Plausibility.Percent(at, "zMlPercent", t.ZMlPercent);
        if (finite) StarBranches(at, t, context.Network.BaseMva);

        VectorGroupRules.Check(at, t.VectorGroup, t.Id, threeWinding: true);
        EarthingRules.Check(at, "hvNeutral", t.HvNeutral);
        EarthingRules.Check(at, "mvNeutral", t.MvNeutral);
        EarthingRules.Check(at, "lvNeutral", t.LvNeutral);
        if (t.NoLoad is not null && t.MvaHv == 0)
            at.Error("mvaHv", "mvaHv is 0: noLoad is stated on the hv rating, so give mvaHv in MVA");
        TransformerRules.CheckNoLoad(at, t.NoLoad, t.MvaHv);
        TapRules.Check(at, t.Tap, hasMvWinding: true);
    }

    /// <summary>A pairwise short-circuit impedance is measured between two windings: always above 0.</summary>
    private static void PairImpedance(ElementScope at, string field, double z)
    {
        if (z == 0)
            at.Error(field, $"{field} is 0: a zero-impedance connection belongs in a bus merge, not a branch");
        else if (z < 0)
            at.Error(field, $"{field} is {Numbers.Show(z)}: a measured short-circuit impedance is above 0");
    }

    /// <summary>
    /// The star equivalent Z_H = (Z_HM + Z_HL − Z_ML)/2 and its two companions (DEVELOPERS.md, Per-unit
    /// conventions) can come out negative; that is real and solvable, so a warning only. A star
    /// branch of exactly zero would be a zero-impedance branch to the star point: an error.
    /// </summary>
    private static void StarBranches(ElementScope at, ThreeWindingTransformer t, double baseMva)
    {
        if (t.ZHmPercent <= 0 || t.ZHlPercent <= 0 || t.ZMlPercent <= 0) return;
        (string Name, double Z)[] star =
        [
            ("hv", (t.ZHmPercent + t.ZHlPercent - t.ZMlPercent) / 2),
            ("mv", (t.ZHmPercent + t.ZMlPercent - t.ZHlPercent) / 2),
            ("lv", (t.ZHlPercent + t.ZMlPercent - t.ZHmPercent) / 2),
        ];
        foreach ((string name, double z) in star)
        {
            if (z == 0)
                at.Error("zHmPercent", $"the {name} star branch comes out at 0 % from zHmPercent, zHlPercent and zMlPercent: " +
                    "a zero-impedance branch to the star point; check the three values");
            else if (z < 0)
                at.Warning("zHmPercent", $"the {name} star branch comes out at {Numbers.Show(z)} % (negative reactance) " +
                    "from zHmPercent, zHlPercent and zMlPercent: accepted, as real windings can give this; check the three values");
            // On the system base: z / 100 · S_base / zBaseMva (DEVELOPERS.md, Per-unit rules).
            if (z != 0 && t.ZBaseMva > 0 && baseMva > 0 && double.IsFinite(baseMva))
                Plausibility.SeriesOnSystemBase(at, "zHmPercent", Math.Abs(z) / 100 * baseMva / t.ZBaseMva);
        }
    }
}
