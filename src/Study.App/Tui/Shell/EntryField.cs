// The text field of every form and dialog: a long value shows its start when the field is not being edited.
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>
/// A <see cref="TextField"/> that, without the keyboard, shows the beginning of its text ("Cold Quay 33"
/// of a long bus name), where a plain one stays scrolled to its cursor, which setting the text leaves
/// at the end ("tation board"). With the keyboard the cursor goes to the end, as typing into a field expects.
/// </summary>
public class EntryField : TextField
{
    public EntryField()
    {
        HasFocusChanged += (_, e) =>
        {
            if (e.NewValue) MoveEnd();
        };
    }

    /// <summary>Checked as it draws, so text set at any time (built, picked from a list, typed then left) starts at its start.</summary>
    protected override bool OnDrawingContent(DrawContext? context)
    {
        if (!HasFocus && (InsertionPoint != 0 || ScrollOffset != 0)) InsertionPoint = 0;
        return base.OnDrawingContent(context);
    }
}
