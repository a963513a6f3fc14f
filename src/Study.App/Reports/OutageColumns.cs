// The columns of the outage-screening result records: the ranked outages and their new violations.
using Study.App.Cli.Solve;
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Reports;

/// <summary>One outage with its scenario and its rank there (1 = most severe).</summary>
public sealed record RankedOutage(ScenarioScreening Screening, int Rank, OutageCase Case);

/// <summary>A violation an outage adds, with the outage and scenario it belongs to.</summary>
public sealed record OutageViolationRow(ScenarioScreening Screening, OutageCase Case, OutageViolation Violation);

public static class OutageColumns
{
    /// <summary>
    /// Outages in every output: severity with its tier in words, what the outage islands and loses, the
    /// worst voltage and loading left (▼/▲ when outside their limits), and what newly breaks.
    /// </summary>
    public static ColumnSpec<RankedOutage> Outages { get; } = new ColumnSpec<RankedOutage>()
        .Text("scenario", "scenario", o => Labels.Scenario(o.Screening.Scenario), namesGroup: true)
        .Integer("rank", "rank", null, o => o.Rank)
        .Number("severity", "severity", null, o => o.Case.Severity, 1, mark: o => " " + OutageTiers.Words(OutageTiers.Of(o.Case)))
        .Text("element", "out", o => o.Case.Element)
        .Text("kind", "kind", o => Labels.Kind(o.Case.Kind))
        .Words("converged", "result", o => o.Case.Converged, o => Verdict(o.Case))
        .Words("islandedBuses", "islanded buses", o => string.Join(' ', o.Case.IslandedBuses),
            o => o.Case.Converged ? string.Join(", ", o.Case.IslandedBuses) : Numbers.Blank)
        .Number("lostLoadMw", "lost", "MW", o => o.Case.Converged ? o.Case.LostLoadMw : null, 2,
            reads: o => !o.Case.Converged ? Numbers.Blank : o.Case.LostLoadMw > 0 ? LostMw(o.Case) : "")
        .CsvOnly("lostGenerationMw", o => o.Case.LostGenerationMw)
        .Number("worstVPu", "worst V", "pu", o => o.Case.WorstVPu, 4, mark: o => o.Case.WorstVPu is null ? "" : VoltageMark(o.Screening, o.Case))
        .Text("worstVBus", "at", o => o.Case.WorstVBus)
        .Number("worstLoadingPercent", "worst loading", "%", o => o.Case.WorstLoadingPercent, 1,
            mark: o => o.Case.WorstLoadingPercent is double pct ? (pct > 100 ? Marks.High : " ") : "")
        .Text("worstLoadingElement", "on", o => o.Case.WorstLoadingElement)
        .Integer("newViolations", "new", null, o => o.Case.Converged ? o.Case.NewViolations.Count : null)
        .Shown("new violations", o => string.Join("; ", o.Case.NewViolations.Select(Short)))
        .Shown("parallel branch loading", o => string.Join(", ", o.Case.ParallelLoadings.Select(p => $"{p.Element} {Numbers.Fixed(p.LoadingPercent, 1)} %")))
        .CsvOnly("stressPercent", o => o.Case.StressPercent);

    /// <summary>The report's table of one scenario: the same columns without the scenario.</summary>
    public static ColumnSpec<RankedOutage> ScenarioOutages { get; } = Outages.Select("rank", "severity", "element", "kind", "converged",
        "islandedBuses", "lostLoadMw", "worstVPu", "worstVBus", "worstLoadingPercent", "worstLoadingElement", "new violations", "parallel branch loading");

    public static ColumnSpec<OutageViolationRow> NewViolations { get; } = new ColumnSpec<OutageViolationRow>()
        .Text("scenario", "scenario", v => v.Screening.Scenario)
        .Text("outage", "outage", v => v.Case.Element)
        .Text("element", "element", v => v.Violation.Element)
        .Text("kind", "kind", v => Labels.Kind(v.Violation.Kind))
        .Text("type", "type", v => SolveJson.ViolationName(v.Violation.Type))
        .Number("value", "value", null, v => v.Violation.Value, 4, reads: v => Value(v.Violation.Type, v.Violation.Value))
        .Number("limit", "limit", null, v => v.Violation.Limit, 3)
        .Number("intactValue", "intact", null, v => v.Violation.IntactValue, 4, reads: v => Value(v.Violation.Type, v.Violation.IntactValue));

    /// <summary>The Outages tab: the scenario named once per group; the counts of what breaks, the list in the detail.</summary>
    public static ColumnSpec<RankedOutage> ScreenOutages { get; } = Outages.Select("scenario", "rank", "element", "kind", "severity",
        "lostLoadMw", "worstVPu", "worstVBus", "worstLoadingPercent", "worstLoadingElement", "newViolations", "islandedBuses");

    /// <summary>Every outage of every scenario, most severe first within each scenario.</summary>
    public static IEnumerable<RankedOutage> Ranked(OutageScreeningResult r) => r.Scenarios.SelectMany(Ranked);

    public static IEnumerable<RankedOutage> Ranked(ScenarioScreening s) => s.Outages.Select((o, i) => new RankedOutage(s, i + 1, o));

    public static IEnumerable<OutageViolationRow> Violations(OutageScreeningResult r) =>
        r.Scenarios.SelectMany(s => s.Outages.SelectMany(o => o.NewViolations.Select(v => new OutageViolationRow(s, o, v))));

    public static string Verdict(OutageCase o) =>
        !o.Converged ? "NO CONVERGENCE"
        : o.LostLoadMw > 0 ? "load lost"
        : o.NewViolations.Count > 0 ? "new violations"
        : o.IslandedBuses.Count > 0 ? "secure, buses islanded" : "secure";

    /// <summary>A new violation in a few characters: "GT2 120.3 %", "QE33 low 0.941 pu", with the intact value when there was one.</summary>
    public static string Short(OutageViolation v)
    {
        string was = v.IntactValue is double x ? $" (intact {Value(v.Type, x)})" : "";
        return v.Type == ViolationKind.Overload
            ? $"{v.Element} {Numbers.Fixed(v.Value, 1)} %{was}"
            : $"{v.Element} {(v.Type == ViolationKind.Low ? "low" : "high")} {Numbers.Fixed(v.Value, 4)} pu{was}";
    }

    /// <summary>Load lost with the island; generation lost with it too, when there was any.</summary>
    public static string LostMw(OutageCase c) =>
        Numbers.Fixed(c.LostLoadMw, 1) + (c.LostGenerationMw > 1e-6 ? $" (gen {Numbers.Fixed(c.LostGenerationMw, 1)})" : "");

    /// <summary>
    /// ▼ or ▲ when the worst bus lies outside its band with the element out: either a new (or worse)
    /// violation of the outage, or one the intact case already had that still holds.
    /// </summary>
    public static string VoltageMark(ScenarioScreening s, OutageCase c)
    {
        if (c.WorstVPu is not double v || c.WorstVBus is not { } bus) return " ";
        OutageViolation? added = c.NewViolations.FirstOrDefault(x => x.Element == bus && x.Kind == Study.Core.Model.ElementKind.Bus);
        if (added is not null) return Marks.Padded(added.Type);
        foreach (Violation x in s.IntactViolations.Where(x => x.Element == bus && x.Kind == Study.Core.Model.ElementKind.Bus))
        {
            if (x.Type == ViolationKind.Low && v < x.Limit) return Marks.Low;
            if (x.Type == ViolationKind.High && v > x.Limit) return Marks.High;
        }
        return " ";
    }

    /// <summary>A loading in percent with one decimal, a voltage in pu with four.</summary>
    private static string Value(ViolationKind type, double? value) => Numbers.Fixed(value, type == ViolationKind.Overload ? 1 : 4);

}
