// The motor-start question as a dialog: the motors ticked, the voltage they need, watched buses, scenario.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Start;

/// <summary>Fills a <see cref="StartForm"/>. Space ticks a motor, Enter runs, Esc cancels.</summary>
public static class StartDialog
{
    public static bool Run(IApplication app, StartForm form)
    {
        Dialog dialog = Build(form, out Label status, out Action read, out View first, out Func<string?> check, app);
        return Prompts.RunStudyDialog(app, dialog, status, read, () => check() ?? form.Build().Error, first);
    }

    /// <summary>The dialog's views, built without running it (the tests draw it headless).</summary>
    public static Dialog Build(StartForm form, out Label status, out Action read, out View first) =>
        Build(form, out status, out read, out first, out _, null);

    /// <param name="check">Why the scenario row cannot be read (a typed name that is no scenario), or null.</param>
    /// <param name="app">Runs the list of scenarios on F4 when they are too many to stand side by side.</param>
    public static Dialog Build(StartForm form, out Label status, out Action read, out View first, out Func<string?> check, IApplication? app)
    {
        var dialog = new Dialog { Title = "Motor start", Width = Dim.Percent(90), Height = Dim.Percent(90) };
        var motorsLabel = new Label { X = 0, Y = 0, Text = "Start together (Space ticks):" };
        var motors = new ListView { X = 0, Y = 1, Width = Dim.Fill(), Height = Dim.Fill(10), ShowMarks = true, MarkMultiple = true };
        motors.SetSource(new System.Collections.ObjectModel.ObservableCollection<string>(form.Motors.Select(StartForm.Describe)));
        for (int i = 0; i < form.Motors.Count; i++)
            if (form.Chosen.Contains(form.Motors[i].Id)) motors.Source?.SetMark(i, true);
        if (form.Motors.Count > 0) motors.SelectedItem = 0;
        var minLabel = new Label { X = 0, Y = Pos.AnchorEnd(9), Text = "Min terminal pu" };
        var min = new EntryField { X = 17, Y = Pos.AnchorEnd(9), Width = 8, Text = form.MinTerminalText };
        var minHint = new Label { X = 26, Y = Pos.AnchorEnd(9), Width = Dim.Fill(), Text = "blank: 0.80" };
        var watchLabel = new Label { X = 0, Y = Pos.AnchorEnd(8), Text = "Watch buses" };
        var watch = new EntryField { X = 17, Y = Pos.AnchorEnd(8), Width = Dim.Fill(), Text = form.WatchText };
        var scenLabel = new Label { X = 0, Y = Pos.AnchorEnd(7), Text = "Scenario" };
        var scenario = new OneOfRow(app, "scenario", form.ScenarioChoices.Select(Labels.Scenario).ToList(),
            form.ScenarioChoices.ToList().IndexOf(form.Scenario), 17, Pos.AnchorEnd(7));
        var caution = new TextPane { X = 0, Y = Pos.AnchorEnd(6), Height = 4, CanFocus = false, Content = "Caution: " + Study.Core.Faults.FaultStudy.Caution };
        status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Space ticks · Enter runs · Esc cancels" };
        dialog.Add([motorsLabel, motors, minLabel, min, minHint, watchLabel, watch, scenLabel, .. scenario.Views, caution, status]);
        read = () =>
        {
            form.Chosen.Clear();
            for (int i = 0; i < form.Motors.Count; i++)
                if (motors.Source?.IsMarked(i) == true) form.Chosen.Add(form.Motors[i].Id);
            form.MinTerminalText = min.Text;
            form.WatchText = watch.Text;
            if (scenario.Index >= 0 && form.ScenarioChoices.Count > 0) form.Scenario = form.ScenarioChoices[scenario.Index];
        };
        check = () => scenario.Error;
        first = motors;
        return dialog;
    }
}
