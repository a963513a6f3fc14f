// A progress line on standard error for long studies, shown only when standard error is a terminal.
using System.Diagnostics;

namespace Study.App.Cli;

/// <summary>
/// Rewrites one line ("outages: 42 %") in place. Nothing is drawn for the first half second, so
/// quick runs stay quiet; <see cref="Dispose"/> clears the line before the results are printed.
/// </summary>
public sealed class TerminalProgress(TextWriter err, string label) : IProgress<double>, IDisposable
{
    private static readonly TimeSpan Quiet = TimeSpan.FromSeconds(0.5);
    private readonly Stopwatch clock = Stopwatch.StartNew();
    private readonly object gate = new();
    private int shown = -1;

    /// <summary>A progress line when <paramref name="err"/> is the process's standard error and that is a terminal; null otherwise.</summary>
    public static TerminalProgress? ForTerminal(TextWriter err, string label) =>
        ReferenceEquals(TerminalText.Unwrap(err), Console.Error) && !Console.IsErrorRedirected
            ? new TerminalProgress(TerminalText.Unwrap(err), label)
            : null;

    public void Report(double value)
    {
        int percent = (int)Math.Clamp(value * 100, 0, 100);
        lock (gate)
        {
            if (percent == shown || clock.Elapsed < Quiet) return;
            shown = percent;
            err.Write($"\r{label}: {percent,3} %");
            err.Flush();
        }
    }

    public void Dispose()
    {
        lock (gate)
        {
            if (shown < 0) return;
            err.Write("\r" + new string(' ', label.Length + 8) + "\r");
            err.Flush();
            shown = -1;
        }
    }
}
