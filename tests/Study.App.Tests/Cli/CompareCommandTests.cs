// `study compare`: before and after the new bank, two scenarios of one file, and a file against itself.
using System.Text.Json;

namespace Study.App.Tests.Cli;

public class CompareCommandTests
{
    private static readonly string[] SharedBuses = ["WRB132", "WRB33", "QE33", "CQ33", "MR33", "MRG11"];

    [Fact]
    public void Before_and_after_the_new_bank_names_the_voltage_change_at_every_shared_bus()
    {
        CliOutcome run = CliRun.Run("compare", DemoNetworks.Before, DemoNetworks.Demo, "--scenario", "winter-peak");
        Assert.Equal(0, run.ExitCode);
        foreach (string bus in SharedBuses)
            Assert.Matches($@"\n  {bus}\s+\d+(\.\d+)?\s+\d\.\d{{4}}\s+\d\.\d{{4}}\s+[+-]\d\.\d{{4}}", run.Out);
        foreach (string bus in new[] { "CQ11", "CS11", "PS11" })
            Assert.Matches($@"\n  {bus}\s+11\s+—\s+\d\.\d{{4}}\s+—\s+added", run.Out);
        Assert.Contains("losses ", run.Out);
        Assert.Contains("Taps that moved", run.Out);
    }

    [Fact]
    public void Json_marks_added_buses_with_a_null_before_voltage()
    {
        CliOutcome run = CliRun.Run("compare", DemoNetworks.Before, DemoNetworks.Demo, "--scenario", "winter-peak", "--json");
        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        JsonElement root = doc.RootElement;
        foreach (string key in new[] { "buses", "branches", "lossBeforeMw", "lossAfterMw", "violationsAppeared", "violationsCleared" })
            Assert.True(root.TryGetProperty(key, out _), $"missing {key}");
        var buses = root.GetProperty("buses").EnumerateArray().ToDictionary(b => b.GetProperty("id").GetString()!);
        Assert.Equal(JsonValueKind.Null, buses["CQ11"].GetProperty("beforePu").ValueKind);
        Assert.Equal(JsonValueKind.Null, buses["CQ11"].GetProperty("deltaPu").ValueKind);
        Assert.All(SharedBuses, id => Assert.Equal(JsonValueKind.Number, buses[id].GetProperty("deltaPu").ValueKind));
        Assert.True(root.GetProperty("lossAfterMw").GetDouble() > root.GetProperty("lossBeforeMw").GetDouble());
    }

    [Fact]
    public void A_file_against_itself_changes_nothing_and_two_scenarios_of_one_file_compare()
    {
        CliOutcome same = CliRun.Run("compare", DemoNetworks.Demo, DemoNetworks.Demo, "--json");
        using (var doc = JsonDocument.Parse(same.Out))
        {
            Assert.All(doc.RootElement.GetProperty("buses").EnumerateArray(), b => Assert.Equal(0, b.GetProperty("deltaPu").GetDouble(), 12));
            Assert.Equal(0, doc.RootElement.GetProperty("violationsAppeared").GetArrayLength());
        }

        CliOutcome scenarios = CliRun.Run("compare", DemoNetworks.Demo, "--scenarios", "winter-peak,summer-night");
        Assert.Equal(0, scenarios.ExitCode);
        Assert.Contains("scenario winter-peak → ", scenarios.Out);
        Assert.Contains("scenario summer-night", scenarios.Out);
        Assert.Equal(2, CliRun.Run("compare", DemoNetworks.Demo).ExitCode);
        Assert.Equal(2, CliRun.Run("compare", DemoNetworks.Demo, "--scenarios", "winter-peak").ExitCode);
    }

    [Fact]
    public void Csv_and_markdown_reports_are_written_whole_and_read_back()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("compare", DemoNetworks.Before, DemoNetworks.Demo, "--scenario", "winter-peak",
            "--csv", dir.Path, "--markdown", dir.File("compare.md"));
        Assert.Equal(0, run.ExitCode);
        Assert.Empty(dir.Leftovers());
        Assert.Equal(["id", "kv", "membership", "beforePu", "afterPu", "deltaPu"], ReportChecks.CsvHeader(dir.File("buses.csv")));
        Assert.Equal(1 + 10, File.ReadAllLines(dir.File("buses.csv")).Length);
        Assert.Equal(["id", "kind", "membership", "beforeMw", "afterMw", "deltaMw", "beforeLoadingPercent", "afterLoadingPercent"],
            ReportChecks.CsvHeader(dir.File("branches.csv")));
        Assert.Equal(["change", "element", "kind", "type", "value", "limit"], ReportChecks.CsvHeader(dir.File("violations.csv")));
        var tables = ReportChecks.MarkdownTables(File.ReadAllText(dir.File("compare.md")));
        Assert.Equal((6, 10), tables[0]);
        Assert.Equal(11, tables[1].Rows);
    }
}
