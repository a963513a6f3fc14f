// Field lists of branches: lines and cables, two- and three-winding transformers.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>Form and table fields of lines and transformers. Blank optional values are "not given".</summary>
public static class BranchFields
{
    /// <summary>The basis spelled as the file spells it: per km, for the whole line, or system per unit.</summary>
    private static readonly (ImpedanceBasis Value, string Text)[] Bases =
        [(ImpedanceBasis.PerKm, "km"), (ImpedanceBasis.WholeLine, "line"), (ImpedanceBasis.PerUnit, "pu")];

    /// <summary>The conductor materials as the file spells them.</summary>
    private static readonly (ConductorMaterial Value, string Text)[] Conductors =
        [(ConductorMaterial.Copper, "copper"), (ConductorMaterial.Aluminium, "aluminium")];

    public static IReadOnlyList<ElementField> Line { get; } =
    [
        Field.Id<Line>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Line>("From bus", e => e.From, (e, v) => e with { From = v }).Keyed("from"),
        Field.BusRef<Line>("To bus", e => e.To, (e, v) => e with { To = v }).Keyed("to"),
        Field.Optional<Line>("Length", "km", "", e => e.Km, (e, v) => e with { Km = v }).Keyed("km"),
        .. SequenceFields("1", "Z1 basis", e => e.Z1, (e, z) => e with { Z1 = z }),
        Field.Optional<Line>("Rating", "MVA", "none", e => e.RatingMva, (e, v) => e with { RatingMva = v }).Keyed("ratingMva"),
        // The material sets how much r rises at the end-of-fault temperature of a minimum-level fault.
        Field.NamedOptional<Line, ConductorMaterial>("Conductor", Conductors, "not given", e => e.Conductor, (e, v) => e with { Conductor = v }).Keyed("conductor"),
        .. SequenceFields("0", "Z0 basis", e => e.Z0, (e, z) => e with { Z0 = z }),
        Field.Flag<Line>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    /// <summary>
    /// One sequence of a line: its basis, then R, X and B in the basis's units (Ω/km and µS/km per km, Ω
    /// and µS for the whole line, pu). Blank R and X mean "not given"; B blank is no charging.
    /// </summary>
    private static IEnumerable<ElementField> SequenceFields(string n, string title,
        Func<Line, SequenceImpedance?> get, Func<Line, SequenceImpedance?, Line> set)
    {
        // Every field writes into the sequence (made blank when absent); Normalise drops it again when
        // nothing was given, after the whole form has been read.
        Line Edit(Line e, Func<SequenceImpedance, SequenceImpedance> change) =>
            set(e, change(get(e) ?? new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = double.NaN, X = double.NaN }));
        static double? Given(double v) => double.IsNaN(v) ? null : v;
        return
        [
            Field.Named<Line, ImpedanceBasis>(title, Bases, ImpedanceBasis.PerKm, e => get(e)?.Per ?? ImpedanceBasis.PerKm,
                (e, v) => Edit(e, z => z with { Per = v })).Keyed($"z{n}.per"),
            Field.Optional<Line>($"R{n}", "Ω(/km)|pu", "", e => Given(get(e)?.R ?? double.NaN),
                (e, v) => Edit(e, z => z with { R = v ?? double.NaN })).Keyed($"z{n}.r"),
            Field.Optional<Line>($"X{n}", "Ω(/km)|pu", "", e => Given(get(e)?.X ?? double.NaN),
                (e, v) => Edit(e, z => z with { X = v ?? double.NaN })).Keyed($"z{n}.x"),
            Field.Optional<Line>($"B{n}", "µS(/km)|pu", "0", e => get(e)?.B, (e, v) => get(e) is null && v is null ? e : Edit(e, z => z with { B = v })).Keyed($"z{n}.b"),
        ];
    }

    /// <summary>A sequence whose R and X are both blank was not given; half given stays, for the validator to name.</summary>
    public static Line Normalise(Line line) => line with { Z1 = Normalise(line.Z1), Z0 = Normalise(line.Z0) };

    private static SequenceImpedance? Normalise(SequenceImpedance? z) =>
        z is not null && double.IsNaN(z.R) && double.IsNaN(z.X) && z.B is null ? null : z;

    public static IReadOnlyList<ElementField> Transformer { get; } =
    [
        Field.Id<Transformer>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Transformer>("HV bus", e => e.Hv, (e, v) => e with { Hv = v }).Keyed("hv"),
        Field.BusRef<Transformer>("LV bus", e => e.Lv, (e, v) => e with { Lv = v }).Keyed("lv"),
        Field.Optional<Transformer>("Rated power", "MVA", "", e => e.Mva, (e, v) => e with { Mva = v }).Keyed("mva"),
        Field.Optional<Transformer>("HV winding", "kV", "", e => e.HvKv, (e, v) => e with { HvKv = v }).Keyed("hvKv"),
        Field.Optional<Transformer>("LV winding", "kV", "", e => e.LvKv, (e, v) => e with { LvKv = v }).Keyed("lvKv"),
        Field.Optional<Transformer>("Impedance", "%", "", e => e.ZPercent, (e, v) => e with { ZPercent = v }).Keyed("zPercent"),
        Field.Optional<Transformer>("X/R", "", "", e => e.Xr, (e, v) => e with { Xr = v }).Keyed("xr"),
        Field.Optional<Transformer>("Zero-seq. imp.", "%", "= Z", e => e.Z0Percent, (e, v) => e with { Z0Percent = v }).Keyed("z0Percent"),
        Field.Integer<Transformer>("Units", "", 1, e => e.Units, (e, v) => e with { Units = v }).Keyed("units"),
        Field.Text<Transformer>("Vector group", e => e.VectorGroup, (e, v) => e with { VectorGroup = v }).Keyed("vectorGroup"),
        .. WindingFields.Earthing<Transformer>("HV", "hvNeutral", e => e.HvNeutral, (e, n) => e with { HvNeutral = n }),
        .. WindingFields.Earthing<Transformer>("LV", "lvNeutral", e => e.LvNeutral, (e, n) => e with { LvNeutral = n }),
        .. TapFields.For<Transformer>(e => e.Tap, (e, t) => e with { Tap = TapFields.Normalise(t) }),
        Field.Optional<Transformer>("Phase shift", "°", "from group", e => e.PhaseShiftDeg, (e, v) => e with { PhaseShiftDeg = v }).Keyed("phaseShiftDeg"),
        .. WindingFields.NoLoad<Transformer>(e => e.NoLoad, (e, n) => e with { NoLoad = n }),
        Field.Optional<Transformer>("Loading rating", "MVA", "= rating", e => e.RatingMva, (e, v) => e with { RatingMva = v }).Keyed("ratingMva"),
        Field.Optional<Transformer>("R (pu form)", "pu", "", e => e.RPu, (e, v) => e with { RPu = v }).Keyed("rPu"),
        Field.Optional<Transformer>("X (pu form)", "pu", "", e => e.XPu, (e, v) => e with { XPu = v }).Keyed("xPu"),
        Field.Optional<Transformer>("B (pu form)", "pu", "0", e => e.BPu, (e, v) => e with { BPu = v }).Keyed("bPu"),
        Field.Optional<Transformer>("Ratio (pu form)", "pu", "1", e => e.Ratio, (e, v) => e with { Ratio = v }).Keyed("ratio"),
        Field.Flag<Transformer>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    public static IReadOnlyList<ElementField> ThreeWinding { get; } =
    [
        Field.Id<ThreeWindingTransformer>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<ThreeWindingTransformer>("HV bus", e => e.Hv, (e, v) => e with { Hv = v }).Keyed("hv"),
        Field.BusRef<ThreeWindingTransformer>("MV bus", e => e.Mv, (e, v) => e with { Mv = v }).Keyed("mv"),
        Field.BusRef<ThreeWindingTransformer>("LV bus", e => e.Lv, (e, v) => e with { Lv = v }).Keyed("lv"),
        Field.RequiredNumber<ThreeWindingTransformer>("HV winding", "kV", e => e.HvKv, (e, v) => e with { HvKv = v }).Keyed("hvKv"),
        Field.RequiredNumber<ThreeWindingTransformer>("MV winding", "kV", e => e.MvKv, (e, v) => e with { MvKv = v }).Keyed("mvKv"),
        Field.RequiredNumber<ThreeWindingTransformer>("LV winding", "kV", e => e.LvKv, (e, v) => e with { LvKv = v }).Keyed("lvKv"),
        Field.Number<ThreeWindingTransformer>("HV rating", "MVA", 0, e => e.MvaHv, (e, v) => e with { MvaHv = v }).Keyed("mvaHv"),
        Field.Number<ThreeWindingTransformer>("MV rating", "MVA", 0, e => e.MvaMv, (e, v) => e with { MvaMv = v }).Keyed("mvaMv"),
        Field.Number<ThreeWindingTransformer>("LV rating", "MVA", 0, e => e.MvaLv, (e, v) => e with { MvaLv = v }).Keyed("mvaLv"),
        Field.RequiredNumber<ThreeWindingTransformer>("Impedance HV-MV", "%", e => e.ZHmPercent, (e, v) => e with { ZHmPercent = v }).Keyed("zHmPercent"),
        Field.RequiredNumber<ThreeWindingTransformer>("Impedance HV-LV", "%", e => e.ZHlPercent, (e, v) => e with { ZHlPercent = v }).Keyed("zHlPercent"),
        Field.RequiredNumber<ThreeWindingTransformer>("Impedance MV-LV", "%", e => e.ZMlPercent, (e, v) => e with { ZMlPercent = v }).Keyed("zMlPercent"),
        Field.RequiredNumber<ThreeWindingTransformer>("Impedance base", "MVA", e => e.ZBaseMva, (e, v) => e with { ZBaseMva = v }).Keyed("zBaseMva"),
        Field.Number<ThreeWindingTransformer>("X/R", "", 30, e => e.Xr, (e, v) => e with { Xr = v }).Keyed("xr"),
        Field.Text<ThreeWindingTransformer>("Vector group", e => e.VectorGroup, (e, v) => e with { VectorGroup = v }).Keyed("vectorGroup"),
        .. WindingFields.Earthing<ThreeWindingTransformer>("HV", "hvNeutral", e => e.HvNeutral, (e, n) => e with { HvNeutral = n }),
        .. WindingFields.Earthing<ThreeWindingTransformer>("MV", "mvNeutral", e => e.MvNeutral, (e, n) => e with { MvNeutral = n }),
        .. WindingFields.Earthing<ThreeWindingTransformer>("LV", "lvNeutral", e => e.LvNeutral, (e, n) => e with { LvNeutral = n }),
        .. TapFields.For<ThreeWindingTransformer>(e => e.Tap, (e, t) => e with { Tap = TapFields.Normalise(t) }),
        .. WindingFields.NoLoad<ThreeWindingTransformer>(e => e.NoLoad, (e, n) => e with { NoLoad = n }),
        Field.Flag<ThreeWindingTransformer>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];
}
