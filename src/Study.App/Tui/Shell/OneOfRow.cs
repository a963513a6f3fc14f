// One choice among named values on one dialog row: side by side when they fit, typed or listed (F4) when not.
using Study.App.Tui.Editing;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>
/// A few choices (two scenarios, five banks) stand side by side as options. Many (an imported case's
/// banks, a long list of scenarios) would run past the frame unseen: then the row is a text field that
/// takes the name typed, F4 lists them with type-ahead as the edit forms do, and a name that is none
/// of them is an error that names it, never a silent pick.
/// </summary>
public sealed class OneOfRow
{
    /// <summary>Characters the options may take side by side (an 80-column dialog, after its label).</summary>
    public const int SideBySide = 52;

    private readonly IReadOnlyList<string> names;
    private readonly OptionSelector? options;
    private readonly EntryField? typed;

    /// <param name="what">What is chosen, for the list's title and messages ("transformer", "scenario").</param>
    public OneOfRow(IApplication? app, string what, IReadOnlyList<string> names, int chosen, int x, Pos y)
    {
        this.names = names;
        What = what;
        if (names.Sum(n => n.Length + 4) <= SideBySide)
        {
            options = new OptionSelector
            {
                X = x, Y = y, Width = Dim.Fill(), Orientation = Orientation.Horizontal,
                Labels = names.Count == 0 ? ["(none)"] : names.ToList(), Value = Math.Max(0, chosen),
            };
            Views = [options];
            return;
        }
        typed = new EntryField { X = x, Y = y, Width = 20, Text = chosen >= 0 && chosen < names.Count ? names[chosen] : "" };
        typed.KeyDown += (_, key) =>
        {
            if (app is null || !(key == Key.F4 || key == Key.CursorDown.WithAlt)) return;
            key.Handled = true;
            if (OptionPicker.Run(app, $"Choose the {what}", names.Select(n => new FieldOption(n)).ToList(), typed.Text) is { } picked)
                typed.Text = picked;
        };
        Views = [typed, new Label { X = x + 21, Y = y, Width = Dim.Fill(), Text = $"F4 lists the {names.Count} {what}s" }];
    }

    public string What { get; }

    /// <summary>The views to add to the dialog, the one that takes input first.</summary>
    public IReadOnlyList<View> Views { get; }

    /// <summary>The view that takes the keyboard.</summary>
    public View Input => Views[0];

    /// <summary>True when the names stand side by side as options.</summary>
    public bool SideBySideShown => options is not null;

    /// <summary>The index of the chosen name; -1 when the typed name is none of them.</summary>
    public int Index => options is not null
        ? Math.Clamp(options.Value ?? 0, 0, Math.Max(0, names.Count - 1))
        : names.ToList().FindIndex(n => string.Equals(n, typed!.Text.Trim(), StringComparison.OrdinalIgnoreCase));

    /// <summary>The chosen name, or the text typed when it is none of them (for the question to name it).</summary>
    public string Text => Index >= 0 && names.Count > 0 ? names[Index] : typed?.Text.Trim() ?? "";

    /// <summary>Why the row cannot be read, or null.</summary>
    public string? Error => Index >= 0 || names.Count == 0 ? null
        : typed!.Text.Trim().Length == 0 ? $"choose the {What} (F4 lists them)"
        : $"'{typed.Text.Trim()}' is not a {What} of this network (F4 lists them)";

    /// <summary>Enables or disables the row (a choice that does not apply to the question as asked).</summary>
    public bool Enabled
    {
        set
        {
            foreach (View v in Views) v.Enabled = value;
        }
    }
}
