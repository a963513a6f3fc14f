// Two views stacked in the rows left below a heading: the one with focus gets two thirds of them.
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>
/// On a short screen two tables (fault levels and breaker duty, a tap table and its curve) cannot both
/// show enough rows; the one being read, the one with focus, takes two thirds, and Tab gives the room
/// to the other. A table never takes more rows than its own rows need: what it leaves goes to the other.
/// </summary>
public static class FocusSplit
{
    /// <summary>Rows of the top view out of <paramref name="total"/>, given what each view can use at most.</summary>
    public static int TopRows(int total, bool bottomFocused, int topNeed = int.MaxValue, int bottomNeed = int.MaxValue)
    {
        total = Math.Max(0, total);
        int top = bottomFocused ? total / 3 : total - total / 3;
        top = Math.Min(top, topNeed);
        if (total - top > bottomNeed) top = Math.Min(topNeed, total - bottomNeed);
        return Math.Clamp(top, 0, total);
    }

    /// <summary>The rows a view can use at most: a table its rows and header, anything else all of them.</summary>
    public static int Need(View view) => view is ResultTable t ? t.Source.Rows + 2 : int.MaxValue;

    /// <param name="rows">The rows both share, worked out at layout time (the bottom view ends where they end).</param>
    public static void Stack(View container, View top, View bottom, Func<int> rows)
    {
        top.Height = Dim.Func(_ => TopRows(rows(), bottom.HasFocus, Need(top), Need(bottom)));
        bottom.Y = Pos.Bottom(top);
        // The bottom takes what is left of the shared rows, so a view may keep rows of its own below both.
        bottom.Height = Dim.Func(_ => Math.Max(0, rows() - top.Frame.Height));
        Relayout(container, top, bottom);
    }

    /// <summary>Lays <paramref name="container"/> out again whenever focus moves between the two.</summary>
    public static void Relayout(View container, View top, View bottom)
    {
        top.HasFocusChanged += (_, _) => container.SetNeedsLayout();
        bottom.HasFocusChanged += (_, _) => container.SetNeedsLayout();
    }
}
