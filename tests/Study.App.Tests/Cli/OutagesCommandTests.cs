// `study outages`: the demo's banks screened in both scenarios, the JSON shape, and the report files.
using System.Text.Json;
using System.Text.RegularExpressions;

namespace Study.App.Tests.Cli;

public class OutagesCommandTests
{
    [Fact]
    public void Each_grid_bank_out_shows_the_remaining_banks_loading_in_both_scenarios()
    {
        CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--all-scenarios");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Scenario winter-peak", run.Out);
        Assert.Contains("Scenario summer-night", run.Out);
        var rows = run.Out.Split('\n');
        foreach ((string outage, string remaining) in new[] { ("GT1", "GT2"), ("GT2", "GT1") })
        {
            var bankRows = rows.Where(r => Regex.IsMatch(r, $@"^\s+\d+\s+\d+\.\d( [A-Za-z]+)+\s+{outage}\s+transformer")).ToList();
            Assert.Equal(2, bankRows.Count);
            Assert.All(bankRows, r => Assert.Matches($@"{remaining} \d+\.\d %", r));
        }
        Assert.Matches(@"GT1\s+transformer\s+new violations.*GT2 12\d\.\d %", run.Out);
    }

    [Fact]
    public void Json_gives_one_object_per_scenario_in_the_documented_shape()
    {
        CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--json");
        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.Equal(JsonValueKind.Array, doc.RootElement.ValueKind);
        Assert.Equal(["winter-peak", "summer-night"], doc.RootElement.EnumerateArray().Select(s => s.GetProperty("scenario").GetString()));
        JsonElement first = doc.RootElement[0].GetProperty("outages")[0];
        foreach (string key in new[] { "element", "kind", "converged", "islandedBuses", "lostLoadMw", "newViolations", "worstVPu", "worstLoadingPercent", "severity" })
            Assert.True(first.TryGetProperty(key, out _), $"missing {key}");
        Assert.Equal("CQ-T1", first.GetProperty("element").GetString());
        Assert.Equal(4, first.GetProperty("islandedBuses").GetArrayLength());

        CliOutcome one = CliRun.Run("outages", DemoNetworks.Demo, "--scenario", "winter-peak", "--elements", "GT1", "--json");
        using var single = JsonDocument.Parse(one.Out);
        Assert.Equal("winter-peak", single.RootElement.GetProperty("scenario").GetString());
        JsonElement gt1 = Assert.Single(single.RootElement.GetProperty("outages").EnumerateArray());
        JsonElement overload = Assert.Single(gt1.GetProperty("newViolations").EnumerateArray());
        Assert.Equal("GT2", overload.GetProperty("element").GetString());
        Assert.Equal("overload", overload.GetProperty("type").GetString());
    }

    [Fact]
    public void Csv_and_markdown_reports_are_written_whole_and_read_back()
    {
        using var dir = new TempDirectory();
        string md = dir.File("outages.md");
        File.WriteAllText(md, "an older report");
        CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--csv", dir.File("csv"), "--markdown", md);
        Assert.Equal(0, run.ExitCode);
        Assert.Empty(dir.Leftovers());

        Assert.Equal(["scenario", "rank", "severity", "element", "kind", "converged", "islandedBuses", "lostLoadMw", "lostGenerationMw",
            "worstVPu", "worstVBus", "worstLoadingPercent", "worstLoadingElement", "newViolations", "stressPercent"],
            ReportChecks.CsvHeader(dir.File("csv/outages.csv")));
        Assert.Equal(1 + 2 * 11, File.ReadAllLines(dir.File("csv/outages.csv")).Length);
        Assert.Equal(["scenario", "outage", "element", "kind", "type", "value", "limit", "intactValue"],
            ReportChecks.CsvHeader(dir.File("csv/new-violations.csv")));

        string text = File.ReadAllText(md);
        Assert.StartsWith("# Outage screening (N-1): ", text);
        Assert.Contains("- **file:** ", text);
        Assert.Contains("- **scenario:** scenarios winter-peak, summer-night", text);
        var tables = ReportChecks.MarkdownTables(text);
        Assert.Equal(2, tables.Count);
        Assert.All(tables, t => Assert.Equal(11, t.Rows));
    }

    [Fact]
    public void An_unknown_element_is_an_input_error_naming_it()
    {
        CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--elements", "GT7");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("GT7", run.Err);
        Assert.Equal(2, CliRun.Run("outages", DemoNetworks.Demo, "--scenario", "winter-peak", "--all-scenarios").ExitCode);
    }
}
