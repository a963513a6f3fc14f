// Draws the tap-study curve: watched voltage against tap position per scenario, with the band as lines.
using Study.App.Reports;
using System.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Views;
using Study.App.Tui.Shell;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Taps;

/// <summary>The tap curve in a <see cref="ChartView{TChart}"/>: positions across, voltage up, the band dashed.</summary>
public sealed class TapCurveView() : ChartView<TapCurve>(marginBottom: 2)
{
    private int yDecimals = 3;

    protected override void Plot(TapCurve curve, Attr normal)
    {
        var band = new Attr(ColorName16.Red, normal.Background);
        foreach (double v in new[] { curve.BandLowPu, curve.BandHighPu })
            Annotations.Add(new PathAnnotation
            {
                Points = [new System.Drawing.PointF(0, (float)v), new System.Drawing.PointF(curve.XSpan, (float)v)],
                LineColor = band, LineRune = new Rune('┄'), BeforeSeries = true,
            });
        for (int s = 0; s < curve.Series.Count; s++)
        {
            TapCurveSeries series = curve.Series[s];
            var colour = new Attr(Colours[s % Colours.Length], normal.Background);
            foreach (var line in new[] { series.Lowest, series.Highest })
            {
                var points = line.Select(p => new System.Drawing.PointF(p.X, p.Y)).ToList();
                Annotations.Add(new PathAnnotation { Points = points, LineColor = colour, BeforeSeries = true });
                Series.Add(new ScatterSeries { Points = points, Fill = new GraphCellToRender(new Rune(series.Glyph), colour) });
            }
        }
        AxisX.LabelGetter = i =>
        {
            int position = curve.PositionOf(i.Value);
            return position < curve.MinPosition || position > curve.MaxPosition ? "" : Labels.Position(position);
        };
        AxisX.Text = "tap position";
        AxisY.LabelGetter = i => Math.Round(i.Value, 4).ToString("F" + yDecimals, System.Globalization.CultureInfo.InvariantCulture);
        AxisY.Text = "pu";
    }

    /// <summary>Fits the positions across the width and the voltage range into the height.</summary>
    protected override void Fit(TapCurve curve)
    {
        (int cols, int rows) = PlotCells(leastRows: 3);
        float xPerCell = (float)curve.XSpan / cols;
        (double origin, double step, int rowsPerTick) = curve.VoltageAxis(rows);
        float yPerCell = (float)(step / rowsPerTick);
        CellSize = new System.Drawing.PointF(xPerCell, yPerCell);
        ScrollOffset = new System.Drawing.PointF(0, (float)origin);
        int positions = curve.MaxPosition - curve.MinPosition + 1;
        // A label every few positions so that signed labels (up to 3 characters) do not run together.
        int every = Math.Max(1, (int)Math.Ceiling(4 * xPerCell));
        AxisX.Increment = 1;
        AxisX.ShowLabelsEvery = (uint)(positions <= 1 ? 1 : every);
        AxisY.Increment = (float)step;
        AxisY.ShowLabelsEvery = 1;
        yDecimals = DecimalsFor(step);
    }
}
