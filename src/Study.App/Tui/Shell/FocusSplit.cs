// Two views stacked in the rows left below a heading: the one with focus gets two thirds of them.
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>
/// On a short screen two tables (fault levels and breaker duty, a tap table and its curve) cannot both
/// show enough rows; the one being read, the one with focus, takes two thirds, and Tab gives the room
/// to the other.
/// </summary>
public static class FocusSplit
{
    /// <summary>Rows of the top view out of <paramref name="total"/>.</summary>
    public static int TopRows(int total, bool bottomFocused)
    {
        total = Math.Max(0, total);
        return bottomFocused ? total / 3 : total - total / 3;
    }

    /// <param name="rows">The rows both share, worked out at layout time.</param>
    public static void Stack(View container, View top, View bottom, Func<int> rows)
    {
        top.Height = Dim.Func(_ => TopRows(rows(), bottom.HasFocus));
        bottom.Y = Pos.Bottom(top);
        bottom.Height = Dim.Fill();
        Relayout(container, top, bottom);
    }

    /// <summary>Lays <paramref name="container"/> out again whenever focus moves between the two.</summary>
    public static void Relayout(View container, View top, View bottom)
    {
        top.HasFocusChanged += (_, _) => container.SetNeedsLayout();
        bottom.HasFocusChanged += (_, _) => container.SetNeedsLayout();
    }
}
