// Results are never stale in silence: after an edit, an undo or a scenario change the tabs and the status line say so.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Model;
using Terminal.Gui.Input;

namespace Study.App.Tests.Tui;

public sealed class FreshnessTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    [Fact]
    public void An_edit_marks_the_load_flow_out_of_date_in_its_tab_and_the_status_line_and_undo_makes_it_current_again()
    {
        using var h = new Headless();
        var session = EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));
        MainWindow main = h.Main(session);
        string solved = "", edited = "", undone = "", rescenario = "";
        string? editedNote = null;
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F5)),
            new Step("the load flow", () => main.LastResult is not null && !main.Runner.IsRunning, () =>
            {
                solved = h.Draw();
                Load load = session.Network.Loads[0];
                session.Replace(ElementKind.Load, load.Id, load with { PMw = load.PMw + 5 });
            }),
            new Step("the edit shown", () => true, () =>
            {
                edited = h.Draw();
                editedNote = main.Results.BusesTab.Notice.Note;
                h.Keys(Key.Z.WithAlt);
            }),
            new Step("the undo shown", () => !session.Dirty, () =>
            {
                undone = h.Draw();
                session.ActiveScenario = "winter-peak";
                main.Refresh();
            }),
            new Step("the scenario change shown", () => true, () => rescenario = h.Draw()));

        Assert.Contains("solved 3 it", solved);
        Assert.DoesNotContain("OUT OF DATE", solved);

        string[] rows = edited.Split('\n');
        Assert.StartsWith(" RESULTS OUT OF DATE: F5 re-solves", rows[23]);
        Assert.DoesNotContain("solved 3 it", rows[23]); // the old numbers do not stand as the answer
        Assert.Contains("OUT OF DATE: the network was edited after this load", edited); // wrapped in the tab at 80 columns
        Assert.StartsWith("OUT OF DATE: the network was edited after this load flow. F5", editedNote);

        Assert.DoesNotContain("OUT OF DATE", undone);
        Assert.Contains("undid: edit load", undone);

        Assert.Contains("OUT OF DATE", rescenario);
        Assert.StartsWith(" RESULTS OUT OF DATE", rescenario.Split('\n')[23]);
        Assert.Contains("scenario winter-peak", main.Status.Summary); // the row gives the room to the last message
        session.Close();
    }

    [Fact]
    public void A_failed_solve_clears_the_previous_tables_and_status_and_says_why()
    {
        using var h = new Headless(120, 40);
        var session = EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));
        MainWindow main = h.Main(session);
        string? message = null;
        string after = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F5)),
            new Step("the first load flow", () => main.LastResult is not null && !main.Runner.IsRunning, () =>
            {
                Load load = session.Network.Loads[0];
                // A load on a bus that does not exist: the study refuses the network.
                session.Replace(ElementKind.Load, load.Id, load with { Bus = "NOWHERE" });
                h.Keys(Key.F5);
            }),
            new Step("the refusal", () => h.DialogUp, () =>
            {
                message = h.DialogText();
                h.Keys(Key.Enter);
            }),
            new Step("the screen after it", () => !h.DialogUp, () => after = h.Draw()));

        Assert.StartsWith("Load flow failed:", message);
        Assert.Null(main.LastResult);
        // The Buses tab is left without the old voltages (132.0 is the results' kV; the element table shows 132).
        Assert.Equal(0, CountRows(after, "│WRB132│132.0"));
        Assert.Contains("FAILED: Load flow failed", after.Replace("\n", " "));
        string status = after.Split('\n')[39];
        Assert.StartsWith(" LOAD FLOW FAILED: no results shown", status);
        Assert.DoesNotContain("solved", status); // neither "solved 3 it" nor "not solved", which reads as never asked
        session.Close();
    }

    private static int CountRows(string screen, string text) => screen.Split('\n').Count(r => r.Contains(text, StringComparison.Ordinal));
}
