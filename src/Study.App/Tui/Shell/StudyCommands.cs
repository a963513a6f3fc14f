// The study commands of the main screen: fault study, tap study, applying a recommended tap, outage screening.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.Faults;
using Study.App.Tui.Outages;
using Study.App.Tui.Taps;
using Study.Core.Cases;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Terminal.Gui.App;

namespace Study.App.Tui.Shell;

/// <summary>Asks the question in a dialog, runs the engine through the runner, shows the result in its tab.</summary>
public sealed class StudyCommands(MainWindow main)
{
    private IApplication App => main.App;
    private EditSession Session => main.Session;

    public void Fault()
    {
        string? bus = main.SelectedKind == ElementKind.Bus ? main.SelectedId : null;
        var form = new FaultForm(bus);
        if (!FaultDialog.Run(App, form) || form.Build().Request is not { } request) return;
        Network snapshot = Session.Network;
        string? path = Session.Path;
        request = request with { Scenario = Session.ActiveScenario };
        main.Runner.Start("Fault study", cancel => StudyCase.Of(snapshot, path).Fault(request, cancel),
            result =>
            {
                if (result.Failure is { } failure)
                {
                    Prompts.Tell(App, "Fault study", "Fault study not run: " + failure + "\n\n" + FaultStudy.Caution);
                    return;
                }
                main.Results.FaultResult = result;
                main.ShowStudyTab(main.Results.FaultsTab);
            },
            message => Prompts.Tell(App, "Fault study", message + "\n\n" + FaultStudy.Caution));
    }

    public void TapStudy()
    {
        if (ChooseTransformer() is not { } id) return;
        var form = new TapStudyForm(Session.Network, id, Session.ActiveScenario);
        if (!TapStudyDialog.Run(App, form) || form.Build().Request is not { } request) return;
        Network snapshot = Session.Network;
        double fraction = 0;
        var progress = new Progress<double>(f => fraction = f);
        string? path = Session.Path;
        main.Runner.Start("Tap study", cancel => StudyCase.Of(snapshot, path).Taps(request, progress, cancel),
            result =>
            {
                main.Results.TapStudyResult = result;
                main.ShowStudyTab(main.Results.TapStudyTab);
            },
            message => Prompts.Tell(App, "Tap study", message),
            () => fraction);
    }

    /// <summary>Each line and transformer out in turn, in the active scenario or all of them, on a snapshot.</summary>
    public void Outages()
    {
        var form = new OutageForm(Session.Network, Session.ActiveScenario);
        if (!OutageDialog.Run(App, form) || form.Build().Request is not { } request) return;
        Network snapshot = Session.Network;
        double fraction = 0;
        var progress = new Progress<double>(f => fraction = f);
        string? path = Session.Path;
        main.Runner.Start("Outage screening", cancel => StudyCase.Of(snapshot, path).Outages(request, progress, cancel),
            result =>
            {
                main.Results.OutageResult = result;
                main.ShowStudyTab(main.Results.OutagesTab);
            },
            message => Prompts.Tell(App, "Outage screening", message),
            () => fraction);
    }

    /// <summary>Sets the studied transformer's tap to the best recommended position, as one undoable edit.</summary>
    public void ApplyRecommendedTap()
    {
        if (main.Results.TapStudyResult is not { } r)
        {
            Prompts.Tell(App, "Apply tap", "Run a tap study first (F8).");
            return;
        }
        if (r.Recommended.Count == 0)
        {
            Prompts.Tell(App, "Apply tap", $"No position of {r.Transformer} keeps the watched buses in band; nothing to apply.");
            return;
        }
        int position = r.Recommended[0].Position;
        if (CurrentPosition(r.Transformer) == position)
        {
            Prompts.Tell(App, "Apply tap", $"{r.Transformer} is already on position {Labels.Position(position)}.");
            return;
        }
        if (!Session.SetTapPosition(r.Transformer, position))
        {
            Prompts.Tell(App, "Apply tap", $"Transformer {r.Transformer} is no longer in the network, or has no tap.");
            return;
        }
        main.Status.Summary = $"{r.Transformer} tap set to {Labels.Position(position)} (Alt+Z undoes) · F5 re-solves";
    }

    private int? CurrentPosition(string id) =>
        Session.Network.Transformers.FirstOrDefault(t => t.Id == id)?.Tap?.Position
        ?? Session.Network.ThreeWindingTransformers.FirstOrDefault(t => t.Id == id)?.Tap?.Position;

    /// <summary>The selected transformer when it has a tap; otherwise a choice among those that do.</summary>
    private string? ChooseTransformer()
    {
        IReadOnlyList<string> tapped = TapStudyForm.TappedTransformers(Session.Network);
        if (main.SelectedKind is ElementKind.Transformer or ElementKind.ThreeWindingTransformer
            && main.SelectedId is { } selected && tapped.Contains(selected))
            return selected;
        if (tapped.Count == 0)
        {
            Prompts.Tell(App, "Tap study", "No transformer in this network has a tap changer with a range of positions.");
            return null;
        }
        string? last = main.Results.TapStudyResult?.Transformer;
        int start = last is null ? 0 : Math.Max(0, tapped.ToList().IndexOf(last));
        return Prompts.Choose(App, "Tap study: transformer", tapped, start) is int i ? tapped[i] : null;
    }
}
