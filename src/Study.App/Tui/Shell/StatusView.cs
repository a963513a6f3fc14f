// The last screen row: the results' state (or the running study), the last action's outcome, and key hints.
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>Draws <see cref="StatusLine.Compose"/> for its current width.</summary>
public sealed class StatusView : View
{
    private string summary = "";
    private string? message;

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

    /// <summary>What the last action did ("saved /path/net.study.json", "undid: add bus B4"); null for none.</summary>
    public string? Message
    {
        get => message;
        set
        {
            message = value;
            SetNeedsDraw();
        }
    }

    /// <summary>The whole line as drawn at a width.</summary>
    public string Line(int width) => StatusLine.Compose(" " + summary, width, message);

    protected override bool OnDrawingContent(DrawContext? context)
    {
        SetAttributeForRole(VisualRole.Focus);
        Move(0, 0);
        AddStr(Line(Viewport.Width).PadRight(Viewport.Width));
        return true;
    }
}
