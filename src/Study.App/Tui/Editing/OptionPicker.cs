// A list to pick a field's value from (a bus, a choice), narrowed as the user types.
using System.Collections.ObjectModel;
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Editing;

/// <summary>
/// Typing narrows the list (values starting with the text first, then values or descriptions that
/// contain it); Up and Down move in it; Enter picks; Esc leaves the field as it was.
/// </summary>
public static class OptionPicker
{
    /// <summary>The options matching <paramref name="typed"/>, best first.</summary>
    public static IReadOnlyList<FieldOption> Matching(IReadOnlyList<FieldOption> options, string typed)
    {
        string t = typed.Trim();
        if (t.Length == 0) return options;
        return options.Where(o => o.Value.StartsWith(t, StringComparison.OrdinalIgnoreCase))
            .Concat(options.Where(o => !o.Value.StartsWith(t, StringComparison.OrdinalIgnoreCase)
                && (o.Value.Contains(t, StringComparison.OrdinalIgnoreCase) || o.Description.Contains(t, StringComparison.OrdinalIgnoreCase))))
            .ToList();
    }

    public static string Line(FieldOption o, int width) => o.Description.Length == 0 ? o.Value : $"{o.Value.PadRight(width)}  {o.Description}";

    /// <summary>The picked value, or null when cancelled.</summary>
    public static string? Run(IApplication app, string title, IReadOnlyList<FieldOption> options, string current)
    {
        int idWidth = options.Count == 0 ? 4 : Math.Min(16, options.Max(o => o.Value.Length));
        var dialog = new Dialog { Title = title, Width = Dim.Percent(70), Height = Dim.Percent(80) };
        var label = new Label { X = 0, Y = 0, Text = "Type to narrow:" };
        var filter = new EntryField { X = 16, Y = 0, Width = Dim.Fill() };
        var list = new ListView { X = 0, Y = 2, Width = Dim.Fill(), Height = Dim.Fill(1) };
        var hint = new Label { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Text = "↑↓ choose · Enter picks · Esc leaves the field as it was" };
        IReadOnlyList<FieldOption> shown = options;
        void Show()
        {
            shown = Matching(options, filter.Text);
            list.SetSource(new ObservableCollection<string>(shown.Select(o => Line(o, idWidth))));
            list.SelectedItem = shown.Count == 0 ? null : 0;
        }
        filter.TextChanged += (_, _) => Show();
        filter.KeyDown += (_, key) =>
        {
            if (key == Key.CursorDown) { list.MoveDown(false); key.Handled = true; }
            else if (key == Key.CursorUp) { list.MoveUp(false); key.Handled = true; }
        };
        dialog.Add(label, filter, list, hint);
        dialog.AddButton(new Button { Text = "Cancel" });
        dialog.AddButton(new Button { Text = "Pick" });
        Show();
        int at = shown.ToList().FindIndex(o => string.Equals(o.Value, current.Trim(), StringComparison.OrdinalIgnoreCase));
        if (at >= 0) list.SelectedItem = at;
        filter.SetFocus();
        app.Run(dialog);
        string? picked = dialog.Result == 1 && list.SelectedItem is int i && i >= 0 && i < shown.Count ? shown[i].Value : null;
        dialog.Dispose();
        return picked;
    }
}
