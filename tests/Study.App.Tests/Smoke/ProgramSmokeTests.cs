// The real program, end to end in a terminal: open the demo, solve, fault with the caution, quit.
using Xunit.Abstractions;

namespace Study.App.Tests.Smoke;

/// <summary>
/// Runs <c>dotnet study.dll</c> (copied next to this test assembly, with the bundled networks) inside
/// tmux at 80×24. Skips, with a message, where tmux is not installed. Waits by polling the screen.
/// </summary>
public sealed class ProgramSmokeTests(ITestOutputHelper output)
{
    private static readonly TimeSpan Start = TimeSpan.FromSeconds(30);
    private static readonly TimeSpan Step = TimeSpan.FromSeconds(20);

    [Fact]
    public void The_demo_opens_solves_shows_the_fault_caution_and_quits_at_80x24()
    {
        if (!TmuxSession.Available())
        {
            output.WriteLine("skipped: tmux is not on PATH");
            return;
        }
        string dir = AppContext.BaseDirectory;
        string dll = Path.Combine(dir, "study.dll");
        Assert.True(File.Exists(dll), $"study.dll not found next to the tests in {dir}");
        using TmuxSession tmux = TmuxSession.Start($"dotnet '{dll}'", dir, 80, 24);
        try
        {
            Expect(tmux, "Buses (10)", Start, "the demo network's element list");
            Expect(tmux, "not solved", Step, "the status line before a solve");

            tmux.Keys("F5");
            string solved = Expect(tmux, s => s.Contains("solved", StringComparison.Ordinal) && s.Contains("V pu", StringComparison.Ordinal), "the Buses tab after F5");
            Assert.Contains("WRB132", solved);
            Assert.Matches(@"WRB33\s*│33\s*│1\.0\d{3}", solved);

            tmux.Keys("F7");
            Expect(tmux, "Fault study", Step, "the fault dialog");
            tmux.Keys("Enter");
            string faults = Expect(tmux, s => s.Contains("I''k kA", StringComparison.Ordinal) && s.Contains("Caution", StringComparison.Ordinal), "the Faults tab");
            Assert.Contains("planning estimates", faults);

            tmux.Keys("M-q");
            string ended = Expect(tmux, "STUDY-EXITED-0", Step, "the program's exit");
            Assert.DoesNotContain("Unhandled", ended);
        }
        catch
        {
            output.WriteLine(tmux.Capture());
            throw;
        }
    }

    [Fact]
    public void A_bad_entry_keeps_the_form_open_and_an_edit_marks_the_results_out_of_date_until_undone_at_80x24()
    {
        if (!TmuxSession.Available())
        {
            output.WriteLine("skipped: tmux is not on PATH");
            return;
        }
        string dll = Path.Combine(AppContext.BaseDirectory, "study.dll");
        using TmuxSession tmux = TmuxSession.Start($"dotnet '{dll}'", AppContext.BaseDirectory, 80, 24);
        try
        {
            Expect(tmux, "Buses (10)", Start, "the demo network's element list");
            tmux.Keys("F5");
            Expect(tmux, "solved 3 it", Step, "the load flow");

            // Add a bus with letters in Base kV: Enter keeps the form and what was typed, and says why.
            tmux.Keys("Tab");
            tmux.Keys("IC");
            Expect(tmux, "Add bus", Step, "the Add bus form");
            tmux.Keys("Tab");
            tmux.Keys("e", "l", "e", "v", "e", "n");
            Expect(tmux, "eleven", Step, "the typed text");
            tmux.Keys("Enter");
            string refused = Expect(tmux, "Not accepted: Base kV: 'eleven' is not a number", Step, "the refusal");
            Assert.Contains("! Base kV", refused);
            Assert.Contains("Add bus", refused);

            // Esc asks first; Enter keeps editing with the text still there.
            tmux.Keys("Escape");
            Expect(tmux, "the fields you changed will be lost", Step, "the discard question");
            tmux.Keys("Enter");
            Expect(tmux, s => s.Contains("Not accepted", StringComparison.Ordinal) && !s.Contains("Discard changes?", StringComparison.Ordinal), "the form kept");

            // Fixed, the bus goes in, and the load flow on screen says it is out of date.
            tmux.Keys("BSpace", "BSpace", "BSpace", "BSpace", "BSpace", "BSpace", "1", "1", "Enter");
            string edited = Expect(tmux, "RESULTS OUT OF DATE: F5 re-solves", Step, "the status line after the edit");
            Assert.Contains("Buses (11)", edited);
            Assert.Contains("OUT OF DATE: the network was edited after this load", edited);
            Assert.DoesNotContain("solved 3 it", edited);

            // Undo gives the network the load flow was of: current again.
            tmux.Keys("M-z");
            string undone = Expect(tmux, "undid: add bus B1", Step, "the undo");
            Assert.DoesNotContain("OUT OF DATE", undone);

            tmux.Keys("M-q");
            Expect(tmux, "STUDY-EXITED-0", Step, "the program's exit");
        }
        catch
        {
            output.WriteLine(tmux.Capture());
            throw;
        }
    }

    private static string Expect(TmuxSession tmux, string text, TimeSpan timeout, string what) =>
        Expect(tmux, s => s.Contains(text, StringComparison.Ordinal), what, timeout);

    private static string Expect(TmuxSession tmux, Func<string, bool> seen, string what, TimeSpan? timeout = null)
    {
        (bool found, string screen) = tmux.WaitFor(seen, timeout ?? Step);
        Assert.True(found, $"did not see {what}; the screen was:\n{screen}");
        return screen;
    }
}
