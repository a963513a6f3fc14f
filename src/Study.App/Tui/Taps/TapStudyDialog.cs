// The tap-study question as a dialog: band, watched buses and scenarios for one transformer.
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Taps;

/// <summary>Fills a <see cref="TapStudyForm"/>; blank fields keep the engine's defaults. Enter runs, Esc cancels.</summary>
public static class TapStudyDialog
{
    /// <summary>True when the user asked to run (the form then builds a request).</summary>
    public static bool Run(IApplication app, TapStudyForm form)
    {
        var dialog = new Dialog { Title = $"Tap study: {form.TransformerId}", Width = Dim.Percent(90), Height = 16 };
        var bandLabel = new Label { X = 0, Y = 0, Text = "Band pu  low" };
        var low = new EntryField { X = 14, Y = 0, Width = 8, Text = form.BandLowText };
        var highLabel = new Label { X = 23, Y = 0, Text = "high" };
        var high = new EntryField { X = 28, Y = 0, Width = 8, Text = form.BandHighText };
        var bandHint = new Label { X = 37, Y = 0, Width = Dim.Fill(), Text = "blank: each bus's own band" };
        var watchLabel = new Label { X = 0, Y = 2, Text = "Watch buses" };
        var watch = new EntryField { X = 14, Y = 2, Width = Dim.Fill(), Text = form.WatchText };
        var watchHint = new Label { X = 14, Y = 3, Width = Dim.Fill(), Text = "ids by comma; blank: the lv bus and the buses it feeds" };
        var scenLabel = new Label { X = 0, Y = 5, Text = "Scenarios" };
        var scenarios = new OptionSelector
        {
            X = 14, Y = 5, Width = Dim.Fill(),
            Labels = ["all scenarios of the network", $"the active scenario ({form.ActiveScenarioLabel})"],
            Value = form.AllScenarios ? 0 : 1,
        };
        var hold = new CheckBox
        {
            X = 14, Y = 8, Text = "hold the other on-load taps (else they regulate)",
            Value = form.HoldOtherTaps ? CheckState.Checked : CheckState.UnChecked,
        };
        var holdLabel = new Label { X = 0, Y = 8, Text = "Other taps" };
        var status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Enter runs · Esc cancels · Space ticks" };
        dialog.Add(bandLabel, low, highLabel, high, bandHint, watchLabel, watch, watchHint, scenLabel, scenarios, holdLabel, hold, status);
        void Read()
        {
            form.BandLowText = low.Text;
            form.BandHighText = high.Text;
            form.WatchText = watch.Text;
            form.AllScenarios = scenarios.Value != 1;
            form.HoldOtherTaps = hold.Value == CheckState.Checked;
        }
        return Prompts.RunStudyDialog(app, dialog, status, Read, () => form.Build().Error, low);
    }
}
