// Draws a TimeChart: each series' lowest and highest values as its glyph against time, the band as lines.
using System.Globalization;
using System.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Views;
using Study.App.Tui.Shell;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Profile;

/// <summary>A <see cref="TimeChart"/> in a <see cref="ChartView{TChart}"/>: each series' lowest and highest values against time.</summary>
public sealed class TimeChartView() : ChartView<TimeChart>(marginBottom: 1) // one row for the time labels: the legend under the chart says what is drawn
{
    private int yDecimals = 3;

    protected override void Plot(TimeChart chart, Attr normal)
    {
        var band = new Attr(ColorName16.Red, normal.Background);
        foreach (double? v in new[] { chart.BandLow, chart.BandHigh })
            if (v is double y)
                Annotations.Add(new PathAnnotation
                {
                    Points = [new System.Drawing.PointF(0, (float)(y - chart.YShift)), new System.Drawing.PointF((float)chart.Hours, (float)(y - chart.YShift))],
                    LineColor = band, LineRune = new Rune('┄'), BeforeSeries = true,
                });
        for (int s = 0; s < chart.Series.Count; s++)
        {
            TimeSeries series = chart.Series[s];
            var fill = new GraphCellToRender(new Rune(series.Glyph), new Attr(Colours[s % Colours.Length], normal.Background));
            foreach (var line in new[] { series.Lowest, series.Highest })
                Series.Add(new ScatterSeries { Points = line.Select(p => new System.Drawing.PointF(p.X, (float)(p.Y - chart.YShift))).ToList(), Fill = fill });
        }
        AxisX.LabelGetter = i => i.Value < -1e-6 || i.Value > chart.Hours + 1e-6 ? "" : chart.TimeLabel(i.Value);
        AxisY.LabelGetter = i => Math.Round(i.Value + chart.YShift, 4).ToString("F" + yDecimals, CultureInfo.InvariantCulture);
        AxisY.Text = chart.Unit;
    }

    /// <summary>Fits the whole profile across the width and the value range into the height.</summary>
    protected override void Fit(TimeChart chart)
    {
        (int cols, int rows) = PlotCells(leastRows: 1);
        float xPerCell = (float)(Math.Max(chart.Hours, 1e-6) / cols);
        (double origin, double step, int rowsPerTick) = chart.ValueAxis(rows);
        CellSize = new System.Drawing.PointF(xPerCell, (float)(step / rowsPerTick));
        ScrollOffset = new System.Drawing.PointF(0, (float)(origin - chart.YShift));
        AxisX.Increment = (float)chart.TimeStep(cols, chart.TimeLabel(0).Length);
        AxisX.ShowLabelsEvery = 1;
        AxisY.Increment = (float)step;
        AxisY.ShowLabelsEvery = 1;
        yDecimals = chart.Whole ? 0 : DecimalsFor(step);
    }
}
