// The detail/result area: tabs for the selected element and for each kind of study result.
using Study.App.Reports;
using Study.App.Tui.Faults;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Outages;
using Study.App.Tui.Taps;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Shell;

/// <summary>Tabs: Detail, Buses, Branches, Faults, Tap study, One-line, Voltage chart, Outages.</summary>
public sealed class ResultsView : Tabs
{
    private readonly TextPane detail = new();
    private readonly TableView buses = ResultTable(ResultTables.BusHeaders);
    private readonly TableView branches = ResultTable(ResultTables.BranchHeaders);
    private readonly VoltageChartView chart = new();
    private readonly FaultView faults = new();
    private readonly TapStudyView tapStudy = new();
    private readonly OneLineView oneLine = new();
    private readonly OutageView outages = new();
    private LoadFlowResult? result;

    public ResultsView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        DetailTab = Tab("Detail", detail);
        BusesTab = Tab("Buses", buses);
        BranchesTab = Tab("Branches", branches);
        FaultsTab = Tab("Faults", faults);
        TapStudyTab = Tab("Tap study", tapStudy);
        OneLineTab = Tab("One-line", oneLine);
        ChartTab = Tab("Voltage chart", chart);
        OutagesTab = Tab("Outages", outages);
        buses.Style.RowColorGetter = args => BusRowScheme(args.RowIndex);
    }

    public View DetailTab { get; }
    public View BusesTab { get; }
    public View BranchesTab { get; }
    public View FaultsTab { get; }
    public View TapStudyTab { get; }
    public View OneLineTab { get; }
    public View ChartTab { get; }
    public View OutagesTab { get; }

    public LoadFlowResult? Result
    {
        get => result;
        set
        {
            result = value;
            buses.Table = value is null ? TextTableSource.Empty(ResultTables.BusHeaders) : ResultTables.Buses(value);
            branches.Table = value is null ? TextTableSource.Empty(ResultTables.BranchHeaders) : ResultTables.Branches(value);
            chart.Result = value;
            buses.Update();
            branches.Update();
        }
    }

    public FaultResult? FaultResult
    {
        get => faults.Result;
        set => faults.Result = value;
    }

    public TapStudyResult? TapStudyResult
    {
        get => tapStudy.Result;
        set => tapStudy.Result = value;
    }

    public OutageScreeningResult? OutageResult
    {
        get => outages.Result;
        set => outages.Result = value;
    }

    public IReadOnlyList<OneLineRow> OneLine
    {
        get => oneLine.Rows;
        set => oneLine.Rows = value;
    }

    public void ShowDetail(string text) => detail.Content = text;

    private Scheme? BusRowScheme(int row)
    {
        if (result is null || row < 0 || row >= result.Buses.Count) return null;
        ViolationKind v = result.Buses[row].Violation;
        if (v == ViolationKind.None) return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        var attr = new Attr(v == ViolationKind.Low ? ColorName16.BrightCyan : ColorName16.BrightRed, normal.Background);
        return new Scheme(attr);
    }

    private View Tab(string title, View content)
    {
        var tab = new View { Title = title, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        tab.Add(content);
        Add(tab);
        return tab;
    }

    /// <summary>A read-only table in the results style: full-row cursor, no outer lines.</summary>
    public static TableView ResultTable(string[] headers)
    {
        var table = new TableView { Table = TextTableSource.Empty(headers), Width = Dim.Fill(), Height = Dim.Fill(), FullRowSelect = true };
        table.Style.ShowHorizontalHeaderOverline = false;
        table.Style.ShowHorizontalBottomLine = false;
        return table;
    }
}
