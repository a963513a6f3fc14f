// The progress of a running study in words: how far, how fast, how long still, how long so far.
using System.Globalization;

namespace Study.App.Tui.Shell;

/// <summary>What the status line shows while a study runs, from the fraction the engine reports.</summary>
/// <param name="Fraction">The share done, 0 to 1, as the engine last reported it.</param>
/// <param name="Total">How many units the study solves (outages × scenarios); null when not known.</param>
/// <param name="Unit">What one unit is, plural: "outages", "positions".</param>
public sealed record ProgressMeter(Func<double> Fraction, int? Total = null, string Unit = "");

public static class StudyProgress
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>
    /// "Outage screening ⠹ 120/342 outages · 45/s · about 5 s left · 2.7 s" — the count from the fraction
    /// and the total, the rate over the time so far, and the time left at that rate; "40 %" without a
    /// total; just the time before the first report.
    /// </summary>
    public static string Text(string title, string spinner, ProgressMeter? meter, TimeSpan elapsed)
    {
        var parts = new List<string>();
        double seconds = Math.Max(0, elapsed.TotalSeconds);
        double f = meter is null ? 0 : Math.Clamp(meter.Fraction(), 0, 1);
        if (meter is not null)
        {
            if (meter.Total is int n && n > 0)
            {
                int done = (int)Math.Round(f * n);
                parts.Add($"{done}/{n} {meter.Unit}".TrimEnd());
                if (done > 0 && seconds > 0) parts.Add($"{Rate(done / seconds)}/s");
            }
            else parts.Add($"{(f * 100).ToString("0", Inv)} %");
            if (f > 0 && f < 1 && seconds > 0) parts.Add($"about {Duration(seconds * (1 - f) / f)} left");
        }
        parts.Add(seconds.ToString("0.0", Inv) + " s");
        return $"{title} {spinner} {string.Join(" · ", parts)}";
    }

    private static string Rate(double perSecond) => perSecond.ToString(perSecond >= 10 ? "0" : "0.#", Inv);

    /// <summary>"5 s", "2 min 10 s", "1 h 05 min".</summary>
    public static string Duration(double seconds)
    {
        if (seconds < 60) return $"{Math.Ceiling(seconds).ToString("0", Inv)} s";
        var t = TimeSpan.FromSeconds(Math.Ceiling(seconds));
        return t.TotalHours >= 1 ? $"{(int)t.TotalHours} h {t.Minutes:00} min" : $"{t.Minutes} min {t.Seconds:00} s";
    }
}
