// The main screen: menu bar, element list by kind, the kind's table, the detail/result tabs, status line.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Taps;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Terminal.Gui.App;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>The kinds of result the screen holds, each shown in one or more tabs.</summary>
public enum ResultKind { LoadFlow, Fault, Taps, Outages, Compare, Start, Profile, BankChoice }

/// <summary>
/// What a result was computed from: the networks it holds for (the one studied, and any the user made
/// from it without changing what it answers, such as applying its recommended tap), and the scenario
/// when the result depends on it. Networks are immutable records, so "the same network" is the same
/// reference, and undo back to it makes the result current again.
/// </summary>
public sealed class ResultStamp(Network network, string? scenario, bool scenarioMatters)
{
    private readonly HashSet<Network> networks = new(ReferenceEqualityComparer.Instance) { network };

    public Network Network { get; } = network;
    public string? Scenario { get; } = scenario;
    public bool ScenarioMatters { get; } = scenarioMatters;

    public void AlsoHoldsFor(Network n) => networks.Add(n);

    /// <summary>Why the result, a <paramref name="study"/>, no longer answers for <paramref name="now"/> in <paramref name="scenarioNow"/>; null when it does.</summary>
    public string? WhyOutOfDate(Network now, string? scenarioNow, string study = "result")
    {
        if (!networks.Contains(now)) return $"the network was edited after this {study}";
        if (ScenarioMatters && Scenario != scenarioNow)
            return $"this {study} is of {Labels.Scenario(Scenario)}; studies now run in {Labels.Scenario(scenarioNow)}";
        return null;
    }
}

/// <summary>
/// Composes the panes and shows the session's state; <see cref="MainCommands"/> does what the keys ask.
/// At 80×24: menu on row 0, panes in between, status on row 23. Larger screens give the table and
/// the results more rows and the element list more columns. The pane with the keyboard has a double
/// border and "▶" before its title. Every result tab says when its result no longer matches the
/// network or scenario being edited, and the status line says so too.
/// </summary>
public sealed class MainWindow : Window
{
    private readonly ListView kindList = new() { Width = Dim.Fill(), Height = Dim.Fill() };
    private readonly FrameView listFrame = new() { X = 0, Y = 1, Height = Dim.Fill(1) };
    private readonly FrameView tableFrame = new() { Y = 1, Width = Dim.Fill() };
    private readonly Dictionary<ResultKind, ResultStamp> stamps = [];
    private readonly Dictionary<ResultKind, string> failures = [];
    private bool enlarged;
    private ElementKind kind = ElementKind.Bus;

    public MainWindow(IApplication app, EditSession session, Func<DateTime>? clock = null)
    {
        App = app;
        Session = session;
        BorderStyle = LineStyle.None;
        Runner = new StudyRunner(app, clock);
        Commands = new MainCommands(this);

        listFrame.Width = Dim.Func(_ => ListHidden ? 0 : app.Screen.Width >= 120 ? 28 : 22);
        // A short screen keeps five table rows and gives the rest to the results (nine buses fit at 80×24);
        // a tall one gives the table the rows its elements need, up to 42 %, and the results the rest.
        tableFrame.Height = Dim.Func(_ => enlarged ? 0 : app.Screen.Height <= 30 ? 7
            : Math.Clamp((Table?.Source.Rows ?? 0) + 4, 7, app.Screen.Height * 42 / 100));
        tableFrame.X = Pos.Right(listFrame);
        Results.X = Pos.Right(listFrame);
        Results.Y = Pos.Bottom(tableFrame);
        Results.Height = Dim.Fill(1);
        Results.Title = "Results";
        Table = new ResultTable();
        listFrame.Add(kindList);
        tableFrame.Add(Table);
        PaneFocus.Mark(listFrame);
        PaneFocus.Mark(tableFrame);
        Add(MenuFactory.Build(Commands), listFrame, tableFrame, Results, Status);

        kindList.ValueChanged += (_, _) => ShowKind(SelectedKindFromList());
        Table.ValueChanged += (_, _) => ShowDetail();
        Table.Accepted += (_, _) => Commands.Do(TuiAction.Edit);
        Results.Outages.Opened += Commands.Studies.OutageDetail;
        session.Changed += Refresh;
        Runner.StateChanged += RefreshStatus;
        Refresh();
    }

    public new IApplication App { get; }
    public EditSession Session { get; private set; }
    public StudyRunner Runner { get; }
    public MainCommands Commands { get; }
    public ResultTable Table { get; }
    public ResultsView Results { get; } = new();
    public StatusView Status { get; } = new();
    public LoadFlowResult? LastResult { get; private set; }
    public ElementKind SelectedKind => kind;

    /// <summary>The element list gives its columns to the results too when they are enlarged on a narrow screen.</summary>
    private bool ListHidden => enlarged && App.Screen.Width < 120;

    /// <summary>True while the results take the whole right side (the element table is hidden; on a narrow screen the list too).</summary>
    public bool EnlargeResults
    {
        get => enlarged;
        set
        {
            enlarged = value;
            tableFrame.Visible = !value;
            listFrame.Visible = !ListHidden;
            if (value) Results.FocusTab();
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
            int row = Table.SelectedRow ?? -1;
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
        Results.Comparison.Show(null);
        Results.Start.Result = null;
        Results.Profile.Show(null);
        Results.BankChoice.Show(null);
        stamps.Clear();
        failures.Clear();
        Refresh();
    }

    /// <summary>Shows a load flow (or clears it with null), computed from what <paramref name="of"/> says (default: the network and scenario as they are now).</summary>
    public void ShowResult(LoadFlowResult? result, ResultStamp? of = null)
    {
        LastResult = result;
        Results.Result = result;
        if (result is null) stamps.Remove(ResultKind.LoadFlow);
        else stamps[ResultKind.LoadFlow] = of ?? Now();
        failures.Remove(ResultKind.LoadFlow);
        RefreshOneLine();
        RefreshNotices();
        RefreshStatus();
    }

    /// <summary>A stamp of the network and scenario as they are now, to take before a study starts.</summary>
    public ResultStamp Now(bool scenarioMatters = true) => new(Session.Network, Session.ActiveScenario, scenarioMatters);

    /// <summary>Records what a result of <paramref name="what"/> was computed from (taken with <see cref="Now"/> when the study started).</summary>
    public void Stamp(ResultKind what, ResultStamp stamp)
    {
        stamps[what] = stamp;
        failures.Remove(what);
        RefreshOneLine();
        RefreshNotices();
        RefreshStatus();
    }

    public ResultStamp? StampOf(ResultKind what) => stamps.GetValueOrDefault(what);

    /// <summary>
    /// A study that failed: its old result is taken off the screen (so nothing stale stands as if it
    /// were the answer) and its tabs say why.
    /// </summary>
    public void Fail(ResultKind what, string message)
    {
        switch (what)
        {
            case ResultKind.LoadFlow:
                LastResult = null;
                Results.Result = null;
                RefreshOneLine();
                break;
            case ResultKind.Fault: Results.FaultResult = null; break;
            case ResultKind.Taps: Results.TapStudyResult = null; break;
            case ResultKind.Outages: Results.OutageResult = null; break;
            case ResultKind.Compare: Results.Comparison.Show(null); break;
            case ResultKind.Start: Results.Start.Result = null; break;
            case ResultKind.Profile: Results.Profile.Show(null); break;
            case ResultKind.BankChoice: Results.BankChoice.Show(null); break;
        }
        stamps.Remove(what);
        failures[what] = message;
        // One row: the first line of the message; the tab's notice gives the rest.
        string first = message.Split('\n')[0].TrimEnd(':', ' ');
        Status.Message = first.Length < message.TrimEnd().Length ? first + " (in full in the tab)" : first;
        RefreshNotices();
        RefreshStatus();
    }

    /// <summary>True when some result on screen no longer matches the network or scenario being edited.</summary>
    public bool AnyOutOfDate => stamps.Values.Any(s => s.WhyOutOfDate(Session.Network, Session.ActiveScenario) is not null);

    /// <summary>
    /// Tab and Shift+Tab move between the panes: element kinds, the kind's table, the results. Inside the
    /// results they walk the shown tab's tables first (fault levels, then breaker duty).
    /// </summary>
    public void FocusNextPane(bool back)
    {
        if (Results.HasFocus && Results.FocusNextWithin(back)) return;
        View[] panes = new View?[] { ListHidden ? null : kindList, enlarged ? null : Table, Results }.OfType<View>().ToArray();
        int at = Array.FindIndex(panes, p => p.HasFocus);
        int next = at < 0 ? 0 : (at + (back ? panes.Length - 1 : 1)) % panes.Length;
        if (panes[next] == Results) Results.FocusTab(last: back);
        else panes[next].SetFocus();
    }

    /// <summary>Shows a study's tab; on a short screen the results take the element table's rows too (Alt+R gives them back).</summary>
    public void ShowStudyTab(View tab)
    {
        if (App.Screen.Height <= 30 && !enlarged) EnlargeResults = true;
        Results.Value = tab;
        Results.FocusTab();
    }

    public void Select(ElementKind k, string? id)
    {
        ShowKind(k);
        kindList.SelectedItem = ElementLists.Kinds.ToList().IndexOf(k);
        int row = id is null ? -1 : ElementLists.Ids(Session.Network, k).ToList().IndexOf(id);
        if (row >= 0) Table.SelectedRow = row;
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
        RefreshTapHeading();
        RefreshNotices();
        RefreshStatus();
    }

    public void RefreshStatus() =>
        Status.Summary = StatusLine.Summary(LastResult, Session.ActiveScenario, Runner.Progress, AnyOutOfDate,
            failed: failures.ContainsKey(ResultKind.LoadFlow));

    /// <summary>Each result tab's notice: failed, not converged, or out of date and which key runs it again.</summary>
    private void RefreshNotices()
    {
        Network now = Session.Network;
        string? scenario = Session.ActiveScenario;
        void Set(ResultKind what, string study, string rerun, bool notConverged, params ResultTab[] tabs)
        {
            string? text = null;
            bool failure = false;
            if (failures.TryGetValue(what, out string? failed)) (text, failure) = ($"FAILED: {failed}. The last result was cleared; {rerun} runs it again.", true);
            else if (stamps.TryGetValue(what, out ResultStamp? stamp) && stamp.WhyOutOfDate(now, scenario, study) is { } why)
                text = $"OUT OF DATE: {why}. {rerun} runs it again.";
            else if (notConverged) (text, failure) = ("NOT CONVERGED: the values are the last iterate, not a solution.", true);
            foreach (ResultTab tab in tabs) ResultsView.SetNotice(tab, text, failure);
        }
        Set(ResultKind.LoadFlow, "load flow", "F5", LastResult is { Converged: false },
            Results.BusesTab, Results.BranchesTab, Results.ChartTab, Results.OneLineTab);
        Set(ResultKind.Fault, "fault study", "F7", false, Results.FaultsTab);
        Set(ResultKind.Taps, "tap study", "F8", false, Results.TapStudyTab);
        Set(ResultKind.Outages, "outage screening", "Alt+U", false, Results.OutagesTab);
        Set(ResultKind.Compare, "comparison", "Alt+C", false, Results.CompareTab);
        Set(ResultKind.Start, "motor start", "Alt+M", false, Results.StartTab);
        Set(ResultKind.Profile, "profile", "Alt+L", false, Results.ProfileTab);
        Set(ResultKind.BankChoice, "bank choice", "Alt+B", false, Results.BankChoiceTab);
    }

    /// <summary>The one-line view shows the network as edited, with the last solve's values only while they are of this network.</summary>
    private void RefreshOneLine()
    {
        Network n = Session.Network;
        Scenario? scenario = Session.ActiveScenario is { } name ? n.FindScenario(name) : null;
        bool current = stamps.TryGetValue(ResultKind.LoadFlow, out ResultStamp? stamp) && stamp.WhyOutOfDate(n, Session.ActiveScenario) is null;
        Results.OneLine = OneLineLayout.Build(n, current ? LastResult : null, scenario);
    }

    /// <summary>The tap study's heading says where the studied tap stands in the network now.</summary>
    private void RefreshTapHeading()
    {
        if (Results.TapStudyResult is not { } r) return;
        Network n = Session.Network;
        TapChanger? tap = n.Transformers.FirstOrDefault(t => t.Id == r.Transformer)?.Tap
            ?? n.ThreeWindingTransformers.FirstOrDefault(t => t.Id == r.Transformer)?.Tap;
        TapSetting? old = Commands.Studies.LastTapSetting;
        Results.TapStudy.Show(r, new TapSetting(tap?.Winding ?? old?.Winding ?? TapWinding.Hv, tap?.Position, old?.HeldOtherTaps ?? false));
    }

    private ElementKind SelectedKindFromList()
    {
        int i = kindList.SelectedItem ?? 0;
        return ElementLists.Kinds[Math.Clamp(i, 0, ElementLists.Kinds.Count - 1)];
    }

    private void ShowKind(ElementKind k)
    {
        int? row = k == kind ? Table.SelectedRow : 0;
        if (k != kind) Table.SortBy(null);
        kind = k;
        TextTableSource table = ElementTable.Build(Session.Network, k);
        Table.Source = table;
        tableFrame.Title = $"{ElementFields.Plural(k)} ({table.Rows})";
        if (table.Rows > 0) Table.SelectedRow = Math.Clamp(row ?? 0, 0, table.Rows - 1);
        ShowDetail();
    }

    private void ShowDetail()
    {
        string? id = SelectedId;
        Results.ShowDetail(id is null ? $"No {ElementKinds.Label(kind)} yet: Ins adds one." : ElementDetail.Describe(Session.Network, kind, id));
    }
}
