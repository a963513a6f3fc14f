// Outage-screening results for the Outages tab: a heading per scenario, and the ranked outages (OutageColumns).
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Tui.Outages;

/// <summary>
/// Nothing here is computed, only laid out. The tier of each outage is spelt out ("NO SOLUTION",
/// "LOAD LOST", "LIMITS BROKEN", "secure") beside its severity number so that the table reads without
/// colour, and the heading says what the numbers of each tier mean.
/// </summary>
public static class OutageTables
{
    /// <summary>What the tab says before the first screening.</summary>
    public const string NotYet = "No outage screening yet: Alt+U takes each line and transformer out in turn.";

    public static string[] Headers => OutageColumns.ScreenOutages.Headings;

    private static readonly OutageTier[] WorstFirst = [OutageTier.NoConvergence, OutageTier.LoadLost, OutageTier.LimitsBroken, OutageTier.Secure];

    /// <summary>One line per scenario (how many outages in each tier, with the tier's severity numbers, and the intact case), then the legend.</summary>
    public static string Heading(OutageScreeningResult r)
    {
        var lines = new List<string>();
        foreach (ScenarioScreening s in r.Scenarios)
        {
            var counts = WorstFirst
                .Select(t => (Tier: t, Count: s.Outages.Count(o => OutageTiers.Of(o) == t)))
                .Where(x => x.Count > 0 || x.Tier == OutageTier.Secure)
                .Select(x => $"{x.Count} {OutageTiers.Words(x.Tier)} ({OutageTiers.Range(x.Tier)})");
            string intact = !s.IntactConverged ? $"intact case did not converge ({s.IntactMessage})"
                : s.IntactViolations.Count == 0 ? "intact case within limits"
                : $"intact case already has {s.IntactViolations.Count} violation(s)";
            lines.Add($"{Labels.Scenario(s.Scenario)}: {string.Join(" · ", counts)} · {intact}");
        }
        if (lines.Count == 0) return "Nothing to screen: the network has no line or transformer in service.";
        lines.Add("Enter on a row: the voltages and flows with that element out. " + OutageTiers.Legend);
        return string.Join("\n", lines);
    }

    /// <summary>The outages of every scenario, most severe first; the scenario is named on the first row of its group only.</summary>
    public static TextTableSource Outages(OutageScreeningResult r) => TextTableSource.Of(OutageColumns.ScreenOutages, OutageColumns.Ranked(r));

    /// <summary>The outage behind each table row, in the same order, for row colours and detail.</summary>
    public static IReadOnlyList<OutageCase> Cases(OutageScreeningResult r) => r.Scenarios.SelectMany(s => s.Outages).ToList();

    /// <summary>The heading of one outage's detail: its tier and severity, what it lost, and every violation it caused.</summary>
    public static string Detail(OutageCase c)
    {
        OutageTier tier = OutageTiers.Of(c);
        var lines = new List<string>
        {
            $"{c.Element} out ({Labels.Kind(c.Kind)}) · {Labels.Scenario(c.Scenario)} · severity {Numbers.Fixed(c.Severity, 1)} {OutageTiers.Words(tier)} ({OutageTiers.Range(tier)})",
        };
        if (!c.Converged)
        {
            lines.Add($"The load flow has no solution with {c.Element} out: {c.Message}");
            return string.Join("\n", lines);
        }
        if (c.IslandedBuses.Count > 0)
            lines.Add($"Islanded (no source): {string.Join(", ", c.IslandedBuses)} · load lost {OutageColumns.LostMw(c)} MW");
        lines.Add(c.NewViolations.Count == 0 ? "No new violations." : $"New violations ({c.NewViolations.Count}): " + string.Join("; ", c.NewViolations.Select(OutageColumns.Short)));
        if (c.ParallelLoadings.Count > 0)
            lines.Add("Parallel branches: " + string.Join(", ", c.ParallelLoadings.Select(p => $"{p.Element} {Numbers.Fixed(p.LoadingPercent, 1)} %")));
        return string.Join("\n", lines);
    }
}
