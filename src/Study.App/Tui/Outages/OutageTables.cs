// Outage-screening results for the Outages tab: a heading per scenario, and the ranked outages (OutageColumns).
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Tui.Outages;

/// <summary>
/// Nothing here is computed, only laid out. The tier of each outage is spelt out ("NO CONV",
/// "LOAD LOST", "stressed", "secure") so that the table reads without colour.
/// </summary>
public static class OutageTables
{
    /// <summary>What the tab says before the first screening.</summary>
    public const string NotYet = "No outage screening yet (Alt+U).";

    public static string[] Headers => OutageColumns.ScreenOutages.Headings;

    /// <summary>One line per scenario: how many outages fall in each tier, and the intact case's state.</summary>
    public static string Heading(OutageScreeningResult r)
    {
        var lines = new List<string>();
        foreach (ScenarioScreening s in r.Scenarios)
        {
            var counts = new[] { OutageTier.NoConvergence, OutageTier.LoadLost, OutageTier.Stressed }
                .Select(t => (Tier: t, Count: s.Outages.Count(o => OutageTiers.Of(o) == t)))
                .Where(x => x.Count > 0).Select(x => $"{x.Count} {OutageTiers.Words(x.Tier)}")
                .Append($"{s.Outages.Count(o => OutageTiers.Of(o) == OutageTier.Secure)} secure");
            string intact = !s.IntactConverged ? $"intact case did not converge ({s.IntactMessage})"
                : s.IntactViolations.Count == 0 ? "intact ok"
                : $"intact has {s.IntactViolations.Count} violation(s)";
            lines.Add($"{Labels.Scenario(s.Scenario)}: {string.Join(" · ", counts)} · {intact}");
        }
        return lines.Count == 0 ? "Nothing to screen: the network has no line or transformer in service." : string.Join("\n", lines);
    }

    /// <summary>The outages of every scenario, most severe first; the scenario is named on the first row of its group only.</summary>
    public static TextTableSource Outages(OutageScreeningResult r) => TextTableSource.Of(OutageColumns.ScreenOutages, OutageColumns.Ranked(r));

    /// <summary>The outage behind each table row, in the same order, for row colours and detail.</summary>
    public static IReadOnlyList<OutageCase> Cases(OutageScreeningResult r) => r.Scenarios.SelectMany(s => s.Outages).ToList();
}
