// Text from a file never acts on the terminal: control characters are shown escaped in every message and report.
using Study.App.Cli;

namespace Study.App.Tests.Cli;

public class TerminalTextTests
{
    [Fact]
    public void An_escape_sequence_in_an_id_is_shown_escaped_in_check_and_solve()
    {
        string path = CliRun.TempFile("ctrl.study.json", """
            {"format": "study-network", "version": 2,
             "buses": [{"id": "B\u001b[2J\r", "kv": 11}, {"id": "B2", "kv": 11}],
             "supplies": [{"id": "GRID", "bus": "B\u001b[2J\r", "scMvaMax": 100}],
             "lines": [{"id": "L\u202e1", "from": "B\u001b[2J\r", "to": "B2", "z1": {"per": "pu", "r": 0.01, "x": 0.05}}]}
            """);
        foreach (CliOutcome run in new[] { CliRun.Run("check", path), CliRun.Run("solve", path) })
        {
            string all = run.Out + run.Err;
            Assert.DoesNotContain('\u001b', all);
            Assert.DoesNotContain('\r', all);
            Assert.DoesNotContain('\u202e', all);
        }
        string solved = CliRun.Run("solve", path).Out;
        Assert.Contains("B\\u001B[2J\\u000D", solved);
        Assert.Contains("L\\u202E1", solved);
    }

    [Fact]
    public void Tabs_and_line_ends_pass_and_everything_else_is_escaped()
    {
        var inner = new StringWriter();
        TextWriter w = TerminalText.Wrap(inner);
        w.Write("a\tb\nc\u0007d\u009be");
        w.WriteLine("!");
        Assert.Equal("a\tb\nc\\u0007d\\u009Be!" + Environment.NewLine, inner.ToString());
        Assert.Same(w, TerminalText.Wrap(w));
    }
}
