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
        string scenarios = r.Scenarios.Count == 1 && r.Scenarios[0].Scenario is null
            ? "as entered" : "scenarios " + string.Join(", ", r.Scenarios.Select(s => s.Scenario));
        var doc = new ReportDocument($"Outage screening (N-1): {LoadFlowReport.Title(network, path)}");
        LoadFlowReport.AddInputs(doc, path, network, scenarios, options);
        doc.Input("elements taken out", $"{r.Elements.Count}: {string.Join(", ", r.Elements)}");
        doc.Text($"{r.Elements.Count} lines and transformers taken out one at a time in {scenarios}, each solved warm started from the intact case",
            "new = a violation the intact case of the same scenario does not have, or has by less; "
            + "worst V = the live bus nearest to (or furthest outside) its band; parallel = branches left between the same two buses",
            SeverityKey);
        foreach (ScenarioScreening s in r.Scenarios) AddScenario(doc, s);
        return doc;
    }

    private static void AddScenario(ReportDocument doc, ScenarioScreening s)
    {
        string name = s.Scenario ?? "as entered";
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
