// The edit form of one element: a labelled text field per field, live problems and per-unit preview.
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Editing;

/// <summary>
/// Shows an <see cref="ElementForm"/> as a dialog. Fields scroll on the left; the right side shows the
/// validator's findings for this element and the per-unit values the engine will use, both re-evaluated
/// on every keystroke. Nothing typed is lost: Enter accepts only a form without errors, and otherwise
/// keeps the form open with the focus on the first field in error (marked "!"); Esc asks before
/// discarding changed fields. F4 lists a field's possible values (buses, choices) to pick from.
/// </summary>
public sealed class ElementDialog : Dialog
{
    // Labels up to 18 characters, and the "! " mark before one in error, stand whole beside their fields.
    private const int LabelWidth = 21;
    private const int TextWidth = 13;
    private const int HintWidth = 14;
    /// <summary>No hotkeys in labels and hints: underscores belong to names (t_min, I_rM).</summary>
    private static readonly System.Text.Rune Plain = new(0xffff);
    private readonly IApplication app;
    private readonly ElementForm form;
    private readonly View fields;
    private readonly List<Label> labels = [];
    private readonly List<TextField> texts = [];
    private readonly TextPane findings;
    private readonly Label status;
    private FormState state;
    private bool discardConfirmed;

    public ElementDialog(IApplication app, ElementForm form)
    {
        this.app = app;
        this.form = form;
        Title = form.Title;
        Width = Dim.Percent(98);
        Height = Dim.Percent(94);
        fields = new View { X = 0, Y = 0, Width = LabelWidth + TextWidth + HintWidth + 1, Height = Dim.Fill(2), CanFocus = true };
        fields.SetContentSize(new System.Drawing.Size(LabelWidth + TextWidth + HintWidth + 1, form.Fields.Count));
        // The working of a motor runs past 24 rows: Tab reaches it, and arrows or PgDn scroll it.
        findings = new TextPane { X = Pos.Right(fields) + 1, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(2) };
        status = new Label { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Text = "" };
        state = form.Evaluate();
        for (int i = 0; i < form.Fields.Count; i++) AddField(i);
        Add(fields, findings, status);
        AddButton(new Button { Text = "Cancel" });
        AddButton(new Button { Text = "OK" });
        Refresh();
    }

    /// <summary>The accepted element, or null when cancelled.</summary>
    public object? AcceptedElement { get; private set; }

    /// <summary>The text field of each form field, in form order (the tests type into them).</summary>
    public IReadOnlyList<TextField> Texts => texts;

    public string StatusText => status.Text;

    /// <summary>The accepted element, or null when cancelled.</summary>
    public static object? Run(IApplication app, ElementForm form)
    {
        var dialog = new ElementDialog(app, form);
        app.Run(dialog);
        object? accepted = dialog.AcceptedElement;
        dialog.Dispose();
        return accepted;
    }

    /// <summary>What a field's hint column says: its default, "required", or that F4 lists its values.</summary>
    public static string Hint(ElementField field) =>
        field.Required ? "[required]"
        : field.DefaultText.Length > 0 ? "[" + field.DefaultText + "]"
        : field.Options is not null ? "[F4 list]"
        : "";

    private void AddField(int row)
    {
        ElementField field = form.Fields[row];
        var label = new Label { X = 0, Y = row, Width = LabelWidth, Text = Fit(field.Header, LabelWidth - 3), HotKeySpecifier = Plain };
        var text = new EntryField { X = LabelWidth, Y = row, Width = TextWidth, Text = form.Texts[row] };
        text.TextChanged += (_, _) =>
        {
            form.Texts[row] = text.Text;
            Refresh();
        };
        text.HasFocusChanged += (_, e) =>
        {
            if (!e.NewValue) return;
            System.Drawing.Rectangle v = fields.Viewport;
            if (row < v.Y) fields.Viewport = v with { Y = row };
            else if (row >= v.Y + v.Height) fields.Viewport = v with { Y = row - v.Height + 1 };
            ShowStatus();
        };
        text.KeyDown += (_, key) =>
        {
            if ((key == Key.F4 || key == Key.CursorDown.WithAlt) && field.Options is { } options)
            {
                key.Handled = true;
                if (OptionPicker.Run(app, field.Header, options(form.Network), text.Text) is { } picked) text.Text = picked;
            }
        };
        labels.Add(label);
        texts.Add(text);
        fields.Add(label, text);
        string hint = Hint(field);
        if (hint.Length > 0) fields.Add(new Label { X = LabelWidth + TextWidth + 1, Y = row, Width = HintWidth, Text = Fit(hint, HintWidth), HotKeySpecifier = Plain });
    }

    private void Refresh()
    {
        state = form.Evaluate();
        var lines = new List<string> { state.Problems.Count == 0 ? "No problems found." : "Problems:" };
        lines.AddRange(state.Problems.Select(p => "  " + p));
        lines.Add("");
        lines.Add("Per-unit values the engine will use:");
        lines.AddRange(state.Preview.Count == 0 ? ["  (none for this kind, or the data is incomplete)"] : state.Preview.Select(p => "  " + p));
        findings.Content = string.Join("\n", lines);
        for (int i = 0; i < labels.Count; i++)
        {
            bool bad = state.BadFields.Contains(i);
            string header = Fit(form.Fields[i].Header, LabelWidth - 3);
            labels[i].Text = bad ? "! " + header : header;
            labels[i].SetScheme(bad ? new Scheme(new Attr(ColorName16.BrightRed, GetAttributeForRole(VisualRole.Normal).Background)) : null);
        }
        ShowStatus();
    }

    private void ShowStatus()
    {
        int focused = texts.FindIndex(t => t.HasFocus);
        string options = focused >= 0 && form.Fields[focused].Options is not null ? " · F4 lists the values" : "";
        status.Text = state.CanAccept
            ? $"Enter accepts · Esc cancels · blank takes the [default]{options}"
            : $"{state.Problems.Count(p => p.StartsWith("error", StringComparison.Ordinal))} error(s): fix the fields marked ! to accept · Esc cancels{options}";
    }

    /// <summary>
    /// Every way out passes here: OK and Enter (from any field) only with a form the validator accepts,
    /// Esc and Cancel only when nothing changed or the user agreed to discard.
    /// </summary>
    protected override bool OnIsRunningChanging(bool oldIsRunning, bool newIsRunning)
    {
        if (newIsRunning) return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
        if (Result == 1)
        {
            state = form.Evaluate();
            if (state.CanAccept)
            {
                AcceptedElement = state.Element;
                return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
            }
            Result = null;
            Refuse();
            return true;
        }
        if (!form.Changed || discardConfirmed) return base.OnIsRunningChanging(oldIsRunning, newIsRunning);
        app.Invoke(AskDiscard);
        return true;
    }

    /// <summary>Keeps the form open: the message says why, the focus goes to the first field in error.</summary>
    private void Refuse()
    {
        string first = state.Problems.FirstOrDefault(p => p.StartsWith("error", StringComparison.Ordinal)) ?? "the form is incomplete";
        int? field = state.BadFields.Count > 0 ? state.BadFields[0] : null;
        if (field is int f) texts[f].SetFocus();
        status.Text = $"Not accepted: {first["error: ".Length..]}";
    }

    private void AskDiscard()
    {
        // Keep editing is the default: Enter after a stray Esc loses nothing.
        int? answer = Prompts.Ask(app, "Discard changes?", $"{form.Title}: the fields you changed will be lost.\n\nD discards them · Enter or Esc keeps editing.", "Discard", "Keep editing");
        if (answer != 0) return;
        discardConfirmed = true;
        Result = null;
        RequestStop();
    }

    private static string Fit(string s, int width) => s.Length <= width ? s : s[..(width - 1)] + "…";
}
