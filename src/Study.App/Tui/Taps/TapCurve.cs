// The tap-study curve as plain numbers: per scenario, the lowest and highest watched voltage at each position.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.Core.Io.CommonFormat;
using Study.Core.Studies;

namespace Study.App.Tui.Taps;

/// <summary>One scenario's curves: x is the shifted position (see <see cref="TapCurve.XOf"/>), y the voltage in pu.</summary>
public sealed record TapCurveSeries(string Scenario, char Glyph, IReadOnlyList<(float X, float Y)> Lowest, IReadOnlyList<(float X, float Y)> Highest);

/// <summary>
/// What the tap-study chart draws. The chart's vertical axis sits at graph x = 0, so positions are
/// shifted to start at 1 and the horizontal labels turn them back into tap positions. The band is the
/// tightest over the watched buses (the highest low limit and the lowest high limit).
/// </summary>
public sealed record TapCurve(int MinPosition, int MaxPosition, double BandLowPu, double BandHighPu, double YLowPu, double YHighPu,
    IReadOnlyList<TapCurveSeries> Series)
{
    private const string Glyphs = "●○◆◇■□";

    public float XOf(int position) => position - MinPosition + 1;

    public int PositionOf(float x) => (int)Math.Round(x) + MinPosition - 1;

    /// <summary>Width of the graph in shifted positions, with a margin of one on each side.</summary>
    public int XSpan => MaxPosition - MinPosition + 2;

    public static TapCurve From(TapStudyResult r)
    {
        var watched = r.Points.Where(p => p.Converged).SelectMany(p => p.Watched).ToList();
        double low = r.Band?.Low ?? (watched.Count > 0 ? watched.Max(w => w.LowPu) : 0.95);
        double high = r.Band?.High ?? (watched.Count > 0 ? watched.Min(w => w.HighPu) : 1.05);
        double yLow = Math.Min(low, watched.Count > 0 ? watched.Min(w => w.VPu) : low) - 0.01;
        double yHigh = Math.Max(high, watched.Count > 0 ? watched.Max(w => w.VPu) : high) + 0.01;
        var curve = new TapCurve(r.Min, r.Max, low, high, yLow, yHigh, []);
        var series = new List<TapCurveSeries>();
        for (int s = 0; s < r.Scenarios.Count; s++)
        {
            var points = r.Points.Where(p => p.Scenario == r.Scenarios[s] && p.Converged && p.Watched.Count > 0).OrderBy(p => p.Position).ToList();
            series.Add(new TapCurveSeries(Labels.Scenario(r.Scenarios[s]), Glyphs[s % Glyphs.Length],
                points.Select(p => (curve.XOf(p.Position), (float)p.Watched.Min(w => w.VPu))).ToList(),
                points.Select(p => (curve.XOf(p.Position), (float)p.Watched.Max(w => w.VPu))).ToList()));
        }
        return curve with { Series = series };
    }

    /// <summary>The legend under the chart, e.g. "● winter-peak  ○ summer-night: lowest and highest watched bus · ┄ band 0.95–1.05 pu".</summary>
    public string Legend() =>
        string.Join("  ", Series.Select(s => $"{s.Glyph} {s.Scenario}"))
        + $": lowest and highest watched bus at each position · ┄ band {Field.Format(Math.Round(BandLowPu, 4))}–{Field.Format(Math.Round(BandHighPu, 4))} pu";

    /// <summary>Tick steps the voltage axis may use: round numbers of pu.</summary>
    private static readonly double[] Steps = [0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1];

    /// <summary>
    /// The voltage axis for <paramref name="rows"/> rows: the bottom at a multiple of a round step, a tick
    /// every step, and a whole number of rows (two at least, so labels never crowd) between ticks. The
    /// smallest step whose ticks fit is taken, so the axis says as much as the rows allow.
    /// </summary>
    public (double Origin, double Step, int RowsPerTick) VoltageAxis(int rows)
    {
        rows = Math.Max(1, rows);
        // Three rows per tick where the rows allow it (labels apart), then two; on a very short chart one will do.
        foreach (int least in new[] { 3, 2, 1 })
            foreach (double step in Steps)
            {
                double origin = Math.Floor(YLowPu / step + 1e-9) * step;
                int ticks = Math.Max(1, (int)Math.Ceiling((YHighPu - origin) / step - 1e-9));
                int perTick = rows / ticks;
                if (perTick >= least) return (origin, step, perTick);
            }
        return (Math.Floor(YLowPu), 1, rows);
    }
}
