// The profile question as a dialog: the CSV, the step length, the scenario and the watched buses.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Profile;

/// <summary>Fills a <see cref="ProfileForm"/>. Enter runs, Esc cancels (and Esc stops the study once it runs).</summary>
public static class ProfileDialog
{
    public static bool Run(IApplication app, ProfileForm form)
    {
        Dialog dialog = Build(form, out Label status, out Action read, out View first, out Func<string?> check, app);
        return Prompts.RunStudyDialog(app, dialog, status, read, () => check() ?? form.Build().Error, first);
    }

    public static Dialog Build(ProfileForm form, out Label status, out Action read, out View first) =>
        Build(form, out status, out read, out first, out _, null);

    /// <param name="check">Why the scenario row cannot be read (a typed name that is no scenario), or null.</param>
    /// <param name="app">Runs the list of scenarios on F4 when they are too many to stand side by side.</param>
    public static Dialog Build(ProfileForm form, out Label status, out Action read, out View first, out Func<string?> check, IApplication? app)
    {
        var dialog = new Dialog { Title = "Load profile", Width = Dim.Percent(90), Height = 17 };
        var csvLabel = new Label { X = 0, Y = 0, Text = "Profile CSV" };
        var csv = new EntryField { X = 14, Y = 0, Width = Dim.Fill(), Text = form.CsvText };
        var csvHint = new Label { X = 14, Y = 1, Width = Dim.Fill(), Text = "time (ISO 8601), then 'scale' or a column per load id" };
        var stepLabel = new Label { X = 0, Y = 3, Text = "Step minutes" };
        var step = new EntryField { X = 14, Y = 3, Width = 8, Text = form.StepMinutesText };
        var stepHint = new Label { X = 23, Y = 3, Width = Dim.Fill(), Text = "blank: the spacing of the time column" };
        var watchLabel = new Label { X = 0, Y = 5, Text = "Watch buses" };
        var watch = new EntryField { X = 14, Y = 5, Width = Dim.Fill(), Text = form.WatchText };
        var watchHint = new Label { X = 14, Y = 6, Width = Dim.Fill(), Text = "ids by comma; blank: those on-load taps regulate" };
        var scenLabel = new Label { X = 0, Y = 8, Text = "Scenario" };
        var scenario = new OneOfRow(app, "scenario", form.ScenarioChoices.Select(Labels.Scenario).ToList(),
            form.ScenarioChoices.ToList().IndexOf(form.Scenario), 14, 8);
        status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Enter runs · Esc cancels · Esc stops a running profile" };
        dialog.Add([csvLabel, csv, csvHint, stepLabel, step, stepHint, watchLabel, watch, watchHint, scenLabel, .. scenario.Views, status]);
        read = () =>
        {
            form.CsvText = csv.Text;
            form.StepMinutesText = step.Text;
            form.WatchText = watch.Text;
            if (scenario.Index >= 0 && form.ScenarioChoices.Count > 0) form.Scenario = form.ScenarioChoices[scenario.Index];
        };
        check = () => scenario.Error;
        first = csv;
        return dialog;
    }
}
