// The main screen's bank-choice command: ask, read the files and weigh every candidate off the UI thread, show the Bank tab.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Tui.Choice;

/// <summary>Esc stops it while it runs; a failure clears the tab's old result and says why.</summary>
public static class ChoiceStudy
{
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<MainWindow, ChoiceForm> Last = new();

    public static void Run(MainWindow main)
    {
        ChoiceForm form = Last.TryGetValue(main, out ChoiceForm? last) ? last : new ChoiceForm(main.Session.Network, main.Session.ActiveScenario, main.Session.Path);
        if (main.SelectedKind == ElementKind.Transformer && main.SelectedId is { } selected && form.Transformers.Contains(selected)) form.TransformerId = selected;
        else if (!form.Transformers.Contains(form.TransformerId)) form.TransformerId = form.NamedByCandidates() ?? form.Transformers.FirstOrDefault() ?? "";
        if (!ChoiceDialog.Run(main.App, form) || form.Build().Question is not { } question) return;
        Last.AddOrUpdate(main, form);
        Network snapshot = main.Session.Network;
        string? path = main.Session.Path;
        ResultStamp stamp = main.Now(scenarioMatters: question.Request.Scenarios.Count > 0);
        ResultStudy.Run(main, "Bank choice", ResultKind.BankChoice, main.Results.BankChoiceTab, stamp, cancel =>
            {
                BankCandidates candidates = CandidatesFile.Read(question.CandidatesPath);
                LoadProfile? profile = question.ProfilePath is { } p ? ProfileFile.Read(p) : null;
                return StudyCase.Of(snapshot, path).Choose(question.Request, candidates, profile, cancel);
            },
            result => main.Results.BankChoice.Show(result),
            caution: true);
    }
}
