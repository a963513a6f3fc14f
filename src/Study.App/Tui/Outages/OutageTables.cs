// Outage-screening results as text: a heading per scenario, and the ranked outages with ▼/▲ and words.
using System.Globalization;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Shell;
using Study.App.Tui.Taps;
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Tui.Outages;

/// <summary>
/// Formats an <see cref="OutageScreeningResult"/> for the Outages tab; nothing here is computed, only
/// laid out. The tier of each outage is spelt out ("NO CONV", "LOAD LOST", "stressed", "secure") so
/// that the table reads without colour.
/// </summary>
public static class OutageTables
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>What the tab says before the first screening.</summary>
    public const string NotYet = "No outage screening yet (Alt+U).";

    public static string[] Headers { get; } =
        ["Scenario", "Rank", "Outage", "Kind", "Severity", "Conv.", "Islanded", "Lost MW", "Worst V pu", "Worst loading %", "New viol."];

    /// <summary>How serious an outage is, in the words of its severity tier (see <see cref="OutageSeverity"/>).</summary>
    public enum Tier { Secure, Stressed, LoadLost, NoConvergence }

    public static Tier TierOf(OutageCase c) =>
        !c.Converged || c.Severity >= OutageSeverity.NoConvergence ? Tier.NoConvergence
        : c.Severity >= OutageSeverity.LostLoadBase ? Tier.LoadLost
        : c.Severity > 0 ? Tier.Stressed
        : Tier.Secure;

    public static string TierText(Tier t) => t switch
    {
        Tier.NoConvergence => "NO CONV",
        Tier.LoadLost => "LOAD LOST",
        Tier.Stressed => "stressed",
        _ => "secure",
    };

    /// <summary>One line per scenario: how many outages fall in each tier, and the intact case's state.</summary>
    public static string Heading(OutageScreeningResult r)
    {
        var lines = new List<string>();
        foreach (ScenarioScreening s in r.Scenarios)
        {
            var counts = new[] { Tier.NoConvergence, Tier.LoadLost, Tier.Stressed }
                .Select(t => (Tier: t, Count: s.Outages.Count(o => TierOf(o) == t)))
                .Where(x => x.Count > 0).Select(x => $"{x.Count} {TierText(x.Tier)}")
                .Append($"{s.Outages.Count(o => TierOf(o) == Tier.Secure)} secure");
            string intact = !s.IntactConverged ? $"intact case did not converge ({s.IntactMessage})"
                : s.IntactViolations.Count == 0 ? "intact ok"
                : $"intact has {s.IntactViolations.Count} violation(s)";
            lines.Add($"{TapStudyTables.ScenarioName(s.Scenario)}: {string.Join(" · ", counts)} · {intact}");
        }
        return lines.Count == 0 ? "Nothing to screen: the network has no line or transformer in service." : string.Join("\n", lines);
    }

    /// <summary>The outages of every scenario, most severe first; the scenario is named on the first row of its group only.</summary>
    public static TextTableSource Outages(OutageScreeningResult r)
    {
        var rows = new List<string[]>();
        foreach (ScenarioScreening s in r.Scenarios)
            for (int i = 0; i < s.Outages.Count; i++)
                rows.Add(Row(s, i));
        return new TextTableSource(Headers, rows);
    }

    /// <summary>The outage behind each table row, in the same order, for row colours and detail.</summary>
    public static IReadOnlyList<OutageCase> Cases(OutageScreeningResult r) => r.Scenarios.SelectMany(s => s.Outages).ToList();

    private static string[] Row(ScenarioScreening s, int i)
    {
        OutageCase c = s.Outages[i];
        bool solved = c.Converged;
        return
        [
            i == 0 ? TapStudyTables.ScenarioName(s.Scenario) : "",
            (i + 1).ToString(Inv),
            c.Element,
            c.Kind,
            F(c.Severity, "0.0") + " " + TierText(TierOf(c)),
            solved ? "yes" : "NO",
            !solved ? "—" : c.IslandedBuses.Count == 0 ? "0" : $"{c.IslandedBuses.Count} bus(es)",
            !solved ? "—" : c.IslandedBuses.Count == 0 ? "0" : LostMw(c),
            c.WorstVPu is double v ? $"{F(v, "0.0000")}{VoltageMark(s, c)} {c.WorstVBus}" : "—",
            c.WorstLoadingPercent is double pct ? $"{F(pct, "0.0")}{(pct > 100 ? ResultTables.HighMark : " ")} {c.WorstLoadingElement}" : "—",
            solved ? c.NewViolations.Count.ToString(Inv) : "—",
        ];
    }

    /// <summary>Load lost with the island; generation lost with it too, when there was any.</summary>
    public static string LostMw(OutageCase c) =>
        F(c.LostLoadMw, "0.0") + (c.LostGenerationMw > 1e-6 ? $" (gen {F(c.LostGenerationMw, "0.0")})" : "");

    /// <summary>
    /// ▼ or ▲ when the worst bus lies outside its band with the element out: either a new (or worse)
    /// violation of the outage, or one the intact case already had that still holds.
    /// </summary>
    public static string VoltageMark(ScenarioScreening s, OutageCase c)
    {
        if (c.WorstVPu is not double v || c.WorstVBus is not { } bus) return " ";
        OutageViolation? added = c.NewViolations.FirstOrDefault(x => x.Element == bus && x.Kind == "bus");
        if (added is not null) return ResultTables.Mark(added.Type);
        foreach (Violation x in s.IntactViolations.Where(x => x.Element == bus && x.Kind == "bus"))
        {
            if (x.Type == ViolationKind.Low && v < x.Limit) return ResultTables.LowMark;
            if (x.Type == ViolationKind.High && v > x.Limit) return ResultTables.HighMark;
        }
        return " ";
    }

    private static string F(double v, string format) => v.ToString(format, Inv);
}
