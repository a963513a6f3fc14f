// The study commands of the main screen: faults, tap study and applying its tap, outages and one outage's detail, comparison.
using Study.App.Reports;
using Study.App.Tui.Compare;
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

/// <summary>
/// Asks the question in a dialog, runs the engine through the runner on a snapshot of the network, and
/// shows the result in its tab, stamped with the snapshot so that a later edit marks it out of date.
/// A failure clears the tab's old result and says why.
/// </summary>
public sealed class StudyCommands(MainWindow main)
{
    private IApplication App => main.App;
    private EditSession Session => main.Session;

    /// <summary>How the last tap study was asked (the tapped winding, whether other taps were held), for its heading.</summary>
    public TapSetting? LastTapSetting { get; private set; }

    public void Fault()
    {
        string? bus = main.SelectedKind == ElementKind.Bus ? main.SelectedId : null;
        var form = new FaultForm(bus);
        if (!FaultDialog.Run(App, form) || form.Build().Request is not { } request) return;
        Network snapshot = Session.Network;
        string? path = Session.Path;
        ResultStamp stamp = main.Now();
        // The screen gives what it can: three-phase levels even where earth faults lack data, with the gaps listed.
        request = request with { Scenario = Session.ActiveScenario, LeaveOutEarthFaultsWithoutZeroSequence = true };
        ResultStudy.Run(main, "Fault study", ResultKind.Fault, main.Results.FaultsTab, stamp,
            cancel => StudyCase.Of(snapshot, path).Fault(request, cancel),
            result => main.Results.Faults.Show(result, snapshot),
            refused: result => result.Failure,
            note: result => result.LeftOut.Count > 0
                ? $"earth faults not calculated: {result.MissingZeroSequence.Count} element(s) lack zero-sequence data (listed in the Faults tab)"
                : null,
            caution: true);
    }

    public void TapStudy()
    {
        if (ChooseTransformer() is not { } id) return;
        var form = new TapStudyForm(Session.Network, id, Session.ActiveScenario) { HoldOtherTaps = LastTapSetting?.HeldOtherTaps ?? false };
        if (!TapStudyDialog.Run(App, form) || form.Build().Request is not { } request) return;
        Network snapshot = Session.Network;
        double fraction = 0;
        var progress = new Progress<double>(f => fraction = f);
        string? path = Session.Path;
        TapChanger? tap = TapOf(snapshot, id);
        int positions = tap is null ? 0 : tap.Range.Highest - tap.Range.Lowest + 1;
        int scenarios = request.Scenarios.Count > 0 ? request.Scenarios.Count : Math.Max(1, snapshot.Scenarios.Count);
        // A study of every scenario does not depend on the one chosen; one of the active scenario does.
        ResultStamp stamp = main.Now(scenarioMatters: request.Scenarios.Count > 0);
        ResultStudy.Run(main, "Tap study", ResultKind.Taps, main.Results.TapStudyTab, stamp,
            cancel => StudyCase.Of(snapshot, path).Taps(request, progress, cancel),
            result =>
            {
                LastTapSetting = new TapSetting(tap?.Winding ?? TapWinding.Hv, TapOf(Session.Network, id)?.Position, request.HoldOtherTaps);
                main.Results.TapStudy.Show(result, LastTapSetting);
            },
            progress: new ProgressMeter(() => fraction, positions * scenarios, "positions"));
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
        int outages = OutageElements.InService(snapshot).Count * (request.Scenarios.Count > 0 ? request.Scenarios.Count : Math.Max(1, snapshot.Scenarios.Count));
        ResultStamp stamp = main.Now(scenarioMatters: request.Scenarios.Count > 0);
        ResultStudy.Run(main, "Outage screening", ResultKind.Outages, main.Results.OutagesTab, stamp,
            cancel => StudyCase.Of(snapshot, path).Outages(request, progress, cancel),
            result =>
            {
                screened = snapshot;
                main.Results.OutageResult = result;
            },
            progress: new ProgressMeter(() => fraction, outages, "outages"));
    }

    private Network? screened;

    /// <summary>
    /// Enter on an outage row: the load flow with that element out, solved on the network the screening
    /// ran on (so it agrees with the row even after edits), shown with what the outage caused.
    /// </summary>
    public void OutageDetail(OutageCase outage)
    {
        if (screened is not { } network) return;
        string? path = Session.Path;
        var request = new SolveRequest { Scenario = outage.Scenario };
        main.Runner.Start($"Outage of {outage.Element}", cancel => StudyCase.Of(network, path).SolveWithout(outage.Element, request, cancel),
            after => OutageDetailDialog.Run(App, outage, after),
            message => Prompts.Tell(App, $"Outage of {outage.Element}", message));
    }

    /// <summary>Before and after: two scenarios of this network, or another network file against this one.</summary>
    public void Compare()
    {
        var form = new CompareForm(Session.Network, Session.ActiveScenario, Session.Path);
        if (!CompareDialog.Run(App, form) || form.Build().Request is not { } request) return;
        Network snapshot = Session.Network;
        string? path = Session.Path;
        string here = path is null ? "this network" : Path.GetFileName(path) + " as edited";
        string beforeLabel = request.BeforePath is { } file ? $"{Path.GetFileName(file)}, {Labels.Scenario(request.BeforeScenario)}" : $"{here}, {Labels.Scenario(request.BeforeScenario)}";
        string afterLabel = $"{here}, {Labels.Scenario(request.AfterScenario)}";
        ResultStamp stamp = main.Now(scenarioMatters: false);
        ResultStudy.Run(main, "Compare", ResultKind.Compare, main.Results.CompareTab, stamp, cancel =>
            {
                StudyCase after = StudyCase.Of(snapshot, path);
                StudyCase before = request.BeforePath is { } f ? StudyCase.Open(f) : after;
                return StudyCase.Compare(before, request.BeforeScenario, after, request.AfterScenario, cancel: cancel);
            },
            result => main.Results.Comparison.Show(result, beforeLabel, afterLabel));
    }

    /// <summary>
    /// Sets the studied transformer's tap to the best recommended position, as one undoable edit. The tap
    /// study stays current: it studied every position, so moving this tap does not change its answer.
    /// </summary>
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
        if (TapOf(Session.Network, r.Transformer)?.Position == position)
        {
            string already = $"{r.Transformer} is already on the recommended position {Labels.Position(position)}: nothing was changed";
            main.Status.Message = already;
            Prompts.Tell(App, "Apply tap", already + ".");
            return;
        }
        ResultStamp? stamp = main.StampOf(ResultKind.Taps);
        bool current = stamp?.WhyOutOfDate(Session.Network, Session.ActiveScenario) is null;
        if (!Session.SetTapPosition(r.Transformer, position))
        {
            Prompts.Tell(App, "Apply tap", $"Transformer {r.Transformer} is no longer in the network, or has no tap.");
            return;
        }
        if (current && stamp is not null)
        {
            stamp.AlsoHoldsFor(Session.Network);
            main.Refresh();
        }
        main.Status.Message = $"{r.Transformer} tap set to {Labels.Position(position)} (Alt+Z undoes) · F5 re-solves";
    }

    private static TapChanger? TapOf(Network n, string id) =>
        n.Transformers.FirstOrDefault(t => t.Id == id)?.Tap ?? n.ThreeWindingTransformers.FirstOrDefault(t => t.Id == id)?.Tap;

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
