// A highlighted note above a result: out of date, failed, not converged. Takes no rows when empty.
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Shell;

/// <summary>
/// Wrapped text in black on yellow (white on red for a failure), as tall as its text; the words
/// themselves ("OUT OF DATE", "FAILED") carry the meaning without colour.
/// </summary>
public sealed class NoticeLine : View
{
    private string? text;

    public NoticeLine()
    {
        Width = Dim.Fill();
        // Sized from the width of the view it sits in, not its own (a view sized by its own viewport need not settle).
        Height = Dim.Func(_ => text is null ? 0 : TextPane.Wrap(text, Math.Max(1, SuperView?.Viewport.Width ?? 1)).Count);
        CanFocus = false;
    }

    /// <summary>The note, or null for none.</summary>
    public string? Note
    {
        get => text;
        set
        {
            if (text == value) return;
            text = value;
            SuperView?.SetNeedsLayout();
            SetNeedsLayout();
            SetNeedsDraw();
        }
    }

    public bool IsFailure { get; set; }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        if (text is null) return true;
        SetAttribute(IsFailure ? new Attr(ColorName16.White, ColorName16.Red) : new Attr(ColorName16.Black, ColorName16.BrightYellow));
        IReadOnlyList<string> lines = TextPane.Wrap(text, Math.Max(1, Viewport.Width));
        for (int row = 0; row < Viewport.Height; row++)
        {
            Move(0, row);
            AddStr((row < lines.Count ? lines[row] : "").PadRight(Viewport.Width));
        }
        return true;
    }
}
