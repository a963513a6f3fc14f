// `--csv DIR` for the outage screening: outages.csv (one row per outage and scenario) and new-violations.csv.
using Study.App.Cli.Reports;
using Study.App.Cli.Solve;
using Study.Core.Io;
using Study.Core.Studies;

namespace Study.App.Cli.Outages;

public static class OutageCsv
{
    public static void Write(OutageScreeningResult r, string dir)
    {
        Directory.CreateDirectory(dir);
        var outages = new CsvTable("scenario", "rank", "element", "kind", "converged", "islandedBuses", "lostLoadMw", "lostGenerationMw",
            "newViolations", "worstVPu", "worstVBus", "worstLoadingPercent", "worstLoadingElement", "stressPercent", "severity");
        var violations = new CsvTable("scenario", "outage", "element", "kind", "type", "value", "limit", "intactValue");
        foreach (ScenarioScreening s in r.Scenarios)
            for (int i = 0; i < s.Outages.Count; i++)
            {
                OutageCase o = s.Outages[i];
                outages.Row(s.Scenario, i + 1, o.Element, o.Kind, o.Converged, string.Join(' ', o.IslandedBuses), o.LostLoadMw,
                    o.LostGenerationMw, o.NewViolations.Count, o.WorstVPu, o.WorstVBus, o.WorstLoadingPercent, o.WorstLoadingElement,
                    o.StressPercent, o.Severity);
                foreach (OutageViolation v in o.NewViolations)
                    violations.Row(s.Scenario, o.Element, v.Element, v.Kind, SolveJson.ViolationName(v.Type), v.Value, v.Limit, v.IntactValue);
            }
        outages.Write(Path.Combine(dir, "outages.csv"));
        violations.Write(Path.Combine(dir, "new-violations.csv"));
    }
}
