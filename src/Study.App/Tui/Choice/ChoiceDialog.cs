// The bank-choice question as a dialog.
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Choice;

/// <summary>Fills a <see cref="ChoiceForm"/>. Enter runs, Esc cancels (and stops the study once it runs).</summary>
public static class ChoiceDialog
{
    public static bool Run(IApplication app, ChoiceForm form)
    {
        Dialog dialog = Build(form, out Label status, out Action read, out View first, app);
        return Prompts.RunStudyDialog(app, dialog, status, read, () => form.Build().Error, first);
    }

    /// <param name="app">Runs the list of transformers on F4 when they are too many to stand side by side.</param>
    public static Dialog Build(ChoiceForm form, out Label status, out Action read, out View first, IApplication? app = null)
    {
        var dialog = new Dialog { Title = "Bank choice", Width = Dim.Percent(94), Height = Dim.Percent(94) };
        const int at = 18;
        var transformer = new OneOfRow(app, "transformer", form.Transformers, form.Transformers.ToList().IndexOf(form.TransformerId), at, 0);
        var candidates = new EntryField { X = at, Y = 1, Width = Dim.Fill(), Text = form.CandidatesText };
        var factor = new EntryField { X = at, Y = 2, Width = 8, Text = form.LossLoadFactorText };
        var profile = new EntryField { X = at, Y = 3, Width = Dim.Fill(), Text = form.ProfileText };
        var noLoad = new EntryField { X = at, Y = 4, Width = 10, Text = form.NoLoadRateText };
        var load = new EntryField { X = at + 20, Y = 4, Width = 10, Text = form.LoadRateText };
        var low = new EntryField { X = at, Y = 5, Width = 8, Text = form.BandLowText };
        var high = new EntryField { X = at + 14, Y = 5, Width = 8, Text = form.BandHighText };
        var scenarios = new OptionSelector
        {
            X = at, Y = 6, Width = Dim.Fill(), Orientation = Orientation.Horizontal,
            Labels = ["all scenarios", $"the active one ({form.ActiveScenarioLabel})"],
            Value = form.AllScenarios ? 0 : 1,
        };
        status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Enter runs · Esc cancels · Esc stops a running choice" };
        dialog.Add([
            new Label { X = 0, Y = 0, Text = "Transformer" }, .. transformer.Views,
            new Label { X = 0, Y = 1, Text = "Candidates" }, candidates,
            new Label { X = 0, Y = 2, Text = "Loss-load factor" }, factor,
            new Label { X = at + 9, Y = 2, Width = Dim.Fill(), Text = "0..1, or a profile CSV below (one of the two)" },
            new Label { X = 0, Y = 3, Text = "Profile CSV" }, profile,
            new Label { X = 0, Y = 4, Text = "No-load A" }, noLoad,
            new Label { X = at + 11, Y = 4, Text = "Load B" }, load,
            new Label { X = at + 31, Y = 4, Width = Dim.Fill(), Text = "money per kW; blank 0" },
            new Label { X = 0, Y = 5, Text = "Band pu  low" }, low,
            new Label { X = at + 9, Y = 5, Text = "high" }, high,
            new Label { X = at + 23, Y = 5, Width = Dim.Fill(), Text = "blank: each bus's own" },
            new Label { X = 0, Y = 6, Text = "Scenarios" }, scenarios,
            new TextPane { X = 0, Y = 8, Height = Dim.Fill(2), CanFocus = false, Content = "Caution: " + Study.Core.Faults.FaultStudy.Caution },
            status]);
        read = () =>
        {
            form.TransformerId = transformer.Text;
            form.CandidatesText = candidates.Text;
            form.LossLoadFactorText = factor.Text;
            form.ProfileText = profile.Text;
            form.NoLoadRateText = noLoad.Text;
            form.LoadRateText = load.Text;
            form.BandLowText = low.Text;
            form.BandHighText = high.Text;
            form.AllScenarios = scenarios.Value != 1;
        };
        first = transformer.SideBySideShown ? candidates : transformer.Input;
        return dialog;
    }
}
