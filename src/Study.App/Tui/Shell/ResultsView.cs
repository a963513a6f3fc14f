// The detail/result pane: a strip of tab names, then the shown tab (its notice on top, its content below).
using Study.App.Reports;
using Study.App.Tui.Choice;
using Study.App.Tui.Compare;
using Study.App.Tui.Faults;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Outages;
using Study.App.Tui.Profile;
using Study.App.Tui.Start;
using Study.App.Tui.Taps;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Shell;

/// <summary>One tab: a notice (out of date, failed) above its content. The notice takes no rows when there is none.</summary>
public sealed class ResultTab : View
{
    public ResultTab(string title, View content)
    {
        Title = title;
        Content = content;
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        Content.Y = Pos.Bottom(Notice);
        Add(Notice, Content);
    }

    public NoticeLine Notice { get; } = new();

    public View Content { get; }

    /// <summary>The tab's views that take focus, top to bottom then left to right (Tab walks them before leaving the pane).</summary>
    public IReadOnlyList<View> Focusables()
    {
        var found = new List<View>();
        static bool HasFocusableInside(View v) => v.SubViews.Any(c => c.Visible && (c.CanFocus || HasFocusableInside(c)));
        void Walk(View v)
        {
            foreach (View child in v.SubViews)
            {
                if (!child.Visible) continue;
                if (child.CanFocus && (child is TableView || !HasFocusableInside(child))) found.Add(child);
                else Walk(child);
            }
        }
        Walk(Content);
        if (found.Count == 0 && Content.CanFocus) found.Add(Content);
        return found.OrderBy(v => v.FrameToScreen().Y).ThenBy(v => v.FrameToScreen().X).ToList();
    }
}

/// <summary>Tabs: Detail, Buses, Branches, Faults, Taps, One-line, Chart, Outages, Compare (Alt+1 … Alt+9).</summary>
public sealed class ResultsView : FrameView
{
    private readonly TabStrip strip = new() { X = 0, Y = 0 };
    private readonly List<ResultTab> tabs = [];
    private readonly TextPane detail = new();
    private readonly HeadedTable buses = new(ResultTables.BusHeaders);
    private readonly HeadedTable branches = new(ResultTables.BranchHeaders);
    private readonly VoltageChartView chart = new();
    private readonly FaultView faults = new();
    private readonly TapStudyView tapStudy = new();
    private readonly OneLineView oneLine = new();
    private readonly OutageView outages = new();
    private readonly CompareView compare = new();
    private readonly StartView start = new();
    private readonly ProfileView profile = new();
    private readonly ChoiceView bankChoice = new();
    private ResultTab current;
    private LoadFlowResult? result;

    public ResultsView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        TabStop = TabBehavior.TabGroup;
        BorderStyle = LineStyle.Rounded;
        Add(strip);
        DetailTab = Tab("Detail", detail);
        BusesTab = Tab("Buses", buses);
        BranchesTab = Tab("Branches", branches);
        FaultsTab = Tab("Faults", faults);
        TapStudyTab = Tab("Taps", tapStudy);
        OneLineTab = Tab("One-line", oneLine);
        ChartTab = Tab("Chart", chart);
        OutagesTab = Tab("Outages", outages);
        CompareTab = Tab("Compare", compare);
        StartTab = Tab("Start", start);
        ProfileTab = Tab("Profile", profile);
        BankChoiceTab = Tab("Bank", bankChoice);
        strip.Titles = tabs.Select(t => t.Title).ToList();
        current = tabs[0];
        Show(current);
        buses.Table.RowScheme = BusRowScheme;
        buses.Heading = "No load flow yet: F5 solves.";
        branches.Heading = "No load flow yet: F5 solves.";
        PaneFocus.Mark(this);
    }

    public ResultTab DetailTab { get; }
    public ResultTab BusesTab { get; }
    public ResultTab BranchesTab { get; }
    public ResultTab FaultsTab { get; }
    public ResultTab TapStudyTab { get; }
    public ResultTab OneLineTab { get; }
    public ResultTab ChartTab { get; }
    public ResultTab OutagesTab { get; }
    public ResultTab CompareTab { get; }
    public ResultTab StartTab { get; }
    public ResultTab ProfileTab { get; }
    public ResultTab BankChoiceTab { get; }

    public IReadOnlyList<ResultTab> Tabs => tabs;

    /// <summary>The tab shown.</summary>
    public View Value
    {
        get => current;
        set
        {
            if (value is ResultTab tab && tabs.Contains(tab)) Show(tab);
        }
    }

    /// <summary>Raised when another tab is shown.</summary>
    public event Action? TabChanged;

    public OutageView Outages => outages;

    public FaultView Faults => faults;

    public TapStudyView TapStudy => tapStudy;

    public LoadFlowResult? Result
    {
        get => result;
        set
        {
            result = value;
            buses.Table.Source = value is null ? TextTableSource.Empty(ResultTables.BusHeaders) : ResultTables.Buses(value);
            branches.Table.Source = value is null ? TextTableSource.Empty(ResultTables.BranchHeaders) : ResultTables.Branches(value);
            string heading = value is null ? "No load flow yet: F5 solves." : ResultTables.Highlights(value);
            buses.Heading = heading;
            branches.Heading = heading;
            chart.Result = value;
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

    public CompareView Comparison => compare;

    public StartView Start => start;

    public ProfileView Profile => profile;

    public ChoiceView BankChoice => bankChoice;

    public IReadOnlyList<OneLineRow> OneLine
    {
        get => oneLine.Rows;
        set => oneLine.Rows = value;
    }

    public void ShowDetail(string text) => detail.Content = text;

    /// <summary>Sets or clears the notice of a tab (a failure is drawn white on red).</summary>
    public static void SetNotice(ResultTab tab, string? text, bool failure = false)
    {
        tab.Notice.IsFailure = failure;
        tab.Notice.Note = text;
    }

    /// <summary>The table a sort applies to: the focused one in the shown tab, else its first.</summary>
    public ResultTable? CurrentTable()
    {
        IReadOnlyList<ResultTable> tables = current.Focusables().OfType<ResultTable>().ToList();
        return tables.FirstOrDefault(t => t.HasFocus) ?? tables.FirstOrDefault();
    }

    /// <summary>Focus on the shown tab's first table (or its last view, coming back with Shift+Tab).</summary>
    public void FocusTab(bool last = false)
    {
        IReadOnlyList<View> views = current.Focusables();
        View target = views.Count == 0 ? current : last ? views[^1] : views.FirstOrDefault(v => v is ResultTable) ?? views[0];
        target.SetFocus();
    }

    /// <summary>Moves focus to the next view inside the shown tab; false when focus is on its last (first, going back).</summary>
    public bool FocusNextWithin(bool back)
    {
        IReadOnlyList<View> views = current.Focusables();
        int at = views.ToList().FindIndex(v => v.HasFocus);
        int next = at + (back ? -1 : 1);
        if (at < 0 || next < 0 || next >= views.Count) return false;
        views[next].SetFocus();
        return true;
    }

    private void Show(ResultTab tab)
    {
        bool focused = HasFocus;
        foreach (ResultTab t in tabs) t.Visible = t == tab;
        current = tab;
        strip.Selected = tabs.IndexOf(tab);
        SetNeedsLayout();
        if (focused) FocusTab();
        TabChanged?.Invoke();
    }

    private ResultTab Tab(string title, View content)
    {
        var tab = new ResultTab(title, content) { X = 0, Y = 1, Height = Dim.Fill() };
        tabs.Add(tab);
        Add(tab);
        return tab;
    }

    private Scheme? BusRowScheme(int row)
    {
        if (result is null || row < 0 || row >= result.Buses.Count) return null;
        ViolationKind v = result.Buses[row].Violation;
        if (v == ViolationKind.None) return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(new Attr(v == ViolationKind.Low ? ColorName16.BrightCyan : ColorName16.BrightRed, normal.Background));
    }
}
