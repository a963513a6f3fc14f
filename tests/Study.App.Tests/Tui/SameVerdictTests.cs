// The command line and the terminal UI refuse the same networks with the same words: both go through StudyCase.
using Study.App.Tests.Cli;
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.Time;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class SameVerdictTests : IDisposable
{
    private static readonly TimeSpan Patience = TimeSpan.FromMinutes(1);
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private const string Base = """
        {
          "format": "study-network",
          "version": 1,
          "name": "Verdict check",
          "buses": [
            {"id": "HV", "kv": 132},
            {"id": "MV", "kv": 33},
            {"id": "MV2", "kv": 33}
          ],
          "supplies": [{"id": "GRID", "bus": "HV", "scMvaMax": 3000, "xr": 12}],
          "transformers": [
            {"id": "T1", "hv": "HV", "lv": "MV", "mva": 45, "hvKv": 132, "lvKv": 33, "zPercent": 12.5, "xr": 30, "vectorGroup": "Dyn1",
             "tap": {"side": "hv", "stepPercent": 1.25, "min": -8, "max": 8, "position": 0}}
          ],
          "lines": [{"id": "F1", "from": "MV", "to": "MV2", "lengthKm": 4, "rOhmPerKm": 0.16, "xOhmPerKm": 0.35}],
          "loads": [{"id": "L1", "bus": "MV2", "pMw": 10, "qMvar": 3}]
        }
        """;

    /// <summary>Invalid networks, each made from the clean one by one edit (the fixture names say what is wrong).</summary>
    public static TheoryData<string, string, string> Invalid => new()
    {
        { "dangling-load", "\"bus\": \"MV2\", \"pMw\"", "\"bus\": \"MV9\", \"pMw\"" },
        { "zero-line", "\"rOhmPerKm\": 0.16, \"xOhmPerKm\": 0.35", "\"rOhmPerKm\": 0, \"xOhmPerKm\": 0" },
        { "negative-impedance", "\"zPercent\": 12.5", "\"zPercent\": -12.5" },
        { "duplicate-bus", "{\"id\": \"MV2\", \"kv\": 33}", "{\"id\": \"MV\", \"kv\": 33}" },
        { "empty-band", "{\"id\": \"MV\", \"kv\": 33}", "{\"id\": \"MV\", \"kv\": 33, \"vMin\": 1.1, \"vMax\": 0.9}" },
        { "tap-outside-range", "\"position\": 0", "\"position\": 12" },
        { "no-source", "\"supplies\": [{\"id\": \"GRID\", \"bus\": \"HV\", \"scMvaMax\": 3000, \"xr\": 12}],", "" },
        { "kv-in-volts", "{\"id\": \"HV\", \"kv\": 132}", "{\"id\": \"HV\", \"kv\": 132000}" },
    };

    [Theory]
    [MemberData(nameof(Invalid))]
    public void The_command_line_and_the_terminal_UI_refuse_an_invalid_network_with_the_same_message(string name, string find, string replace)
    {
        Assert.Contains(find, Base);
        string path = temp.File(name + ".study.json");
        File.WriteAllText(path, Base.Replace(find, replace));

        CliOutcome cli = CliRun.Run("solve", path);
        Assert.Equal(2, cli.ExitCode);
        Assert.StartsWith("error: ", cli.Err);
        string cliMessage = cli.Err["error: ".Length..].TrimEnd();

        string tuiMessage = TuiLoadFlowFailure(path);

        Assert.Equal("Load flow failed: " + cliMessage, tuiMessage);
    }

    /// <summary>Opens the file in the main window, presses F5 and returns the message the user is shown.</summary>
    private string TuiLoadFlowFailure(string path)
    {
        var time = new VirtualTimeProvider();
        using IApplication app = Application.Create(time);
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(120, 40);
        var main = new MainWindow(app, EditSession.Open(path, userFolder: temp.File("user")));
        app.Keyboard.KeyDown += main.Commands.OnKeyDown;
        bool pressed = false, told = false;
        string shown = "";
        var deadline = DateTime.UtcNow + Patience;
        app.Iteration += (_, _) =>
        {
            if (!pressed)
            {
                pressed = true;
                app.InjectKey(Key.F5);
                return;
            }
            if (app.TopRunnableView is Dialog dialog)
            {
                told = true;
                shown = TextOf(dialog);
                app.InjectKey(Key.Enter);
                return;
            }
            if ((told && !main.Runner.IsRunning) || DateTime.UtcNow > deadline) app.RequestStop();
        };
        app.Run(main);
        main.Session.Close();
        main.Dispose();
        Assert.True(told, "no message was shown");
        return shown;
    }

    /// <summary>The message a message box shows: the text of its views, buttons left out.</summary>
    private static string TextOf(View view)
    {
        var parts = new List<string>();
        void Walk(View v)
        {
            if (v is not Button && !string.IsNullOrWhiteSpace(v.Text)) parts.Add(v.Text);
            foreach (View child in v.SubViews) Walk(child);
        }
        Walk(view);
        return string.Join("\n", parts).Trim();
    }
}
