// Draws a CostChart: each candidate as its glyph at (duty or margin, cost), the limit as a vertical line.
using System.Text;
using Study.App.Reports;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Choice;

/// <summary>A GraphView fed from a <see cref="CostChart"/>; the scale follows the view's size on every draw.</summary>
public sealed class CostChartView : GraphView
{
    private CostChart? chart;
    private int xDecimals;

    public CostChartView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        MarginLeft = 7;
        MarginBottom = 2;
        CanFocus = true;
    }

    public CostChart? Chart
    {
        get => chart;
        set
        {
            chart = value;
            Rebuild();
        }
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        Scale();
        return base.OnDrawingContent(context);
    }

    private void Rebuild()
    {
        Series.Clear();
        Annotations.Clear();
        if (chart is null)
        {
            SetNeedsDraw();
            return;
        }
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        if (chart.Limit is double limit)
            Annotations.Add(new PathAnnotation
            {
                Points = [new System.Drawing.PointF(chart.XOf(limit), (float)chart.CostLow), new System.Drawing.PointF(chart.XOf(limit), (float)chart.CostHigh)],
                LineColor = new Attr(ColorName16.Red, normal.Background), LineRune = new Rune('┆'), BeforeSeries = true,
            });
        foreach (CostPoint p in chart.Points)
            Series.Add(new ScatterSeries
            {
                Points = [new System.Drawing.PointF(chart.XOf(p.X), (float)p.Cost)],
                Fill = new GraphCellToRender(new Rune(p.Glyph), new Attr(p.Feasible ? ColorName16.BrightGreen : ColorName16.BrightRed, normal.Background)),
            });
        AxisX.LabelGetter = i => Numbers.Fixed(chart.ValueOf(i.Value), xDecimals);
        AxisX.Text = chart.XUnit;
        AxisY.LabelGetter = i => CostChart.Money(i.Value);
        AxisY.Text = "cost";
        SetNeedsDraw();
    }

    private void Scale()
    {
        if (chart is null) return;
        int cols = Math.Max(4, Viewport.Width - (int)MarginLeft - 1);
        int rows = Math.Max(2, Viewport.Height - (int)MarginBottom);
        double xSpan = chart.XHigh - chart.XLow, ySpan = chart.CostHigh - chart.CostLow;
        double xStep = CostChart.Step(xSpan, Math.Max(1, cols / 9)), yStep = CostChart.Step(ySpan, Math.Max(1, rows / 2));
        CellSize = new System.Drawing.PointF((float)(xSpan / cols), (float)(ySpan / rows));
        ScrollOffset = new System.Drawing.PointF(0, (float)chart.CostLow);
        AxisX.Increment = (float)xStep;
        AxisX.ShowLabelsEvery = 1;
        AxisY.Increment = (float)yStep;
        AxisY.ShowLabelsEvery = 1;
        xDecimals = xStep >= 1 ? 0 : xStep >= 0.1 ? 1 : xStep >= 0.01 ? 2 : 3;
    }
}
