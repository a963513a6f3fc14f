// Which pane has the keyboard, shown by its border: double lines and a marked title, not colour alone.
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

public static class PaneFocus
{
    private const string Marker = "▶ ";

    /// <summary>Draws <paramref name="pane"/>'s border in double lines with "▶" before its title while focus is inside it.</summary>
    public static void Mark(View pane)
    {
        pane.HasFocusChanged += (_, e) => Show(pane, e.NewValue);
        pane.TitleChanged += (_, _) => Show(pane, pane.HasFocus);
        Show(pane, pane.HasFocus);
    }

    private static void Show(View pane, bool focused)
    {
        pane.BorderStyle = focused ? LineStyle.Double : LineStyle.Rounded;
        string title = pane.Title.StartsWith(Marker, StringComparison.Ordinal) ? pane.Title[Marker.Length..] : pane.Title;
        string wanted = focused && title.Length > 0 ? Marker + title : title;
        if (pane.Title != wanted) pane.Title = wanted;
        pane.SetNeedsDraw();
    }
}
