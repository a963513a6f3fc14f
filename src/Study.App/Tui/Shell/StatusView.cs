// The last screen row: the last solve's summary (or the running study) and key hints.
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>Draws <see cref="StatusLine.Compose"/> for its current width.</summary>
public sealed class StatusView : View
{
    private string summary = "";

    public StatusView()
    {
        X = 0;
        Y = Pos.AnchorEnd(1);
        Width = Dim.Fill();
        Height = 1;
    }

    public string Summary
    {
        get => summary;
        set
        {
            summary = value;
            SetNeedsDraw();
        }
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        SetAttributeForRole(VisualRole.Focus);
        Move(0, 0);
        AddStr(StatusLine.Compose(" " + summary, Viewport.Width).PadRight(Viewport.Width));
        return true;
    }
}
