// Load-flow results for the Buses and Branches tabs, through their column specs (LoadFlowColumns).
using Study.App.Reports;
using Study.Core.LoadFlow;

namespace Study.App.Tui.LoadFlow;

/// <summary>The bus table marks low and high voltages ▼/▲; the branch table marks loading above the rating ▲.</summary>
public static class ResultTables
{
    public static string[] BusHeaders => LoadFlowColumns.ScreenBuses.Headings;

    public static string[] BranchHeaders => LoadFlowColumns.ScreenBranches.Headings;

    public static TextTableSource Buses(LoadFlowResult r) => TextTableSource.Of(LoadFlowColumns.ScreenBuses, r.Buses);

    public static TextTableSource Branches(LoadFlowResult r) => TextTableSource.Of(LoadFlowColumns.ScreenBranches, r.Branches);
}
