// Headless at 80×24 through the real main window: focus that cannot be lost, the tap and fault views that
// show the answer in 24 rows, and outages one can open, with the progress of a long screening in words.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Faults;
using Study.Core.Studies;
using Terminal.Gui.Input;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class TrustScreenTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private EditSession Demo() => EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));

    [Fact]
    public void Tab_always_reaches_the_results_and_arrows_never_leave_a_result_table()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        var reached = new List<bool>();
        bool stayedInTable = false;
        string focusedScreen = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F5)),
            new Step("the load flow", () => main.LastResult is not null && !main.Runner.IsRunning, () =>
            {
                // The sequence that used to lose the results pane for good: Tab, Down, Tab, then Tab around.
                h.Keys(Key.Tab, Key.CursorDown, Key.Tab);
                for (int round = 0; round < 3; round++)
                {
                    bool seen = false;
                    for (int i = 0; i < 3; i++)
                    {
                        h.Keys(Key.Tab);
                        seen |= main.Results.HasFocus;
                    }
                    reached.Add(seen);
                }
                while (!main.Results.HasFocus) h.Keys(Key.Tab);
                ResultTable? table = main.Results.CurrentTable();
                for (int i = 0; i < 20; i++) h.Keys(Key.CursorRight);
                stayedInTable = table is not null && table.HasFocus;
                focusedScreen = h.Draw();
            }));

        Assert.All(reached, Assert.True);
        Assert.True(stayedInTable, "Right past the last column left the table");
        // The pane with the keyboard says so in characters, not only in colour: "▶" in its title and a double border.
        Assert.Contains("╡▶ Results╞", focusedScreen);
        Assert.Single(focusedScreen.Split('\n'), r => r.Contains('▶', StringComparison.Ordinal));
        session.Close();
    }

    [Fact]
    public void At_80x24_the_tap_view_shows_and_selects_the_recommended_position_and_states_the_sign_convention()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        TapStudyResult r = StudyCase.Of(session.Network).Taps(new TapStudyRequest { TransformerId = "CQ-T1", Scenarios = [] });
        Assert.NotEmpty(r.Recommended);
        string screen = "";
        h.Run(main,
            new Step("the main window", () => true, () =>
            {
                main.Results.TapStudy.Show(r, new Study.App.Tui.Taps.TapSetting(Study.Core.Model.TapWinding.Hv, null, false));
                main.ShowStudyTab(main.Results.TapStudyTab);
            }),
            new Step("the Taps tab", () => true, () => screen = h.Draw()));

        string best = $"│{Study.App.Reports.Labels.Position(r.Recommended[0].Position)} ";
        string[] rows = screen.Split('\n');
        Assert.True(rows.Any(row => row.Contains(best, StringComparison.Ordinal) && row.Contains("│best│", StringComparison.Ordinal)), screen);
        Assert.Equal(Study.App.Tui.Taps.TapStudyTables.BestRow(r), main.Results.TapStudy.Table.SelectedRow);
        Assert.Contains("boost", screen);
        Assert.Contains("buck", screen);
        Assert.Contains("tap position", screen); // the curve's axis is drawn too
        session.Close();
    }

    [Fact]
    public void At_80x24_the_fault_view_gives_the_levels_the_rows_and_the_notes_in_full_one_Tab_after_the_breakers()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        FaultResult r = StudyCase.Of(session.Network).Fault(new FaultRequest { Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth] });
        string screen = "", notes = "", back = "";
        h.Run(main,
            new Step("the main window", () => true, () =>
            {
                main.Results.Faults.Show(r, session.Network);
                main.ShowStudyTab(main.Results.FaultsTab);
            }),
            new Step("the Faults tab", () => true, () =>
            {
                screen = h.Draw();
                h.Keys(Key.Tab, Key.Tab);
            }),
            new Step("the notes", () => true, () =>
            {
                notes = h.Draw();
                h.Keys(Key.Tab.WithShift, Key.Tab.WithShift);
            }),
            new Step("the levels again", () => true, () => back = h.Draw()));

        string flat = Flatten(screen);
        Assert.Contains("Caution: fault levels", flat);
        Assert.Contains("before equipment is specified, set or energised.", flat);
        Assert.Contains("I''k kA", screen);
        Assert.Contains("breaker", screen);
        // The notes fold to one row that says they are there, so three buses' levels fit at 80×24.
        Assert.True(r.Faults.Select(f => f.Bus).Distinct().Take(3).All(b => screen.Contains($"│{b}", StringComparison.Ordinal)), screen);
        Assert.Contains("▼ method and notes:", screen);
        Assert.Contains("Tab to read them", screen);
        // Tab past the breaker table opens them: every note wrapped in full, none cut.
        string opened = Flatten(notes);
        foreach (string note in r.Notes)
            Assert.Contains(note, opened);
        Assert.Contains("I_th for T_k 1 s", opened);
        Assert.DoesNotContain("▼ method and notes", notes);
        Assert.Contains("Caution: fault levels", Flatten(notes));
        Assert.Equal(Flatten(screen), Flatten(back));
        session.Close();
    }

    [Fact]
    public void Enter_on_an_outage_row_opens_the_load_flow_with_that_element_out_and_what_it_caused()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        string detail = "", tab = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.U.WithAlt)),
            new Step("the outage dialog", () => h.DialogUp, () => h.Keys(Key.Enter)),
            new Step("the screening", () => !h.DialogUp && main.Results.OutageResult is not null && !main.Runner.IsRunning, () =>
            {
                tab = h.Draw();
                main.Results.Outages.Table.SetFocus();
                h.Keys(Key.Enter);
            }),
            new Step("the outage opened", () => h.DialogUp, () =>
            {
                detail = Headless.TextOf(h.App.TopRunnableView!) + "\n" + h.Draw();
                h.Keys(Key.Esc);
            }),
            new Step("the main window again", () => !h.DialogUp, () => { }));

        OutageScreeningResult r = main.Results.OutageResult!;
        OutageCase first = r.Scenarios[0].Outages[0];
        Assert.Contains($"Outage of {first.Element}", detail);
        Assert.Contains("lowest V", detail);        // the post-outage load flow's highlights
        Assert.Contains("V pu", detail);            // its bus table
        // Severity levels are named for what they mean and show their numbers.
        Assert.Matches(@"\d+\.\d (NO SOLUTION|LOAD LOST|LIMITS BROKEN|secure)", tab);
        Assert.DoesNotContain("stressed", tab);
        session.Close();
    }

    [Fact]
    public void A_long_screening_shows_its_count_rate_and_time_left()
    {
        // 30 of 120 outages in 10 s: 3 per second, so the other 90 take 30 s at that rate.
        string text = StudyProgress.Text("Outage screening", "⠹", new ProgressMeter(() => 0.25, 120, "outages"), TimeSpan.FromSeconds(10));
        Assert.Equal("Outage screening ⠹ 30/120 outages · 3/s · about 30 s left · 10.0 s", text);
        Assert.Equal("2 min 05 s", StudyProgress.Duration(125));
    }

    /// <summary>The screen's text as one line: box characters and the wrap's indent taken out.</summary>
    private static string Flatten(string screen) => System.Text.RegularExpressions.Regex.Replace(
        string.Join(" ", screen.Split('\n').Select(r => r.Trim('║', '│', ' ', '╔', '╗', '╚', '╝'))), @"\s+", " ");
}
