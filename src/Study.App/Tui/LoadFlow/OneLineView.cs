// Draws the rows laid out by OneLineLayout, unwrapped, scrolling both ways; colour repeats the ▼/▲ markers.
using Study.Core.LoadFlow;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.LoadFlow;

/// <summary>A read-only text canvas: arrows, PgUp/PgDn, Home/End scroll it.</summary>
public sealed class OneLineView : View
{
    private IReadOnlyList<OneLineRow> rows = [new("No network.")];
    private int left;

    public OneLineView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
    }

    public IReadOnlyList<OneLineRow> Rows
    {
        get => rows;
        set
        {
            rows = value;
            SetNeedsDraw();
        }
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        int top = Math.Clamp(Viewport.Y, 0, Math.Max(0, rows.Count - 1));
        for (int row = 0; row < Viewport.Height; row++)
        {
            int i = top + row;
            Move(0, row);
            SetAttribute(normal);
            string text = i < rows.Count ? rows[i].Text : "";
            if (i < rows.Count && rows[i].Violation != ViolationKind.None)
                SetAttribute(new Attr(rows[i].Violation == ViolationKind.Low ? ColorName16.BrightCyan : ColorName16.BrightRed, normal.Background));
            text = left < text.Length ? text[left..] : "";
            AddStr(text.Length > Viewport.Width ? text[..Viewport.Width] : text.PadRight(Viewport.Width));
        }
        return true;
    }

    protected override bool OnKeyDown(Key key)
    {
        int y = Viewport.Y, page = Math.Max(1, Viewport.Height - 1);
        int widest = rows.Count == 0 ? 0 : rows.Max(r => r.Text.Length);
        if (key == Key.CursorDown) y++;
        else if (key == Key.CursorUp) y--;
        else if (key == Key.PageDown) y += page;
        else if (key == Key.PageUp) y -= page;
        else if (key == Key.Home) (y, left) = (0, 0);
        else if (key == Key.End) y = rows.Count;
        else if (key == Key.CursorRight) left = Math.Min(left + 4, Math.Max(0, widest - Viewport.Width));
        else if (key == Key.CursorLeft) left = Math.Max(0, left - 4);
        else return false;
        SetContentSize(new System.Drawing.Size(Math.Max(1, Viewport.Width), Math.Max(1, rows.Count)));
        Viewport = Viewport with { Y = Math.Clamp(y, 0, Math.Max(0, rows.Count - Viewport.Height)) };
        SetNeedsDraw();
        return true;
    }
}
