// The detail/result area: tabs for the selected element and for each kind of study result.
using Study.Core.LoadFlow;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui;

/// <summary>Tabs: Detail, Buses, Branches, Faults, Tap study, One-line, Voltage chart.</summary>
public sealed class ResultsView : Tabs
{
    public const string FaultCaution =
        "Fault levels, equipment duty and protection settings from this program are planning estimates; " +
        "they must be confirmed by a licensed protection engineer against the governing local code and the " +
        "utility's data before equipment is specified, set or energised.";

    private readonly TextPane detail = new();
    private readonly TableView buses = ResultTable(ResultTables.BusHeaders);
    private readonly TableView branches = ResultTable(ResultTables.BranchHeaders);
    private readonly VoltageChartView chart = new();
    private LoadFlowResult? result;

    public ResultsView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        DetailTab = Tab("Detail", detail);
        BusesTab = Tab("Buses", buses);
        BranchesTab = Tab("Branches", branches);
        FaultsTab = Tab("Faults", Message("No fault study yet (F7).\n\n" + FaultCaution));
        TapStudyTab = Tab("Tap study", Message("No tap study yet (F8)."));
        OneLineTab = Tab("One-line", Message("The one-line view is not in this build yet."));
        ChartTab = Tab("Voltage chart", chart);
        buses.Style.RowColorGetter = args => BusRowScheme(args.RowIndex);
    }

    public View DetailTab { get; }
    public View BusesTab { get; }
    public View BranchesTab { get; }
    public View FaultsTab { get; }
    public View TapStudyTab { get; }
    public View OneLineTab { get; }
    public View ChartTab { get; }

    public LoadFlowResult? Result
    {
        get => result;
        set
        {
            result = value;
            buses.Table = value is null ? TextTable.Empty(ResultTables.BusHeaders) : ResultTables.Buses(value);
            branches.Table = value is null ? TextTable.Empty(ResultTables.BranchHeaders) : ResultTables.Branches(value);
            chart.Result = value;
            buses.Update();
            branches.Update();
        }
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

    private static TextPane Message(string text) => new() { Content = text };

    private static TableView ResultTable(string[] headers)
    {
        var table = new TableView { Table = TextTable.Empty(headers), Width = Dim.Fill(), Height = Dim.Fill(), FullRowSelect = true };
        table.Style.ShowHorizontalHeaderOverline = false;
        table.Style.ShowHorizontalBottomLine = false;
        return table;
    }
}
