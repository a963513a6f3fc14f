// The main screen: menu bar, element list by kind, the kind's table, the detail/result tabs, status line.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.LoadFlow;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Terminal.Gui.App;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>
/// Composes the panes and shows the session's state; <see cref="MainCommands"/> does what the keys ask.
/// At 80×24: menu on row 0, panes in between, status on row 23. Larger screens give the table and
/// the results more rows and the element list more columns.
/// </summary>
public sealed class MainWindow : Window
{
    private readonly ListView kindList = new() { Width = Dim.Fill(), Height = Dim.Fill() };
    private readonly FrameView listFrame = new() { X = 0, Y = 1, Height = Dim.Fill(1) };
    private readonly FrameView tableFrame = new() { Y = 1, Width = Dim.Fill() };
    // No frame of its own: the tabs draw their borders, and at 80×24 every row counts.
    private readonly View resultsFrame = new() { Width = Dim.Fill(), Height = Dim.Fill(1), CanFocus = true, TabStop = TabBehavior.TabGroup };
    private bool enlarged;
    private ElementKind kind = ElementKind.Bus;

    public MainWindow(IApplication app, EditSession session)
    {
        App = app;
        Session = session;
        BorderStyle = LineStyle.None;
        Runner = new StudyRunner(app);
        Commands = new MainCommands(this);

        listFrame.Width = Dim.Func(_ => app.Screen.Width >= 120 ? 28 : 22);
        // A short screen keeps five table rows and gives the rest to the results (nine buses fit at 80×24).
        tableFrame.Height = Dim.Func(_ => enlarged ? 0 : app.Screen.Height <= 30 ? 7 : app.Screen.Height * 42 / 100);
        tableFrame.X = Pos.Right(listFrame);
        resultsFrame.X = Pos.Right(listFrame);
        resultsFrame.Y = Pos.Bottom(tableFrame);
        Table = new TableView { Width = Dim.Fill(), Height = Dim.Fill(), FullRowSelect = true };
        Table.Style.ShowHorizontalHeaderOverline = false;
        Table.Style.ShowHorizontalBottomLine = false;
        listFrame.Add(kindList);
        tableFrame.Add(Table);
        resultsFrame.Add(Results);
        Add(MenuFactory.Build(Commands), listFrame, tableFrame, resultsFrame, Status);

        kindList.ValueChanged += (_, _) => ShowKind(SelectedKindFromList());
        Table.ValueChanged += (_, _) => ShowDetail();
        Table.Accepted += (_, _) => Commands.Do(TuiAction.Edit);
        session.Changed += Refresh;
        Runner.StateChanged += RefreshStatus;
        Refresh();
    }

    public new IApplication App { get; }
    public EditSession Session { get; private set; }
    public StudyRunner Runner { get; }
    public MainCommands Commands { get; }
    public TableView Table { get; }
    public ResultsView Results { get; } = new();
    public StatusView Status { get; } = new();
    public LoadFlowResult? LastResult { get; private set; }
    public ElementKind SelectedKind => kind;

    /// <summary>True while the results take the whole right side (the element table is hidden).</summary>
    public bool EnlargeResults
    {
        get => enlarged;
        set
        {
            enlarged = value;
            tableFrame.Visible = !value;
            if (value) Results.SetFocus();
            else Table.SetFocus();
            SetNeedsLayout();
        }
    }

    /// <summary>The id of the element under the table cursor, if any.</summary>
    public string? SelectedId
    {
        get
        {
            IReadOnlyList<string> ids = ElementLists.Ids(Session.Network, kind);
            int row = Table.Value?.SelectedCell.Y ?? -1;
            return row >= 0 && row < ids.Count ? ids[row] : null;
        }
    }

    /// <summary>Replaces the session (after Open); results of the old network are dropped.</summary>
    public void UseSession(EditSession next)
    {
        Session.Changed -= Refresh;
        Session = next;
        Session.Changed += Refresh;
        ShowResult(null);
        Results.FaultResult = null;
        Results.TapStudyResult = null;
        Results.OutageResult = null;
        Refresh();
    }

    public void ShowResult(LoadFlowResult? result)
    {
        LastResult = result;
        Results.Result = result;
        RefreshOneLine();
        RefreshStatus();
    }

    /// <summary>Tab and Shift+Tab move between the three panes: element kinds, the kind's table, the results.</summary>
    public void FocusNextPane(bool back)
    {
        View[] panes = enlarged ? [kindList, Results] : [kindList, Table, Results];
        int at = Array.FindIndex(panes, p => p.HasFocus);
        int next = at < 0 ? 0 : (at + (back ? panes.Length - 1 : 1)) % panes.Length;
        panes[next].SetFocus();
    }

    /// <summary>Shows a study's tab; on a short screen the results take the element table's rows too (Alt+R gives them back).</summary>
    public void ShowStudyTab(View tab)
    {
        if (App.Screen.Height <= 30 && !enlarged) EnlargeResults = true;
        Results.Value = tab;
    }

    public void Select(ElementKind k, string? id)
    {
        ShowKind(k);
        kindList.SelectedItem = ElementLists.Kinds.ToList().IndexOf(k);
        int row = id is null ? -1 : ElementLists.Ids(Session.Network, k).ToList().IndexOf(id);
        if (row >= 0) Table.SetSelection(0, row, false);
        ShowDetail();
    }

    public void Refresh()
    {
        int selected = kindList.SelectedItem ?? 0;
        kindList.SetSource(new System.Collections.ObjectModel.ObservableCollection<string>(
            ElementLists.Kinds.Select(k => $"{ElementFields.Plural(k)} ({ElementLists.Count(Session.Network, k)})")));
        kindList.SelectedItem = selected;
        string name = Session.Path is null ? "untitled" : System.IO.Path.GetFileName(Session.Path);
        listFrame.Title = (Session.Dirty ? "*" : "") + name;
        ShowKind(kind);
        RefreshOneLine();
        RefreshStatus();
    }

    public void RefreshStatus() =>
        Status.Summary = StatusLine.Summary(LastResult, Session.ActiveScenario, Runner.Progress);

    /// <summary>The one-line view shows the network as edited, with the last solve's values when it is of this network.</summary>
    private void RefreshOneLine()
    {
        Network n = Session.Network;
        Scenario? scenario = Session.ActiveScenario is { } name ? n.FindScenario(name) : null;
        Results.OneLine = OneLineLayout.Build(n, LastResult, scenario);
    }

    private ElementKind SelectedKindFromList()
    {
        int i = kindList.SelectedItem ?? 0;
        return ElementLists.Kinds[Math.Clamp(i, 0, ElementLists.Kinds.Count - 1)];
    }

    private void ShowKind(ElementKind k)
    {
        int row = k == kind ? Table.Value?.SelectedCell.Y ?? 0 : 0;
        kind = k;
        TextTableSource table = ElementTable.Build(Session.Network, k);
        Table.Table = table;
        tableFrame.Title = $"{ElementFields.Plural(k)} ({table.Rows})";
        if (table.Rows > 0) Table.SetSelection(0, Math.Clamp(row, 0, table.Rows - 1), false);
        Table.Update();
        ShowDetail();
    }

    private void ShowDetail()
    {
        string? id = SelectedId;
        Results.ShowDetail(id is null ? $"No {ElementKinds.Label(kind)} yet: Ins adds one." : ElementDetail.Describe(Session.Network, kind, id));
    }
}
