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
            Assert.Matches(@"WRB33\s*│33\.0\s*│1\.0\d{3}", solved);

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

    private static string Expect(TmuxSession tmux, string text, TimeSpan timeout, string what) =>
        Expect(tmux, s => s.Contains(text, StringComparison.Ordinal), what, timeout);

    private static string Expect(TmuxSession tmux, Func<string, bool> seen, string what, TimeSpan? timeout = null)
    {
        (bool found, string screen) = tmux.WaitFor(seen, timeout ?? Step);
        Assert.True(found, $"did not see {what}; the screen was:\n{screen}");
        return screen;
    }
}
