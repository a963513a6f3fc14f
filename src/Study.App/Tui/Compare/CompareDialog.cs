// The comparison question as a dialog: two scenarios of this network, or a before file against this network.
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Compare;

/// <summary>Fills a <see cref="CompareForm"/>. Enter runs, Esc cancels.</summary>
public static class CompareDialog
{
    public static bool Run(IApplication app, CompareForm form)
    {
        var dialog = new Dialog { Title = "Compare before and after", Width = Dim.Percent(90), Height = 19 };
        string[] scenarioLabels = form.Scenarios.Select(CompareForm.ScenarioLabel).ToArray();
        var modeLabel = new Label { X = 0, Y = 0, Text = "Before" };
        var mode = new OptionSelector
        {
            X = 12, Y = 0, Width = Dim.Fill(),
            Labels = ["this network in another scenario", "another network file (the network before the change)"],
            Value = form.BeforeIsFile ? 1 : 0,
        };
        var beforeLabel = new Label { X = 0, Y = 3, Text = "scenario" };
        var before = new OneOfRow(app, "scenario", scenarioLabels, form.Scenarios.ToList().IndexOf(form.BeforeScenario), 12, 3);
        var fileLabel = new Label { X = 0, Y = 5, Text = "file" };
        var file = new EntryField { X = 12, Y = 5, Width = Dim.Fill(), Text = form.BeforePath };
        var afterLabel = new Label { X = 0, Y = 7, Text = "After" };
        var afterWhat = new Label { X = 12, Y = 7, Text = "this network as it stands now, in scenario" };
        var after = new OneOfRow(app, "scenario", scenarioLabels, form.Scenarios.ToList().IndexOf(form.AfterScenario), 12, 8);
        var hint = new Label { X = 0, Y = 10, Width = Dim.Fill(), Height = 2, Text = "A before file is solved in the after scenario;\nboth cases are solved alike and matched by id." };
        var status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Enter runs · Esc cancels" };
        dialog.Add([modeLabel, mode, beforeLabel, .. before.Views, fileLabel, file, afterLabel, afterWhat, .. after.Views, hint, status]);
        // Only the rows of the chosen kind of "before" take input: a before file is solved in the after scenario.
        void ShowMode()
        {
            bool isFile = mode.Value == 1;
            beforeLabel.Enabled = !isFile;
            before.Enabled = !isFile;
            fileLabel.Enabled = file.Enabled = isFile;
        }
        mode.ValueChanged += (_, _) => ShowMode();
        ShowMode();
        void Read()
        {
            form.BeforeIsFile = mode.Value == 1;
            if (before.Index >= 0) form.BeforeScenario = form.Scenarios[before.Index];
            if (after.Index >= 0) form.AfterScenario = form.Scenarios[after.Index];
            form.BeforePath = file.Text;
        }
        string? Rows() => (mode.Value == 1 ? null : before.Error) ?? after.Error;
        return Prompts.RunStudyDialog(app, dialog, status, Read, () => Rows() ?? form.Build().Error);
    }
}
