// The one-row strip of result tab names above the results: the shown tab in brackets, scrolled into view.
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>
/// Draws the tab names on one row; never takes focus (Alt+1…9 switch tabs), so arrow keys cannot land
/// on it. The shown tab reads "[Buses]" and is drawn in the focus colour, so it reads without colour.
/// When the names do not fit, the strip scrolls to keep the shown one visible and marks the hidden
/// ones with ◄ and ►. With room to spare each of the first ten names carries its Alt+digit (the tenth Alt+0).
/// </summary>
public sealed class TabStrip : View
{
    private IReadOnlyList<string> titles = [];
    private int selected;

    public TabStrip()
    {
        Height = 1;
        Width = Dim.Fill();
        CanFocus = false;
    }

    public IReadOnlyList<string> Titles
    {
        get => titles;
        set
        {
            titles = value;
            SetNeedsDraw();
        }
    }

    public int Selected
    {
        get => selected;
        set
        {
            selected = value;
            SetNeedsDraw();
        }
    }

    /// <summary>The strip as text for a width, and where the shown tab's name starts and ends in it.</summary>
    public static (string Text, int Start, int End) Layout(IReadOnlyList<string> titles, int selected, int width)
    {
        if (titles.Count == 0 || width <= 0) return ("", 0, 0);
        IReadOnlyList<string> Items(bool digits) =>
            titles.Select((t, i) => (digits && i < 10 ? $"{(i + 1) % 10} " : "") + t).Select((t, i) => i == selected ? $"[{t}]" : $" {t} ").ToList();
        IReadOnlyList<string> items = Items(digits: true);
        if (items.Sum(i => i.Length) + items.Count - 1 > width) items = Items(digits: false);
        // The first item shown: as far left as possible while the selected one still fits, room left for the marks.
        int first = 0;
        int Span(int from, int to) => Enumerable.Range(from, to - from + 1).Sum(i => items[i].Length) + (to - from);
        while (first < selected && Span(first, selected) + (first > 0 ? 1 : 0) + (selected < items.Count - 1 ? 1 : 0) > width) first++;
        var text = new System.Text.StringBuilder(first > 0 ? "◄" : "");
        int start = 0, end = 0;
        for (int i = first; i < items.Count; i++)
        {
            string sep = i > first ? "│" : "";
            bool last = i == items.Count - 1;
            if (text.Length + sep.Length + items[i].Length + (last ? 0 : 1) > width && i > selected)
            {
                text.Append('►');
                break;
            }
            text.Append(sep);
            if (i == selected) start = text.Length;
            text.Append(items[i]);
            if (i == selected) end = text.Length;
        }
        string s = text.ToString();
        return (s.Length > width ? s[..width] : s, start, Math.Min(end, width));
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        (string text, int start, int end) = Layout(titles, selected, Viewport.Width);
        text = text.PadRight(Viewport.Width);
        Move(0, 0);
        SetAttributeForRole(VisualRole.Normal);
        AddStr(text[..start]);
        SetAttributeForRole(VisualRole.Focus);
        AddStr(text[start..end]);
        SetAttributeForRole(VisualRole.Normal);
        AddStr(text[end..]);
        return true;
    }
}
