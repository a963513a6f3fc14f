// Draws a TimeChart: each series' lowest and highest values as its glyph against time, the band as lines.
using System.Globalization;
using System.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Profile;

/// <summary>A GraphView fed from a <see cref="TimeChart"/>; the scale follows the view's size on every draw. Each series has its own glyph, so it reads without colour.</summary>
public sealed class TimeChartView : GraphView
{
    private static readonly ColorName16[] Colours = [ColorName16.BrightYellow, ColorName16.BrightCyan, ColorName16.BrightGreen, ColorName16.BrightMagenta];
    private TimeChart? chart;
    private int yDecimals = 3;

    public TimeChartView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        MarginLeft = 7;
        // One row for the time labels: the legend under the chart says what is drawn.
        MarginBottom = 1;
        CanFocus = true;
    }

    public TimeChart? Chart
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
        SetNeedsDraw();
    }

    /// <summary>Fits the whole profile across the width and the value range into the height.</summary>
    private void Scale()
    {
        if (chart is null) return;
        int cols = Math.Max(4, Viewport.Width - (int)MarginLeft - 1);
        int rows = Math.Max(1, Viewport.Height - (int)MarginBottom);
        float xPerCell = (float)(Math.Max(chart.Hours, 1e-6) / cols);
        (double origin, double step, int rowsPerTick) = chart.ValueAxis(rows);
        CellSize = new System.Drawing.PointF(xPerCell, (float)(step / rowsPerTick));
        ScrollOffset = new System.Drawing.PointF(0, (float)(origin - chart.YShift));
        AxisX.Increment = (float)chart.TimeStep(cols, chart.TimeLabel(0).Length);
        AxisX.ShowLabelsEvery = 1;
        AxisY.Increment = (float)step;
        AxisY.ShowLabelsEvery = 1;
        yDecimals = chart.Whole || step >= 1 ? 0 : step >= 0.1 ? 1 : step >= 0.01 ? 2 : 3;
    }
}
