// Progress of a long study on standard error: how many done of how many, the rate, the time left.
using System.Diagnostics;
using System.Globalization;

namespace Study.App.Cli;

/// <summary>
/// Reads the engine's <see cref="IProgress{T}"/> of a fraction done and shows it as a count of
/// <see cref="total"/> items ("outages: 1,234 of 14,000, 52 a second, about 4 min left"). On a terminal
/// one line is rewritten in place, at most five times a second, and <see cref="Dispose"/> clears it
/// before the results are printed; when standard error is a file or a pipe (a batch job's log) a
/// line is written every half minute instead. Nothing is shown in the first second, so quick runs
/// stay quiet. Standard output is never touched, so --json output stays clean.
/// </summary>
public sealed class TerminalProgress : IProgress<double>, IDisposable
{
    private static readonly TimeSpan Quiet = TimeSpan.FromSeconds(1);
    private readonly TextWriter err;
    private readonly string noun;
    private readonly int total;
    private readonly bool inPlace;
    private readonly TimeSpan every;
    private readonly Stopwatch clock = Stopwatch.StartNew();
    private readonly object gate = new();
    private TimeSpan? lastShown;
    private bool finishShown;
    private int shownWidth;

    /// <param name="noun">What is counted, plural ("outages").</param>
    /// <param name="total">How many there are in all.</param>
    /// <param name="inPlace">True on a terminal: one line rewritten in place; false: a line now and then.</param>
    public TerminalProgress(TextWriter err, string noun, int total, bool inPlace)
    {
        this.err = err;
        this.noun = noun;
        this.total = total;
        this.inPlace = inPlace;
        every = inPlace ? TimeSpan.FromSeconds(0.2) : TimeSpan.FromSeconds(30);
    }

    /// <summary>Progress on the process's standard error (in place when that is a terminal); null for any other writer (tests, captured output).</summary>
    public static TerminalProgress? ForStandardError(TextWriter err, string noun, int total) =>
        ReferenceEquals(TerminalText.Unwrap(err), Console.Error) && total > 0
            ? new TerminalProgress(TerminalText.Unwrap(err), noun, total, !Console.IsErrorRedirected)
            : null;

    public void Report(double value)
    {
        lock (gate)
        {
            TimeSpan now = clock.Elapsed;
            // A log gets a line at the end too.
            bool finish = value >= 1 && !inPlace;
            bool due = lastShown is not TimeSpan last || now - last >= every || (finish && !finishShown);
            if (now < Quiet || !due || (finish && finishShown)) return;
            finishShown |= finish;
            lastShown = now;
            string line = Line(value, now);
            if (inPlace)
            {
                err.Write("\r" + line.PadRight(shownWidth));
                shownWidth = line.Length;
            }
            else
            {
                err.WriteLine(line);
            }
            err.Flush();
        }
    }

    /// <summary>"outages: 1,234 of 14,000, 52 a second, about 4 min left".</summary>
    public string Line(double fraction, TimeSpan elapsed)
    {
        int done = (int)Math.Round(Math.Clamp(fraction, 0, 1) * total);
        var culture = CultureInfo.InvariantCulture;
        string text = string.Format(culture, "{0}: {1:N0} of {2:N0}", noun, done, total);
        double seconds = elapsed.TotalSeconds;
        if (done == 0 || seconds <= 0) return text;
        double rate = done / seconds;
        text += rate >= 10 ? string.Format(culture, ", {0:N0} a second", rate)
            : rate >= 1 ? string.Format(culture, ", {0:0.0} a second", rate)
            : string.Format(culture, ", {0:0.#} a minute", rate * 60);
        if (done < total) text += ", about " + Duration((total - done) / rate) + " left";
        return text;
    }

    /// <summary>A duration as people say it: 40 s, 12 min, 2 h 10 min.</summary>
    public static string Duration(double seconds)
    {
        if (seconds < 60) return $"{Math.Max(1, (int)Math.Ceiling(seconds))} s";
        double minutes = Math.Ceiling(seconds / 60);
        if (minutes < 60) return $"{minutes:0} min";
        return $"{(int)(minutes / 60)} h {(int)(minutes % 60)} min";
    }

    public void Dispose()
    {
        lock (gate)
        {
            if (!inPlace || shownWidth == 0) return;
            err.Write("\r" + new string(' ', shownWidth) + "\r");
            err.Flush();
            shownWidth = 0;
        }
    }
}
