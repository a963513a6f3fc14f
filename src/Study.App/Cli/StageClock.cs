// Wall-clock time of each stage of one command (--timings): read, validate, build, solve, report.
using System.Diagnostics;
using Study.App.Reports;

namespace Study.App.Cli;

/// <summary>One measured stage, in milliseconds.</summary>
public sealed record StageTimeJson(string Stage, double Ms);

/// <summary>The "timings" object of --json output: the stages in the order they ran and their sum.</summary>
public sealed record TimingsJson(IReadOnlyList<StageTimeJson> Stages, double TotalMs, double SinceProcessStartMs);

/// <summary>Times stages back to back: each <see cref="Lap"/> closes the stage that ran since the previous one.</summary>
public sealed class StageClock
{
    private readonly List<StageTimeJson> stages = [];
    private long last = Stopwatch.GetTimestamp();

    /// <summary>Records the time since the previous lap (or since the clock was made) under <paramref name="stage"/>.</summary>
    public void Lap(string stage)
    {
        long now = Stopwatch.GetTimestamp();
        stages.Add(new StageTimeJson(stage, Stopwatch.GetElapsedTime(last, now).TotalMilliseconds));
        last = Stopwatch.GetTimestamp();
    }

    /// <summary>Adds a stage measured elsewhere (an engine's inner timings), without closing a lap.</summary>
    public void Detail(string stage, double ms) => stages.Add(new StageTimeJson(stage, ms));

    public TimingsJson ToJson()
    {
        double total = 0;
        foreach (StageTimeJson s in stages) if (!s.Stage.Contains('.')) total += s.Ms;
        double sinceStart = (DateTime.Now - Process.GetCurrentProcess().StartTime).TotalMilliseconds;
        return new TimingsJson(stages.ToList(), total, sinceStart);
    }

    /// <summary>The stages as a table; inner stages (named "solve.factor" and so on) are indented under their stage.</summary>
    public string Render()
    {
        TimingsJson json = ToJson();
        var rows = json.Stages.Append(new StageTimeJson("total", json.TotalMs)).Append(new StageTimeJson("since process start", json.SinceProcessStartMs));
        return "\nTimings\n" + PlainTextReport.Table(ReportTable.Of(CommandColumns.Timings, rows));
    }
}
