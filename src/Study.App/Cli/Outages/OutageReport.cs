// The report of `study outages`: per scenario, the outages ranked by severity with what each one breaks.
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.LoadFlow;
using Study.Core.Model;
using static Study.App.Reports.Numbers;
using Study.Core.Studies;

namespace Study.App.Cli.Outages;

public static class OutageReport
{
    public const string SeverityKey =
        "severity: 1000 no convergence; 100–999 load lost (100 + 899 × share of the scenario's load); "
        + "below 100 the sum of new overloads (% above rating) and voltage excursions (% outside the band); 0 secure";

    public static ReportDocument Build(string path, Network network, OutageScreeningResult r, LoadFlowOptions options)
    {
        var doc = new ReportDocument($"Outage screening (N-1): {LoadFlowReport.Title(network, path)}");
        LoadFlowReport.AddInputs(doc, path, network, Scenarios(r), options);
        return Body(doc, r);
    }

    /// <summary>The report of merged parts, which name their network file but do not hold the network.</summary>
    public static ReportDocument Merged(string path, string sha256, int parts, OutageScreeningResult r, LoadFlowOptions options)
    {
        var doc = new ReportDocument($"Outage screening (N-1): {path}, merged from {parts} shards");
        doc.Input("file", path);
        doc.Input("file SHA-256", sha256);
        doc.Input("scenario", Scenarios(r));
        doc.Input("options", LoadFlowReport.Options(options));
        return Body(doc, r);
    }

    private static string Scenarios(OutageScreeningResult r) => r.Scenarios.Count == 1 && r.Scenarios[0].Scenario is null
        ? "loads as entered" : "scenarios " + string.Join(", ", r.Scenarios.Select(s => s.Scenario));

    private static ReportDocument Body(ReportDocument doc, OutageScreeningResult r)
    {
        string scenarios = Scenarios(r);
        doc.Input("elements taken out", $"{r.Elements.Count}: {string.Join(", ", r.Elements)}");
        if (r.Shard.Count > 1)
            doc.Text($"Shard {r.Shard}: the outages numbered i with i mod {r.Shard.Count} = {r.Shard.Number - 1}, "
                + $"{Integer(r.Scenarios.Sum(s => s.Outages.Count))} of {Integer(r.OutageCount)}; 'study merge' joins the shards' --json parts");
        doc.Text($"{r.Elements.Count} lines and transformers taken out one at a time in {scenarios}, each solved warm started from the intact case",
            "new = a violation the intact case of the same scenario does not have, or has by less; "
            + "worst V = the live bus nearest to (or furthest outside) its band; parallel = branches left between the same two buses",
            SeverityKey);
        foreach (ScenarioScreening s in r.Scenarios) AddScenario(doc, s);
        return doc;
    }

    private static void AddScenario(ReportDocument doc, ScenarioScreening s)
    {
        string name = s.Scenario ?? "loads as entered";
        doc.Heading(s.IntactConverged
            ? $"Scenario {name}: intact case {Fixed(s.IntactLoadMw, 2)} MW load, {Count(s.IntactViolations.Count, "violation")}"
            : $"Scenario {name}: the intact case does not converge ({s.IntactMessage}); every violation below counts as new");
        if (s.IntactViolations.Count > 0)
            doc.List(s.IntactViolations.Select(v => "intact: " + LoadFlowReport.Describe(v)));
        doc.Text(Finding(s));
        doc.Table(OutageColumns.ScenarioOutages, OutageColumns.Ranked(s), spaceBefore: true);
    }

    private static string Finding(ScenarioScreening s)
    {
        var failed = s.Outages.Where(o => !o.Converged).Select(o => o.Element).ToList();
        var lost = s.Outages.Where(o => o.Converged && o.LostLoadMw > 0).Select(o => o.Element).ToList();
        var stressed = s.Outages.Where(o => o.Converged && o.LostLoadMw == 0 && o.NewViolations.Count > 0).Select(o => o.Element).ToList();
        var islanded = s.Outages.Where(o => o.Converged && o.LostLoadMw == 0 && o.IslandedBuses.Count > 0)
            .Select(o => o.LostGenerationMw > 0.005 ? $"{o.Element} ({Fixed(o.LostGenerationMw, 2)} MW generation)" : o.Element).ToList();
        var parts = new List<string>();
        if (failed.Count > 0) parts.Add($"no convergence with {string.Join(", ", failed)} out");
        if (lost.Count > 0) parts.Add($"load lost with {string.Join(", ", lost)} out");
        if (stressed.Count > 0) parts.Add($"new violations with {string.Join(", ", stressed)} out");
        if (islanded.Count > 0) parts.Add($"buses islanded without load with {string.Join(", ", islanded)} out");
        int secure = s.Outages.Count(o => o.Converged && o.LostLoadMw == 0 && o.NewViolations.Count == 0);
        parts.Add($"{Count(secure, "outage")} of {s.Outages.Count} secure");
        return "Finding: " + string.Join("; ", parts);
    }

    private static string Count(int n, string noun) => n == 1 ? $"1 {noun}" : $"{Integer(n)} {noun}s";
}
