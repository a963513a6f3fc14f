// Drives the real main window through the ANSI driver: keys go in, the screen comes out as text.
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

/// <summary>One thing to do in a scripted run, once <see cref="When"/> holds (a dialog is up, a study has finished).</summary>
public sealed record Step(string What, Func<bool> When, Action Do);

/// <summary>
/// An application of its own on the ANSI driver at a fixed size. <see cref="Run"/> runs a view (the main
/// window, a dialog) and performs the steps one per loop iteration as their conditions come true, so
/// modal dialogs and background studies are driven as a user would; it stops after the last step,
/// and throws naming the step it waited for, with the screen, when a step does not come.
/// </summary>
public sealed class Headless : IDisposable
{
    private static readonly TimeSpan Patience = TimeSpan.FromMinutes(1);

    public Headless(int width = 80, int height = 24)
    {
        App = Application.Create(new VirtualTimeProvider());
        App.Init(DriverRegistry.Names.ANSI);
        App.Driver!.SetScreenSize(width, height);
    }

    public IApplication App { get; }

    public string Screen => App.Driver!.ToString()!;

    public string[] Rows => Screen.Split('\n');

    /// <summary>A main window on the session, with the application's key handler as the program sets it.</summary>
    public MainWindow Main(EditSession session, Func<DateTime>? clock = null)
    {
        var main = new MainWindow(App, session, clock);
        App.Keyboard.KeyDown += main.Commands.OnKeyDown;
        return main;
    }

    public void Keys(params Key[] keys)
    {
        foreach (Key key in keys) App.InjectKey(key);
    }

    /// <summary>Types text key by key, as a user does (the text field's own editing applies).</summary>
    public void Type(string text)
    {
        foreach (char c in text) App.InjectKey(new Key(c));
    }

    /// <summary>Draws and returns the screen.</summary>
    public string Draw()
    {
        App.LayoutAndDraw(true);
        return Screen;
    }

    public bool DialogUp => App.TopRunnableView is Dialog;

    /// <summary>The text of the dialog on top (its views' text, buttons left out).</summary>
    public string DialogText() => App.TopRunnableView is { } top ? TextOf(top) : "";

    public void Run(View top, params Step[] steps)
    {
        int next = 0;
        var deadline = DateTime.UtcNow + Patience;
        App.Iteration += OnIteration;
        try
        {
            App.Run((IRunnable)top);
        }
        finally
        {
            App.Iteration -= OnIteration;
        }

        void OnIteration(object? sender, EventArgs e)
        {
            if (next >= steps.Length)
            {
                if (App.TopRunnableView == top) App.RequestStop();
                else App.RequestStop(App.TopRunnable);
                return;
            }
            if (DateTime.UtcNow > deadline)
            {
                // Thrown, not stopped: a form that asks before it closes would otherwise keep the run alive.
                throw new TimeoutException($"waited for: {steps[next].What}; the screen was:\n{Draw()}");
            }
            if (!steps[next].When()) return;
            App.LayoutAndDraw(true);
            steps[next++].Do();
        }
    }

    /// <summary>The text a view shows: its own and its subviews', buttons left out.</summary>
    public static string TextOf(View view)
    {
        var parts = new List<string>();
        void Walk(View v)
        {
            if (v is not Button && !string.IsNullOrWhiteSpace(v.Text)) parts.Add(v.Text);
            if (v is TextPane pane && pane.Content.Length > 0) parts.Add(pane.Content);
            foreach (View child in v.SubViews) Walk(child);
        }
        Walk(view);
        return string.Join("\n", parts).Trim();
    }

    public void Dispose() => App.Dispose();
}
