// The outage-screening question as a dialog: the active scenario or all of them.
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Outages;

/// <summary>Fills an <see cref="OutageForm"/>. Enter runs, Esc cancels.</summary>
public static class OutageDialog
{
    /// <summary>True when the user asked to run (the form then builds a request).</summary>
    public static bool Run(IApplication app, OutageForm form)
    {
        var dialog = new Dialog { Title = "Outage screening", Width = Dim.Percent(90), Height = 11 };
        var what = new Label
        {
            X = 0, Y = 0, Width = Dim.Fill(),
            Text = "Each in-service line and transformer out in turn; ranked by severity.",
        };
        var scenLabel = new Label { X = 0, Y = 2, Text = "Scenarios" };
        var scenarios = new OptionSelector
        {
            X = 11, Y = 2, Width = Dim.Fill(),
            Labels = [$"the active scenario ({form.ActiveScenarioLabel})", form.ScenarioCount == 0 ? "all scenarios (none defined: as entered)" : $"all {form.ScenarioCount} scenarios"],
            Value = form.AllScenarios ? 1 : 0,
        };
        var status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Enter runs · Esc cancels · Esc stops a running screening" };
        dialog.Add(what, scenLabel, scenarios, status);
        void Read() => form.AllScenarios = scenarios.Value == 1;
        return Prompts.RunStudyDialog(app, dialog, status, Read, () => form.Build().Error, scenarios);
    }
}
