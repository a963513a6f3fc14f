// The edit form of one element: a labelled text field per field, live problems and per-unit preview.
using Study.App.Tui.Shell;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Editing;

/// <summary>
/// Shows an <see cref="ElementForm"/> as a dialog. Fields scroll on the left; the right side shows the
/// validator's findings for this element and the per-unit values the engine will use, both re-evaluated
/// on every keystroke. Enter accepts (when the texts make an element), Esc cancels.
/// </summary>
public static class ElementDialog
{
    private const int LabelWidth = 18;
    private const int TextWidth = 13;

    /// <summary>The accepted element, or null when cancelled.</summary>
    public static object? Run(IApplication app, ElementForm form)
    {
        var dialog = new Dialog { Title = form.Title, Width = Dim.Percent(96), Height = Dim.Percent(94) };
        var fields = new View { X = 0, Y = 0, Width = LabelWidth + TextWidth + 12, Height = Dim.Fill(2), CanFocus = true };
        fields.SetContentSize(new System.Drawing.Size(LabelWidth + TextWidth + 12, form.Fields.Count));
        var findings = new TextPane { X = Pos.Right(fields) + 1, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(2), CanFocus = false };
        var status = new Label { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Text = "" };
        FormState state = form.Evaluate();

        void Refresh()
        {
            state = form.Evaluate();
            var lines = new List<string>();
            lines.Add(state.Problems.Count == 0 ? "No problems found." : "Problems:");
            lines.AddRange(state.Problems.Select(p => "  " + p));
            lines.Add("");
            lines.Add("Per-unit values the engine will use:");
            lines.AddRange(state.Preview.Count == 0 ? ["  (none for this kind, or the data is incomplete)"] : state.Preview.Select(p => "  " + p));
            findings.Content = string.Join("\n", lines);
            status.Text = state.CanAccept ? "Enter accepts · Esc cancels · blank = default" : "Fix the errors to accept · Esc cancels";
        }

        for (int i = 0; i < form.Fields.Count; i++)
        {
            int row = i;
            ElementField field = form.Fields[i];
            fields.Add(new Label { X = 0, Y = row, Width = LabelWidth, Text = Fit(field.Header, LabelWidth - 1) });
            var text = new TextField { X = LabelWidth, Y = row, Width = TextWidth, Text = form.Texts[row] };
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
            };
            fields.Add(text);
            if (field.DefaultText.Length > 0)
                fields.Add(new Label { X = LabelWidth + TextWidth + 1, Y = row, Width = 11, Text = Fit("[" + field.DefaultText + "]", 11) });
        }

        dialog.Add(fields, findings, status);
        var cancel = new Button { Text = "Cancel" };
        var ok = new Button { Text = "OK" };
        ok.Accepting += (_, e) =>
        {
            if (state.CanAccept) return;
            e.Handled = true;
            status.Text = "Cannot accept: " + (state.Problems.FirstOrDefault() ?? "incomplete");
        };
        dialog.AddButton(cancel);
        dialog.AddButton(ok);
        Refresh();
        app.Run(dialog);
        bool accepted = dialog.Result == 1 && state.CanAccept;
        dialog.Dispose();
        return accepted ? state.Element : null;
    }

    private static string Fit(string s, int width) => s.Length <= width ? s : s[..(width - 1)] + "…";
}
