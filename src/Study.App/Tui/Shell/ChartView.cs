// The frame every chart of the terminal UI shares: a GraphView fed from a chart model, scaled to its size on each draw.
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Shell;

/// <summary>
/// A chart model (<typeparamref name="TChart"/>, built from a result and free of Terminal.Gui) drawn in a
/// GraphView: setting <see cref="Chart"/> lays out its series and annotations once (<see cref="Plot"/>);
/// every draw first fits the axes to the view's current size (<see cref="Fit"/>).
/// </summary>
public abstract class ChartView<TChart> : GraphView where TChart : class
{
    /// <summary>Series colours in turn; each series also has its own glyph, so a chart reads without colour.</summary>
    protected static readonly ColorName16[] Colours = [ColorName16.BrightYellow, ColorName16.BrightCyan, ColorName16.BrightGreen, ColorName16.BrightMagenta];

    private TChart? chart;

    /// <param name="marginBottom">Rows under the plot for the x labels (and the axis title when there is one).</param>
    protected ChartView(int marginBottom)
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        MarginLeft = 7;
        MarginBottom = (uint)marginBottom;
        CanFocus = true;
    }

    public TChart? Chart
    {
        get => chart;
        set
        {
            chart = value;
            Series.Clear();
            Annotations.Clear();
            if (chart is not null) Plot(chart, GetAttributeForRole(VisualRole.Normal));
            SetNeedsDraw();
        }
    }

    /// <summary>The plot's width and height in cells, inside the margins.</summary>
    protected (int Columns, int Rows) PlotCells(int leastRows) =>
        (Math.Max(4, Viewport.Width - (int)MarginLeft - 1), Math.Max(leastRows, Viewport.Height - (int)MarginBottom));

    /// <summary>Decimals for axis labels a step apart.</summary>
    protected static int DecimalsFor(double step) => step >= 1 ? 0 : step >= 0.1 ? 1 : step >= 0.01 ? 2 : 3;

    /// <summary>Adds the series, annotations and label functions of <paramref name="chart"/>.</summary>
    protected abstract void Plot(TChart chart, Attr normal);

    /// <summary>Sets the cell size, scroll offset and tick spacing for the view's size now.</summary>
    protected abstract void Fit(TChart chart);

    protected override bool OnDrawingContent(DrawContext? context)
    {
        if (chart is not null) Fit(chart);
        return base.OnDrawingContent(context);
    }
}
