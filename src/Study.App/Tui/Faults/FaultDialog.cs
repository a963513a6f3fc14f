// The fault question as a dialog: which kinds, which method and level, the selected bus or every bus.
using Study.App.Tui.Shell;
using Study.Core.Faults;
using Study.Core.Units;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Faults;

/// <summary>Fills a <see cref="FaultForm"/>. The caution stands in the dialog as on every fault screen.</summary>
public static class FaultDialog
{
    public static bool Run(IApplication app, FaultForm form)
    {
        var dialog = new Dialog { Title = "Fault study", Width = Dim.Percent(90), Height = Dim.Percent(90) };
        var kindsLabel = new Label { X = 0, Y = 0, Text = "Faults" };
        var boxes = FaultForm.AllKinds.Select((k, i) => new CheckBox
        {
            X = 10, Y = i, Text = FaultForm.KindLabel(k),
            Value = form.Kinds.Contains(k) ? CheckState.Checked : CheckState.UnChecked,
        }).ToList();
        // The choices stand one under another: side by side, the longer ones ran past the frame at 80 columns.
        var methodLabel = new Label { X = 0, Y = 4, Text = "Method" };
        var method = new OptionSelector
        {
            X = 10, Y = 4, Width = Dim.Fill(),
            Labels = ["iec60909 (equivalent source)", "loadflow (pre-fault voltages)"],
            Value = form.Method == FaultMethod.Iec60909 ? 0 : 1,
        };
        var levelLabel = new Label { X = 0, Y = 6, Text = "Level" };
        var level = new OptionSelector
        {
            X = 10, Y = 6, Width = Dim.Fill(), Orientation = Orientation.Horizontal,
            Labels = ["max (breaker duty)", "min (protection reach)"],
            Value = form.Level == FaultLevel.Max ? 0 : 1,
        };
        var whereLabel = new Label { X = 0, Y = 7, Text = "Where" };
        var where = new OptionSelector
        {
            X = 10, Y = 7, Width = Dim.Fill(),
            Labels = ["all buses", form.SelectedBus is { } bus ? $"only bus {bus} (selected in the Buses table)" : "only the selected bus (none selected)"],
            Value = form.AllBuses ? 0 : 1,
        };
        // Underscores are part of the names (t_min, I_b), not hotkey marks.
        var plain = new System.Text.Rune(0xffff);
        var timesLabel = new Label { X = 0, Y = 9, Text = "t_min s", HotKeySpecifier = plain };
        var tMin = new EntryField { X = 10, Y = 9, Width = 7, Text = form.TMinText };
        var tkLabel = new Label { X = 18, Y = 9, Text = "T_k s", HotKeySpecifier = plain };
        var tk = new EntryField { X = 24, Y = 9, Width = 7, Text = form.DurationText };
        var timesHint = new Label { X = 32, Y = 9, Width = Dim.Fill(), Text = "blank: 0.1 and 1 (I_b, i_DC; I_th)", HotKeySpecifier = plain };
        var caution = new TextPane { X = 0, Y = 10, Height = Dim.Fill(1), CanFocus = false, Content = "Caution: " + FaultStudy.Caution };
        var status = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "Space ticks · Enter runs · Esc cancels" };
        dialog.Add(kindsLabel);
        foreach (CheckBox box in boxes) dialog.Add(box);
        dialog.Add(methodLabel, method, levelLabel, level, whereLabel, where, timesLabel, tMin, tkLabel, tk, timesHint, caution, status);
        void Read()
        {
            form.Kinds.Clear();
            for (int i = 0; i < boxes.Count; i++)
                if (boxes[i].Value == CheckState.Checked) form.Kinds.Add(FaultForm.AllKinds[i]);
            form.Method = method.Value == 1 ? FaultMethod.LoadFlow : FaultMethod.Iec60909;
            form.Level = level.Value == 1 ? FaultLevel.Min : FaultLevel.Max;
            form.AllBuses = where.Value != 1;
            form.TMinText = tMin.Text;
            form.DurationText = tk.Text;
        }
        return Prompts.RunStudyDialog(app, dialog, status, Read, () => form.Build().Error);
    }
}
