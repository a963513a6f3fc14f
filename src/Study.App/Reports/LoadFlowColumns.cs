// The columns of the load-flow result records: buses, branches, taps and violations.
using Study.App.Cli.Solve;
using Study.Core.LoadFlow;

namespace Study.App.Reports;

public static class LoadFlowColumns
{
    /// <summary>
    /// Buses in every output: the report, buses.csv and the TUI's Buses tab (▼ below the band, ▲ above,
    /// on the voltage itself); <paramref name="nameOf"/> gives the bus names the report shows.
    /// </summary>
    public static ColumnSpec<BusResult> Buses(Func<string, string?>? nameOf = null) => new ColumnSpec<BusResult>()
        .Text("id", "bus", b => b.Id)
        .Shown("name", b => Numbers.Text(nameOf?.Invoke(b.Id)))
        .Number("kv", "base", "kV", b => Stated(b.Kv), 3, reads: b => BaseKv(b.Kv))
        .Number("vPu", "V", "pu", b => b.VPu, 4, reads: b => b.Energised ? Numbers.Fixed(b.VPu, 4) + Marks.Padded(b.Violation) : "dead")
        .Number("vKv", "V", "kV", b => b.VKv, 2, reads: b => Numbers.Fixed(b.VKv, b.Kv is > 0 and < 1 ? 3 : 2))
        .Number("angleDeg", "angle", "°", b => b.AngleDeg, 2)
        .Shown("band pu", b => $"{Numbers.Fixed(b.VMin, 2)}–{Numbers.Fixed(b.VMax, 2)}", Align.Right)
        .Number("pGenMw", "P gen", "MW", b => b.PGenMw, 2, reads: b => Nonzero(b.PGenMw, 2))
        .Number("qGenMvar", "Q gen", "Mvar", b => b.QGenMvar, 2, reads: b => Nonzero(b.QGenMvar, 2))
        .Number("pLoadMw", "P load", "MW", b => b.PLoadMw, 2, reads: b => Nonzero(b.PLoadMw, 2))
        .Number("qLoadMvar", "Q load", "Mvar", b => b.QLoadMvar, 2, reads: b => Nonzero(b.QLoadMvar, 2))
        .CsvOnly("violation", b => SolveJson.ViolationName(b.Violation));

    /// <summary>
    /// Branches in every output, nested by end: each end's bus, MW, Mvar and current, the loss, and the
    /// loading as a percentage of the rating (▲ above it). CSV keys are dotted (from.mw, loss.mw, pct.rating).
    /// </summary>
    public static ColumnSpec<BranchResult> Branches { get; } = new ColumnSpec<BranchResult>()
        .Text("id", "branch", b => b.Id)
        .Text("kind", "kind", b => Labels.Kind(b.Kind))
        .Text("from.bus", "from", b => b.From)
        .Text("to.bus", "to", b => b.To)
        .Number("from.mw", "from end", "MW", b => b.PFromMw, 2)
        .Number("from.mvar", "from end", "Mvar", b => b.QFromMvar, 2)
        .Number("to.mw", "to end", "MW", b => b.PToMw, 2)
        .Number("to.mvar", "to end", "Mvar", b => b.QToMvar, 2)
        .Number("from.amps", "from end", "A", b => b.IFromA, 1)
        .Number("to.amps", "to end", "A", b => b.IToA, 1)
        .Number("loss.mw", "loss", "MW", b => b.LossMw, 3)
        .Number("loss.mvar", "loss", "Mvar", b => b.LossMvar, 3)
        .Number("pct.rating", "% of rating", null, b => b.LoadingPercent, 1, mark: b => b.LoadingPercent > 100 ? " " + Marks.High : "");

    public static ColumnSpec<TapResult> Taps { get; } = new ColumnSpec<TapResult>()
        .Text("id", "transformer", t => t.Id)
        .Integer("position", "position", null, t => t.Position)
        .Number("ratio", "ratio", null, t => t.Ratio, 4)
        .Words("regulating", "control", t => t.Regulating, t => t.Regulating ? $"on-load, holds {t.RegulatedBus}" : "fixed")
        .Words("atLimit", "status", t => Labels.Limit(t.AtLimit), t => t.AtLimit is null ? "" : $"at its {Labels.Limit(t.AtLimit)} position: wants to move further");

    /// <summary>Violations (violations.csv); the reports state them as sentences (LoadFlowReport.Describe).</summary>
    public static ColumnSpec<Violation> Violations { get; } = new ColumnSpec<Violation>()
        .Text("element", "element", v => v.Element)
        .Text("kind", "kind", v => Labels.Kind(v.Kind))
        .Text("type", "type", v => SolveJson.ViolationName(v.Type))
        .Number("value", "value", null, v => v.Value, 4, reads: v => Numbers.Fixed(v.Value, v.Type == ViolationKind.Overload ? 1 : 4))
        .Number("limit", "limit", null, v => v.Limit, 3);

    /// <summary>A base kV of zero means "not stated": absent, not zero.</summary>
    public static double? Stated(double kv) => kv > 0 ? kv : null;

    /// <summary>A base kV as stated on the nameplate, to the volt: "132", "33", "0.415" (one decimal read 0.415 kV as 0.4).</summary>
    public static string BaseKv(double kv) => Numbers.UpTo(Stated(kv), 3);

    // V kV takes a third decimal below 1 kV, so a 415 V board reads 0.403, not 0.40 (to the volt, as the base does).

    /// <summary>Generation and load the bus does not have read as an empty cell, not as 0.00.</summary>
    private static string Nonzero(double value, int decimals) => Math.Abs(value) < 0.5e-6 ? "" : Numbers.Fixed(value, decimals);
}
