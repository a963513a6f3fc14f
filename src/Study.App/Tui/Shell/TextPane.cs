// A read-only, word-wrapped, scrollable block of text for details, findings and help.
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>Shows text wrapped to the width; arrows and PgUp/PgDn scroll when it has focus.</summary>
public sealed class TextPane : View
{
    private string content = "";

    public TextPane()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
    }

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

    protected override bool OnDrawingContent(DrawContext? context)
    {
        IReadOnlyList<string> lines = Wrap(content, Viewport.Width);
        SetContentSize(new System.Drawing.Size(Viewport.Width, Math.Max(lines.Count, 1)));
        SetAttributeForRole(Terminal.Gui.Drawing.VisualRole.Normal);
        for (int row = 0; row < Viewport.Height; row++)
        {
            int i = row + Viewport.Y;
            string line = i < lines.Count ? lines[i] : "";
            Move(0, row);
            AddStr(line.PadRight(Viewport.Width));
        }
        return true;
    }

    protected override bool OnKeyDown(Key key)
    {
        int lines = Wrap(content, Viewport.Width).Count;
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
