// Entry point of the terminal UI: finds the network, offers a recovery copy, runs the main window.
using Study.App.Tui.Editing;
using Study.Core.Model;
using Terminal.Gui.App;

namespace Study.App.Tui.Shell;

/// <summary>Starts the full-screen program. `study` with no argument opens the bundled demo network.</summary>
public static class StudyTui
{
    public const string DemoFile = "networks/harbour-estate.study.json";
    public const string FallbackDemoFile = "networks/ieee14cdf.txt";

    /// <summary>Runs until the user quits. Returns 0, or 2 when the network cannot be read.</summary>
    public static int Run(string? path)
    {
        EditSession session;
        try
        {
            session = path is null ? OpenDemo() : EditSession.Open(path);
        }
        catch (InputException e)
        {
            Console.Error.WriteLine($"study: {e.Describe()}");
            return 2;
        }

        using IApplication app = Application.Create().Init();
        var main = new MainWindow(app, session);
        app.Keyboard.KeyDown += main.Commands.OnKeyDown;
        app.Invoke(() => OfferRecovery(app, main.Session));
        app.Run(main);
        main.Dispose();
        return 0;
    }

    /// <summary>Asks whether to load a recovery copy newer than the file; Yes loads it (dirty), No deletes it.</summary>
    public static void OfferRecovery(IApplication app, EditSession session)
    {
        if (!session.RecoveryWaiting) return;
        int? answer = Prompts.Ask(app, "Recovered edits",
            $"Unsaved edits from an earlier session were found:\n{session.RecoveryPath}\n\nLoad them?", "No", "Yes");
        try
        {
            if (answer == 1) session.AcceptRecovery();
            else session.DiscardRecovery();
        }
        catch (InputException e)
        {
            Prompts.Tell(app, "Recovery copy unreadable", e.Describe());
            session.DiscardRecovery();
        }
    }

    /// <summary>The bundled demo, looked for under the current directory, then beside the program.</summary>
    public static string? FindDemo()
    {
        foreach (string file in new[] { DemoFile, FallbackDemoFile })
        {
            foreach (string root in new[] { Directory.GetCurrentDirectory(), AppContext.BaseDirectory })
            {
                string candidate = Path.Combine(root, file);
                if (File.Exists(candidate)) return candidate;
            }
        }
        return null;
    }

    private static EditSession OpenDemo() =>
        FindDemo() is { } demo ? EditSession.Open(demo, isDemo: true) : EditSession.Untitled();
}
