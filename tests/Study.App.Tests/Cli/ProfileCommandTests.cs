// `study profile`: the JSON shape, the energy balance, the tables it writes and bad profiles refused with exit 2.
using System.Text.Json;

namespace Study.App.Tests.Cli;

public sealed class ProfileCommandTests
{
    private static string Day => CliRun.Network("harbour-estate-day.profile.csv");

    [Fact]
    public void Json_has_the_documented_shape_and_the_energy_balance_closes()
    {
        CliOutcome run = CliRun.Run("profile", DemoNetworks.Demo, "--profile", Day, "--json");
        Assert.Equal(0, run.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(run.Out);
        JsonElement root = doc.RootElement;
        Assert.Equal(96, root.GetProperty("steps").GetInt32());
        foreach (string key in new[] { "id", "vMinPu", "vMaxPu", "hoursOutside" })
            Assert.True(root.GetProperty("buses")[0].TryGetProperty(key, out _), key);
        foreach (string key in new[] { "id", "tapOperations", "peakPctOfRating" })
            Assert.True(root.GetProperty("transformers")[0].TryGetProperty(key, out _), key);
        JsonElement e = root.GetProperty("energy");
        double In(string k) => e.GetProperty(k).GetDouble();
        Assert.Equal(In("deliveredMwh") + In("generatedMwh"), In("consumedMwh") + In("lossMwh"), 6);
        Assert.Equal(In("lossMwh"), In("loadLossMwh") + In("noLoadLossMwh"), 9);
        // GT1 and GT2 regulate WRB33 on load: over a day of changing load they operate.
        JsonElement gt1 = root.GetProperty("transformers").EnumerateArray().Single(t => t.GetProperty("id").GetString() == "GT1");
        Assert.True(gt1.GetProperty("tapOperations").GetInt32() > 0);
    }

    [Fact]
    public void Csv_tables_carry_every_step_and_the_text_answers_first()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("profile", DemoNetworks.Demo, "--profile", Day, "--csv", dir.Path);
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("the network lost", run.Out);
        Assert.Contains("CQ-T1:", run.Out);
        Assert.Equal(1 + 96, File.ReadAllLines(dir.File("steps.csv")).Length);
        Assert.Equal(["step", "time", "hours", "converged", "lossMw", "WRB33.vPu", "GT1.position", "GT2.position", "UT-GE1.position", "CQ-T1.position", "CS-T2.position"],
            ReportChecks.CsvHeader(dir.File("steps.csv")));
        Assert.Equal(["id", "vMinPu", "vMaxPu", "hoursOutside"], ReportChecks.CsvHeader(dir.File("buses.csv")));
    }

    [Theory]
    [InlineData("time,LD-NOWHERE\n2027-01-01T00:00,1\n2027-01-01T01:00,1\n", ":1:6: column 'LD-NOWHERE' names no load")]
    [InlineData("time,scale\n2027-01-01T01:00,1\n2027-01-01T00:00,1\n", ":3:1: time 2027-01-01T00:00 does not come after")]
    [InlineData("time,scale\nsoon,1\n", ":2:1: 'soon' is not an ISO 8601 time")]
    [InlineData("", ":1:1: the profile is empty")]
    [InlineData("time,scale\n2027-01-01T00:00,-1\n2027-01-01T01:00,1\n", ":2:18: scale -1 is negative")]
    [InlineData("time,scale\n2027-01-01T00:00,Infinity\n2027-01-01T01:00,1\n", ":2:18: 'Infinity' is not a finite number")]
    public void A_bad_profile_exits_2_naming_file_line_and_column(string text, string message)
    {
        string csv = CliRun.TempFile("bad.profile.csv", text);
        CliOutcome run = CliRun.Run("profile", DemoNetworks.Demo, "--profile", csv);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("bad.profile.csv" + message, run.Err);
        Assert.DoesNotContain("   at ", run.Err);
    }
}
