// The columns of the load-flow result records: buses, branches, taps and violations.
using Study.App.Cli.Solve;
using Study.Core.LoadFlow;

namespace Study.App.Reports;

public static class LoadFlowColumns
{
    /// <summary>The report's bus table (and buses.csv); <paramref name="nameOf"/> gives the bus names the readable table shows.</summary>
    public static ColumnSpec<BusResult> Buses(Func<string, string?>? nameOf = null) => new ColumnSpec<BusResult>()
        .Text("id", "bus", b => b.Id)
        .Shown("name", b => Numbers.Text(nameOf?.Invoke(b.Id)))
        .Number("kv", "", "kV", b => b.Kv, 1, reads: b => Numbers.Fixed(Stated(b.Kv), 1))
        .Number("vPu", "V", "pu", b => b.VPu, 4, reads: b => b.Energised ? Numbers.Fixed(b.VPu, 4) : "dead")
        .Shown("", b => Marks.Of(b.Violation))
        .Number("vKv", "V", "kV", b => b.VKv, 2)
        .Number("angleDeg", "angle", "deg", b => b.AngleDeg, 2)
        .Number("pGenMw", "Pgen", "MW", b => b.PGenMw, 2, reads: b => Nonzero(b.PGenMw, 2))
        .Number("qGenMvar", "Qgen", "Mvar", b => b.QGenMvar, 2, reads: b => Nonzero(b.QGenMvar, 2))
        .Number("pLoadMw", "Pload", "MW", b => b.PLoadMw, 2, reads: b => Nonzero(b.PLoadMw, 2))
        .Number("qLoadMvar", "Qload", "Mvar", b => b.QLoadMvar, 2, reads: b => Nonzero(b.QLoadMvar, 2))
        .CsvOnly("violation", b => SolveJson.ViolationName(b.Violation));

    public static ColumnSpec<BranchResult> Branches { get; } = new ColumnSpec<BranchResult>()
        .Text("id", "branch", b => b.Id)
        .Text("kind", "kind", b => b.Kind)
        .Text("from", "from", b => b.From)
        .Text("to", "to", b => b.To)
        .Number("pFromMw", "P from", "MW", b => b.PFromMw, 2)
        .Number("qFromMvar", "Q from", "Mvar", b => b.QFromMvar, 2)
        .Number("pToMw", "P to", "MW", b => b.PToMw, 2)
        .Number("qToMvar", "Q to", "Mvar", b => b.QToMvar, 2)
        .Number("iFromA", "I from", "A", b => b.IFromA, 1)
        .CsvOnly("iToA", b => b.IToA)
        .Number("lossMw", "loss", "MW", b => b.LossMw, 3)
        .Number("lossMvar", "loss", "Mvar", b => b.LossMvar, 3)
        .Number("loadingPercent", "loading", "%", b => b.LoadingPercent, 1, mark: b => b.LoadingPercent > 100 ? Marks.Exceeded : "");

    public static ColumnSpec<TapResult> Taps { get; } = new ColumnSpec<TapResult>()
        .Text("id", "transformer", t => t.Id)
        .Integer("position", "position", null, t => t.Position)
        .Number("ratio", "ratio", null, t => t.Ratio, 4)
        .Words("regulating", "control", t => t.Regulating, t => t.Regulating ? $"on-load, holds {t.RegulatedBus}" : "fixed")
        .Words("atLimit", "status", t => t.AtLimit, t => t.AtLimit is null ? "" : $"at its {t.AtLimit} limit: wants to move further");

    /// <summary>Violations (violations.csv); the reports state them as sentences (LoadFlowReport.Describe).</summary>
    public static ColumnSpec<Violation> Violations { get; } = new ColumnSpec<Violation>()
        .Text("element", "element", v => v.Element)
        .Text("kind", "kind", v => v.Kind)
        .Text("type", "type", v => SolveJson.ViolationName(v.Type))
        .Number("value", "value", null, v => v.Value, 4, reads: v => Numbers.Fixed(v.Value, v.Type == ViolationKind.Overload ? 1 : 4))
        .Number("limit", "limit", null, v => v.Limit, 3);

    /// <summary>The Buses tab of the TUI: the band beside the voltage, ▼/▲ on the voltage itself.</summary>
    public static ColumnSpec<BusResult> ScreenBuses { get; } = new ColumnSpec<BusResult>()
        .Text("id", "Bus", b => b.Id)
        .Number("kv", "Base", "kV", b => b.Kv, 3, reads: b => Numbers.UpTo(Stated(b.Kv), 3))
        .Number("vPu", "V", "pu", b => b.VPu, 4, mark: b => Marks.Padded(b.Violation))
        .Number("vKv", "V", "kV", b => b.VKv, 3)
        .Number("angleDeg", "Angle", "°", b => b.AngleDeg, 2)
        .Shown("Band pu", b => $"{Numbers.Fixed(b.VMin, 2)}–{Numbers.Fixed(b.VMax, 2)}", Align.Right)
        .Number("pGenMw", "P gen", "MW", b => b.PGenMw, 3)
        .Number("qGenMvar", "Q gen", "Mvar", b => b.QGenMvar, 3)
        .Number("pLoadMw", "P load", "MW", b => b.PLoadMw, 3)
        .Number("qLoadMvar", "Q load", "Mvar", b => b.QLoadMvar, 3);

    /// <summary>The Branches tab of the TUI: loading before losses, ▲ above the rating.</summary>
    public static ColumnSpec<BranchResult> ScreenBranches { get; } = new ColumnSpec<BranchResult>()
        .Text("id", "Branch", b => b.Id)
        .Text("kind", "Kind", b => b.Kind)
        .Text("from", "From", b => b.From)
        .Text("to", "To", b => b.To)
        .Number("pFromMw", "P from", "MW", b => b.PFromMw, 3)
        .Number("qFromMvar", "Q from", "Mvar", b => b.QFromMvar, 3)
        .Number("pToMw", "P to", "MW", b => b.PToMw, 3)
        .Number("qToMvar", "Q to", "Mvar", b => b.QToMvar, 3)
        .Number("iFromA", "I from", "A", b => b.IFromA, 1)
        .Number("loadingPercent", "Loading", "%", b => b.LoadingPercent, 1,
            mark: b => b.LoadingPercent is double pct ? (pct > 100 ? Marks.High : " ") : "")
        .Number("lossMw", "Loss", "MW", b => b.LossMw, 4)
        .Number("lossMvar", "Loss", "Mvar", b => b.LossMvar, 4);

    /// <summary>A base kV of zero means "not stated": absent, not zero.</summary>
    public static double? Stated(double kv) => kv > 0 ? kv : null;

    /// <summary>Generation and load the bus does not have read as an empty cell, not as 0.00.</summary>
    private static string Nonzero(double value, int decimals) => Math.Abs(value) < 0.5e-6 ? "" : Numbers.Fixed(value, decimals);
}
