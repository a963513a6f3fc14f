// A read-only, word-wrapped, scrollable block of text for details, findings and help.
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>
/// Shows text wrapped to the width; arrows and PgUp/PgDn scroll when it has focus. With a
/// <see cref="FoldLabel"/>, text that does not fit says so on its last row while the pane lacks focus
/// ("▼ Method and notes: 6 more lines, Tab to read them"), so nothing is hidden in silence.
/// </summary>
public sealed class TextPane : View
{
    private string content = "";

    public TextPane()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
    }

    /// <summary>What the text is, for the row that says more lines are hidden; null draws no such row.</summary>
    public string? FoldLabel { get; set; }

    public string Content
    {
        get => content;
        set
        {
            content = value;
            Viewport = Viewport with { Y = 0 };
            SetNeedsDraw();
        }
    }

    /// <summary>Breaks text into lines of at most <paramref name="width"/> characters, at spaces where possible.</summary>
    public static IReadOnlyList<string> Wrap(string text, int width)
    {
        var lines = new List<string>();
        width = Math.Max(1, width);
        foreach (string raw in text.Split('\n'))
        {
            string rest = raw.TrimEnd('\r');
            string indent = new(' ', Math.Min(rest.Length - rest.TrimStart().Length, width / 2));
            // A row of aligned columns (keys, then what they do) hangs its wrapped words under its last
            // column, when that column starts within the first two thirds of the width.
            int column = LastColumn(rest);
            if (column > indent.Length + 2 && column <= width * 2 / 3) indent = new string(' ', column - 2);
            bool first = true;
            do
            {
                string line = first ? rest : indent + "  " + rest;
                if (line.Length <= width)
                {
                    lines.Add(line);
                    break;
                }
                int cut = line.LastIndexOf(' ', width);
                if (cut <= indent.Length + 2) cut = width;
                lines.Add(line[..cut]);
                rest = line[cut..].TrimStart();
                first = false;
            }
            while (rest.Length > 0);
        }
        return lines;
    }

    /// <summary>Where the last column of an aligned row starts (after a gap of three or more spaces); 0 when none.</summary>
    private static int LastColumn(string line)
    {
        int gap = line.TrimStart().Length == 0 ? -1 : line.LastIndexOf("   ", StringComparison.Ordinal);
        if (gap <= 0 || line.Length - line.TrimStart().Length >= gap) return 0;
        int start = gap;
        while (start < line.Length && line[start] == ' ') start++;
        return start < line.Length ? start : 0;
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        IReadOnlyList<string> lines = Wrap(content, Viewport.Width);
        SetContentSize(new System.Drawing.Size(Viewport.Width, Math.Max(lines.Count, 1)));
        SetAttributeForRole(Terminal.Gui.Drawing.VisualRole.Normal);
        int hidden = lines.Count - Viewport.Y - Viewport.Height;
        bool fold = FoldLabel is not null && !HasFocus && hidden > 0;
        for (int row = 0; row < Viewport.Height; row++)
        {
            int i = row + Viewport.Y;
            string line = i < lines.Count ? lines[i] : "";
            if (fold && row == Viewport.Height - 1)
                line = FoldRow(FoldLabel!, hidden + 1, Viewport.Height > 1, Viewport.Width);
            Move(0, row);
            AddStr(line.PadRight(Viewport.Width));
        }
        return true;
    }

    /// <summary>The last row of folded text: what it is and how many lines Tab shows, cut to the width.</summary>
    public static string FoldRow(string label, int lines, bool someShown, int width)
    {
        string row = $"▼ {label}: {lines} {(someShown ? "more " : "")}line{(lines == 1 ? "" : "s")}, Tab to read them";
        return row.Length <= width ? row : row[..Math.Max(0, width - 1)] + "…";
    }

    protected override void OnHasFocusChanged(bool newHasFocus, View? previousFocusedView, View? view)
    {
        SetNeedsDraw();
        base.OnHasFocusChanged(newHasFocus, previousFocusedView, view);
    }

    protected override bool OnKeyDown(Key key)
    {
        int lines = Wrap(content, Viewport.Width).Count;
        // The scroll limit follows the text as it is now: the size set at the last draw may be of older text.
        SetContentSize(new System.Drawing.Size(Viewport.Width, Math.Max(lines, 1)));
        int y = Viewport.Y;
        if (key == Key.CursorDown) y++;
        else if (key == Key.CursorUp) y--;
        else if (key == Key.PageDown) y += Math.Max(1, Viewport.Height - 1);
        else if (key == Key.PageUp) y -= Math.Max(1, Viewport.Height - 1);
        else if (key == Key.Home) y = 0;
        else if (key == Key.End) y = lines;
        else return false;
        Viewport = Viewport with { Y = Math.Clamp(y, 0, Math.Max(0, lines - Viewport.Height)) };
        SetNeedsDraw();
        return true;
    }
}
