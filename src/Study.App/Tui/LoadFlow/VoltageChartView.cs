// Draws the voltage bar chart laid out by VoltageBars, coloured by violation.
using Study.Core.LoadFlow;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.LoadFlow;

/// <summary>Shows one bar per bus; the ▼/▲ markers carry the meaning, colour only repeats it.</summary>
public sealed class VoltageChartView : View
{
    private LoadFlowResult? result;

    public VoltageChartView()
    {
        CanFocus = true;
        Width = Dim.Fill();
        Height = Dim.Fill();
    }

    public LoadFlowResult? Result
    {
        get => result;
        set
        {
            result = value;
            SetContentSize(new System.Drawing.Size(1, (value?.Buses.Count ?? 0) + 1));
            SetNeedsDraw();
        }
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        IReadOnlyList<VoltageBarLine> lines = result is null
            ? [new VoltageBarLine("No load flow yet: press F5.", ViolationKind.None)]
            : VoltageBars.Layout(result, Viewport.Width);
        for (int row = 0; row < Viewport.Height; row++)
        {
            int i = row + Viewport.Y;
            Move(0, row);
            SetAttribute(normal);
            if (i >= lines.Count)
            {
                AddStr(new string(' ', Viewport.Width));
                continue;
            }
            if (lines[i].Violation != ViolationKind.None)
                SetAttribute(new Attr(lines[i].Violation == ViolationKind.Low ? ColorName16.BrightCyan : ColorName16.BrightRed, normal.Background));
            string text = lines[i].Text;
            AddStr(text.Length > Viewport.Width ? text[..Viewport.Width] : text.PadRight(Viewport.Width));
        }
        return true;
    }
}
