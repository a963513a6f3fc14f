// Field lists of branches: lines and cables, two- and three-winding transformers.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>Form and table fields of lines and transformers. Blank optional values are "not given".</summary>
public static class BranchFields
{
    public static IReadOnlyList<ElementField> Line { get; } =
    [
        Field.Id<Line>("Id", e => e.Id, (e, v) => e with { Id = v }),
        Field.Id<Line>("From", e => e.From, (e, v) => e with { From = v }),
        Field.Id<Line>("To", e => e.To, (e, v) => e with { To = v }),
        Field.Optional<Line>("Length", "km", "", e => e.LengthKm, (e, v) => e with { LengthKm = v }),
        Field.Optional<Line>("R", "Ω/km", "", e => e.ROhmPerKm, (e, v) => e with { ROhmPerKm = v }),
        Field.Optional<Line>("X", "Ω/km", "", e => e.XOhmPerKm, (e, v) => e with { XOhmPerKm = v }),
        Field.Optional<Line>("B", "µS/km", "0", e => e.BUsPerKm, (e, v) => e with { BUsPerKm = v }),
        Field.Optional<Line>("Rating", "MVA", "none", e => e.RatingMva, (e, v) => e with { RatingMva = v }),
        Field.Optional<Line>("R0", "Ω/km", "", e => e.R0OhmPerKm, (e, v) => e with { R0OhmPerKm = v }),
        Field.Optional<Line>("X0", "Ω/km", "", e => e.X0OhmPerKm, (e, v) => e with { X0OhmPerKm = v }),
        Field.Optional<Line>("B0", "µS/km", "", e => e.B0UsPerKm, (e, v) => e with { B0UsPerKm = v }),
        Field.Optional<Line>("R total", "Ω", "", e => e.ROhm, (e, v) => e with { ROhm = v }),
        Field.Optional<Line>("X total", "Ω", "", e => e.XOhm, (e, v) => e with { XOhm = v }),
        Field.Optional<Line>("B total", "µS", "", e => e.BUs, (e, v) => e with { BUs = v }),
        Field.Optional<Line>("R", "pu", "", e => e.RPu, (e, v) => e with { RPu = v }),
        Field.Optional<Line>("X", "pu", "", e => e.XPu, (e, v) => e with { XPu = v }),
        Field.Optional<Line>("B", "pu", "", e => e.BPu, (e, v) => e with { BPu = v }),
        Field.Flag<Line>("In service", true, e => e.InService, (e, v) => e with { InService = v }),
    ];

    public static IReadOnlyList<ElementField> Transformer { get; } =
    [
        Field.Id<Transformer>("Id", e => e.Id, (e, v) => e with { Id = v }),
        Field.Id<Transformer>("HV bus", e => e.Hv, (e, v) => e with { Hv = v }),
        Field.Id<Transformer>("LV bus", e => e.Lv, (e, v) => e with { Lv = v }),
        Field.Optional<Transformer>("Rating", "MVA", "", e => e.Mva, (e, v) => e with { Mva = v }),
        Field.Optional<Transformer>("HV", "kV", "", e => e.HvKv, (e, v) => e with { HvKv = v }),
        Field.Optional<Transformer>("LV", "kV", "", e => e.LvKv, (e, v) => e with { LvKv = v }),
        Field.Optional<Transformer>("Z", "%", "", e => e.ZPercent, (e, v) => e with { ZPercent = v }),
        Field.Optional<Transformer>("X/R", "", "", e => e.Xr, (e, v) => e with { Xr = v }),
        Field.Optional<Transformer>("Z0", "%", "= Z", e => e.Z0Percent, (e, v) => e with { Z0Percent = v }),
        Field.Integer<Transformer>("Units", "", 1, e => e.Units, (e, v) => e with { Units = v }),
        Field.Text<Transformer>("Vector group", e => e.VectorGroup, (e, v) => e with { VectorGroup = v }),
        .. TapFields.For<Transformer>(e => e.Tap, (e, t) => e with { Tap = TapFields.Normalise(t) }),
        Field.Number<Transformer>("Phase shift", "°", 0, e => e.PhaseShiftDeg, (e, v) => e with { PhaseShiftDeg = v }),
        Field.Optional<Transformer>("Loading rating", "MVA", "= rating", e => e.RatingMva, (e, v) => e with { RatingMva = v }),
        Field.Optional<Transformer>("R", "pu", "", e => e.RPu, (e, v) => e with { RPu = v }),
        Field.Optional<Transformer>("X", "pu", "", e => e.XPu, (e, v) => e with { XPu = v }),
        Field.Optional<Transformer>("Ratio", "pu", "", e => e.Ratio, (e, v) => e with { Ratio = v }),
        Field.Flag<Transformer>("In service", true, e => e.InService, (e, v) => e with { InService = v }),
    ];

    public static IReadOnlyList<ElementField> ThreeWinding { get; } =
    [
        Field.Id<ThreeWindingTransformer>("Id", e => e.Id, (e, v) => e with { Id = v }),
        Field.Id<ThreeWindingTransformer>("HV bus", e => e.Hv, (e, v) => e with { Hv = v }),
        Field.Id<ThreeWindingTransformer>("MV bus", e => e.Mv, (e, v) => e with { Mv = v }),
        Field.Id<ThreeWindingTransformer>("LV bus", e => e.Lv, (e, v) => e with { Lv = v }),
        Field.Number<ThreeWindingTransformer>("HV", "kV", 0, e => e.HvKv, (e, v) => e with { HvKv = v }),
        Field.Number<ThreeWindingTransformer>("MV", "kV", 0, e => e.MvKv, (e, v) => e with { MvKv = v }),
        Field.Number<ThreeWindingTransformer>("LV", "kV", 0, e => e.LvKv, (e, v) => e with { LvKv = v }),
        Field.Number<ThreeWindingTransformer>("HV rating", "MVA", 0, e => e.MvaHv, (e, v) => e with { MvaHv = v }),
        Field.Number<ThreeWindingTransformer>("MV rating", "MVA", 0, e => e.MvaMv, (e, v) => e with { MvaMv = v }),
        Field.Number<ThreeWindingTransformer>("LV rating", "MVA", 0, e => e.MvaLv, (e, v) => e with { MvaLv = v }),
        Field.Number<ThreeWindingTransformer>("Z HV-MV", "%", 0, e => e.ZHmPercent, (e, v) => e with { ZHmPercent = v }),
        Field.Number<ThreeWindingTransformer>("Z HV-LV", "%", 0, e => e.ZHlPercent, (e, v) => e with { ZHlPercent = v }),
        Field.Number<ThreeWindingTransformer>("Z MV-LV", "%", 0, e => e.ZMlPercent, (e, v) => e with { ZMlPercent = v }),
        Field.Number<ThreeWindingTransformer>("Z base", "MVA", 0, e => e.ZBaseMva, (e, v) => e with { ZBaseMva = v }),
        Field.Number<ThreeWindingTransformer>("X/R", "", 30, e => e.Xr, (e, v) => e with { Xr = v }),
        Field.Text<ThreeWindingTransformer>("Vector group", e => e.VectorGroup, (e, v) => e with { VectorGroup = v }),
        .. TapFields.For<ThreeWindingTransformer>(e => e.Tap, (e, t) => e with { Tap = TapFields.Normalise(t) }),
        Field.Flag<ThreeWindingTransformer>("In service", true, e => e.InService, (e, v) => e with { InService = v }),
    ];
}
