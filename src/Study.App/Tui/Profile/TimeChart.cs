// A quantity against time as plain numbers: per series the lowest and highest value in each interval, and a band.
using System.Globalization;
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Tui.Profile;

/// <summary>One series: x in hours from the start of the profile, the lowest and highest value of each interval.</summary>
public sealed record TimeSeries(string Name, char Glyph, IReadOnlyList<(float X, float Y)> Lowest, IReadOnlyList<(float X, float Y)> Highest);

/// <summary>
/// What a profile chart draws. A long profile has more steps than the chart has columns, so the steps are
/// gathered into at most <see cref="Intervals"/> intervals and each series draws its lowest and highest
/// value in each: a short excursion still shows. Steps that did not converge are left out. The chart draws
/// its time axis at value 0, so values are drawn less <see cref="YShift"/> (the bottom of a tap chart,
/// whose positions may all be negative) and the labels add it back.
/// </summary>
public sealed record TimeChart(string Unit, double YLow, double YHigh, double Hours, DateTimeOffset? Start, IReadOnlyList<TimeSeries> Series,
    double? BandLow = null, double? BandHigh = null, bool Whole = false, double YShift = 0)
{
    public const int Intervals = 240;
    private const string Glyphs = "●○◆◇■□▲△";

    /// <summary>The watched bus voltages, with the tightest band of the watched buses.</summary>
    public static TimeChart Voltages(ProfileResult r)
    {
        ProfileSeries s = r.Series;
        var watched = r.Buses.Where(b => s.WatchedBuses.Contains(b.Id)).ToList();
        double? low = watched.Count > 0 ? watched.Max(b => b.BandLowPu) : null, high = watched.Count > 0 ? watched.Min(b => b.BandHighPu) : null;
        var series = s.WatchedBuses.Select((bus, w) => Gather(s, bus, Glyphs[w % Glyphs.Length], step => s.Voltages[step][w])).ToList();
        (double lo, double hi) = Range(series, low, high);
        return new TimeChart("pu", lo - 0.005, hi + 0.005, r.Hours, s.Times.FirstOrDefault(), series, low, high);
    }

    /// <summary>The position of each on-load tap changer (fixed taps do not move in a profile).</summary>
    public static TimeChart Taps(ProfileResult r)
    {
        ProfileSeries s = r.Series;
        var onLoad = r.Transformers.Where(t => t.OnLoad).Select(t => t.Id).ToHashSet();
        var series = s.Taps.Select((tap, t) => (tap, t)).Where(x => onLoad.Contains(x.tap))
            .Select((x, k) => Gather(s, x.tap, Glyphs[k % Glyphs.Length], step => s.Positions[step][x.t])).ToList();
        (double lo, double hi) = Range(series, null, null);
        double bottom = Math.Floor(lo) - 1;
        return new TimeChart("position", bottom, Math.Ceiling(hi) + 1, r.Hours, s.Times.FirstOrDefault(), series, Whole: true, YShift: bottom);
    }

    /// <summary>"● CQ11  ○ PS11: lowest and highest in each interval · ┄ band 0.95–1.05 pu".</summary>
    public string Legend(string what) =>
        (Series.Count == 0 ? $"no {what} to chart" : string.Join("  ", Series.Select(x => $"{x.Glyph} {x.Name}")) + $": {what}")
        + (BandLow is double l && BandHigh is double h ? $" · ┄ band {Numbers.UpTo(l, 3)}–{Numbers.UpTo(h, 3)} {Unit}" : "");

    /// <summary>The time at <paramref name="hours"/> from the start: clock time within two days, the date within two months, else the month.</summary>
    public string TimeLabel(double hours)
    {
        if (Start is not { } t0) return Numbers.UpTo(hours, 1) + " h";
        DateTime t = t0.UtcDateTime.AddHours(hours);
        string format = Hours <= 48 ? "HH:mm" : Hours <= 24 * 62 ? "dd MMM" : "MMM";
        return t.ToString(format, CultureInfo.InvariantCulture);
    }

    /// <summary>Hours between time labels so that labels of <paramref name="labelWidth"/> characters fit <paramref name="cols"/> columns.</summary>
    public double TimeStep(int cols, int labelWidth)
    {
        double[] steps = [0.25, 0.5, 1, 2, 3, 4, 6, 12, 24, 48, 24 * 7, 24 * 14, 730, 1460, 2190, 4380];
        double perCol = Math.Max(Hours, 1e-9) / Math.Max(1, cols);
        foreach (double step in steps)
            if (step / perCol >= labelWidth + 2) return step;
        return steps[^1];
    }

    /// <summary>The value axis for <paramref name="rows"/> rows: a round step, two rows at least between ticks where they allow.</summary>
    public (double Origin, double Step, int RowsPerTick) ValueAxis(int rows)
    {
        double[] steps = Whole ? [1, 2, 5, 10, 20] : [0.001, 0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1];
        rows = Math.Max(1, rows);
        foreach (int least in new[] { 2, 1 })
            foreach (double step in steps)
            {
                double origin = Math.Floor(YLow / step + 1e-9) * step;
                int ticks = Math.Max(1, (int)Math.Ceiling((YHigh - origin) / step - 1e-9));
                if (rows / ticks >= least) return (origin, step, rows / ticks);
            }
        return (Math.Floor(YLow), steps[^1], 1);
    }

    private static TimeSeries Gather(ProfileSeries s, string name, char glyph, Func<int, double> value)
    {
        int n = s.Hours.Count, buckets = Math.Min(n, Intervals);
        var starts = new double[n];
        for (int i = 1; i < n; i++) starts[i] = starts[i - 1] + s.Hours[i - 1];
        var lowest = new List<(float, float)>();
        var highest = new List<(float, float)>();
        for (int b = 0; b < buckets; b++)
        {
            int from = (int)((long)b * n / buckets), to = (int)((long)(b + 1) * n / buckets);
            double lo = double.PositiveInfinity, hi = double.NegativeInfinity;
            for (int i = from; i < to; i++)
            {
                if (!s.Converged[i]) continue;
                double v = value(i);
                if (!double.IsFinite(v)) continue;
                lo = Math.Min(lo, v);
                hi = Math.Max(hi, v);
            }
            if (lo > hi) continue;
            float x = (float)starts[from];
            lowest.Add((x, (float)lo));
            highest.Add((x, (float)hi));
        }
        return new TimeSeries(name, glyph, lowest, highest);
    }

    private static (double Low, double High) Range(IReadOnlyList<TimeSeries> series, double? bandLow, double? bandHigh)
    {
        var ys = series.SelectMany(x => x.Lowest.Concat(x.Highest)).Select(p => (double)p.Y).ToList();
        double lo = Math.Min(bandLow ?? double.PositiveInfinity, ys.Count > 0 ? ys.Min() : double.PositiveInfinity);
        double hi = Math.Max(bandHigh ?? double.NegativeInfinity, ys.Count > 0 ? ys.Max() : double.NegativeInfinity);
        return double.IsFinite(lo) && double.IsFinite(hi) ? (lo, hi) : (0, 1);
    }
}
