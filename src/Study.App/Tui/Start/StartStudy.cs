// The main screen's motor-start command: ask, run on a snapshot off the UI thread, show in the Start tab.
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Model;

namespace Study.App.Tui.Start;

/// <summary>As the other study commands: a failed or cancelled start clears the tab's old result and says why.</summary>
public static class StartStudy
{
    /// <summary>The motors of the last start, ticked again when the dialog next opens.</summary>
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<MainWindow, HashSet<string>> Last = new();

    public static void Run(MainWindow main)
    {
        var form = new StartForm(main.Session.Network, main.Session.ActiveScenario);
        HashSet<string> last = Last.GetOrCreateValue(main);
        foreach (Motor m in form.Motors)
            if (last.Contains(m.Id)) form.Chosen.Add(m.Id);
        if (form.Chosen.Count == 0 && main.SelectedKind == ElementKind.Motor && main.SelectedId is { } selected)
            form.Chosen.Add(selected);
        if (!StartDialog.Run(main.App, form) || form.Build().Request is not { } request) return;
        last.Clear();
        last.UnionWith(request.Motors);
        Network snapshot = main.Session.Network;
        string? path = main.Session.Path;
        // The scenario is the one chosen in the dialog, not the active one: changing the active one does not date it.
        ResultStamp stamp = main.Now(scenarioMatters: false);
        ResultStudy.Run(main, "Motor start", ResultKind.Start, main.Results.StartTab, stamp,
            cancel => StudyCase.Of(snapshot, path).Start(request, cancel),
            result => main.Results.Start.Result = result,
            refused: result => result.Failure,
            caution: true);
    }
}
