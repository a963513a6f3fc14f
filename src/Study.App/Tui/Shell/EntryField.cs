// The text field of every form and dialog: a long value shows its start when the field is not being edited.
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>
/// A <see cref="TextField"/> that, without the keyboard, shows the beginning of its text ("Cold Quay 33"
/// of a long bus name), where a plain one stays scrolled to its cursor, which setting or typing the
/// text leaves at the end ("tation board"). With the keyboard it is a plain text field: it selects its
/// text when it takes the keyboard, so typing replaces the value.
/// </summary>
public class EntryField : TextField
{
    /// <summary>Checked as it draws, so text set at any time (built, picked from a list, typed then left) starts at its start.</summary>
    protected override bool OnDrawingContent(DrawContext? context)
    {
        if (!HasFocus && (InsertionPoint != 0 || ScrollOffset != 0)) InsertionPoint = 0;
        return base.OnDrawingContent(context);
    }
}
