// Draws a CostChart: each candidate as its glyph at (duty or margin, cost), the limit as a vertical line.
using System.Text;
using Study.App.Reports;
using Terminal.Gui.Drawing;
using Terminal.Gui.Views;
using Study.App.Tui.Shell;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Choice;

/// <summary>A <see cref="CostChart"/> in a <see cref="ChartView{TChart}"/>: each candidate's glyph at (duty or margin, cost).</summary>
public sealed class CostChartView() : ChartView<CostChart>(marginBottom: 2)
{
    private int xDecimals;

    protected override void Plot(CostChart chart, Attr normal)
    {
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
        // A tick a hair below zero reads 0, not "-0.00".
        AxisX.LabelGetter = i => Numbers.Fixed(Math.Round(chart.ValueOf(i.Value), xDecimals) is 0 ? 0 : chart.ValueOf(i.Value), xDecimals);
        AxisX.Text = chart.XUnit;
        AxisY.LabelGetter = i => CostChart.Money(i.Value);
        AxisY.Text = "cost";
    }

    protected override void Fit(CostChart chart)
    {
        (int cols, int rows) = PlotCells(leastRows: 2);
        double xSpan = chart.XHigh - chart.XLow, ySpan = chart.CostHigh - chart.CostLow;
        double xStep = CostChart.Step(xSpan, Math.Max(1, cols / 9)), yStep = CostChart.Step(ySpan, Math.Max(1, rows / 2));
        CellSize = new System.Drawing.PointF((float)(xSpan / cols), (float)(ySpan / rows));
        ScrollOffset = new System.Drawing.PointF(0, (float)chart.CostLow);
        AxisX.Increment = (float)xStep;
        AxisX.ShowLabelsEvery = 1;
        AxisY.Increment = (float)yStep;
        AxisY.ShowLabelsEvery = 1;
        xDecimals = DecimalsFor(xStep);
    }
}
