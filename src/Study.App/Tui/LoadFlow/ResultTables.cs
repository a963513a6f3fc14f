// Load-flow results for the Buses and Branches tabs, through their column specs (LoadFlowColumns).
using Study.App.Reports;
using Study.Core.LoadFlow;

namespace Study.App.Tui.LoadFlow;

/// <summary>The bus table marks low and high voltages ▼/▲; the branch table marks loading above the rating ▲.</summary>
public static class ResultTables
{
    /// <summary>The bus columns without the names, which the table's neighbours already show.</summary>
    private static readonly ColumnSpec<BusResult> ScreenBuses = LoadFlowColumns.Buses()
        .Select("id", "kv", "vPu", "vKv", "angleDeg", "band pu", "pGenMw", "qGenMvar", "pLoadMw", "qLoadMvar");

    public static string[] BusHeaders => ScreenBuses.Headings;

    public static string[] BranchHeaders => LoadFlowColumns.Branches.Headings;

    public static TextTableSource Buses(LoadFlowResult r) => TextTableSource.Of(ScreenBuses, r.Buses);

    public static TextTableSource Branches(LoadFlowResult r) => TextTableSource.Of(LoadFlowColumns.Branches, r.Branches);

    /// <summary>The line above both tables: lowest and highest voltage, most loaded branch, loss.</summary>
    public static string Highlights(LoadFlowResult r) => LoadFlowHighlights.Line(r);
}
