// `study solve`: the JSON shape, the readable table, and exit 3 when the load flow cannot converge.
using System.Text.Json;

namespace Study.App.Tests.Cli;

public class SolveCommandTests
{
    [Fact]
    public void Ieee14_json_reproduces_the_published_voltages_and_has_the_documented_keys()
    {
        CliOutcome r = CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"), "--json");
        Assert.Equal(0, r.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(r.Out);
        JsonElement root = doc.RootElement;
        foreach (string key in new[] { "converged", "iterations", "maxMismatchPu", "buses", "branches", "taps", "totals" })
            Assert.True(root.TryGetProperty(key, out _), key);
        JsonElement bus = root.GetProperty("buses")[0];
        foreach (string key in new[] { "id", "kv", "vPu", "vKv", "angleDeg", "pGenMw", "qGenMvar", "pLoadMw", "qLoadMvar", "violation" })
            Assert.True(bus.TryGetProperty(key, out _), key);
        JsonElement branch = root.GetProperty("branches")[0];
        foreach (string key in new[] { "id", "kind", "from", "to", "loss", "pctOfRating" })
            Assert.True(branch.TryGetProperty(key, out _), key);
        foreach (string end in new[] { "from", "to" })
            foreach (string key in new[] { "bus", "mw", "mvar", "amps" })
                Assert.True(branch.GetProperty(end).TryGetProperty(key, out _), $"{end}.{key}");
        Assert.True(branch.GetProperty("loss").TryGetProperty("mw", out _));
        Assert.True(branch.GetProperty("loss").TryGetProperty("mvar", out _));
        // Published solution of the IEEE 14 bus case (DEVELOPERS.md, Outside references): bus 1 at 1.060 pu, bus 14 at 1.036 pu.
        Assert.Equal(1.060, root.GetProperty("buses")[0].GetProperty("vPu").GetDouble(), 3);
        Assert.InRange(root.GetProperty("buses")[13].GetProperty("vPu").GetDouble(), 1.034, 1.038);
        Assert.True(root.GetProperty("published").GetProperty("maxVoltageDifferencePu").GetDouble() < 0.002);
    }

    [Fact]
    public void The_readable_table_shows_the_same_numbers_as_the_json()
    {
        CliOutcome json = CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"), "--json");
        CliOutcome table = CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"));
        using JsonDocument doc = JsonDocument.Parse(json.Out);
        string v14 = doc.RootElement.GetProperty("buses")[13].GetProperty("vPu").GetDouble()
            .ToString("F4", System.Globalization.CultureInfo.InvariantCulture);
        Assert.Contains(v14, table.Out);
        Assert.Contains("Violations", table.Out);
    }

    [Fact]
    public void Load_far_beyond_transfer_capability_exits_3_with_a_message_and_no_nan()
    {
        string text = File.ReadAllText(CliRun.Network("harbour-estate.study.json"))
            .Replace("\"loadScale\": 1,", "\"loadScale\": 40,");
        string path = CliRun.TempFile("overload.study.json", text);
        CliOutcome r = CliRun.Run("solve", path, "--scenario", "winter-peak");
        Assert.Equal(3, r.ExitCode);
        Assert.Contains("did not converge", r.Err);
        Assert.DoesNotContain("NaN", r.Out + r.Err);
        CliOutcome json = CliRun.Run("solve", path, "--scenario", "winter-peak", "--json");
        Assert.Equal(3, json.ExitCode);
        Assert.DoesNotContain("NaN", json.Out);
        using JsonDocument doc = JsonDocument.Parse(json.Out);
        Assert.False(doc.RootElement.GetProperty("converged").GetBoolean());
    }

    [Fact]
    public void Export_jacobian_writes_a_matrix_market_file()
    {
        string dir = Directory.CreateTempSubdirectory("study-jac").FullName;
        string path = Path.Combine(dir, "j.mtx");
        Assert.Equal(0, CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"), "--export-jacobian", path).ExitCode);
        string[] lines = File.ReadAllLines(path);
        Assert.StartsWith("%%MatrixMarket matrix coordinate real general", lines[0]);
        // 13 non-slack buses: 26 unknowns.
        Assert.StartsWith("26 26 ", lines.First(l => !l.StartsWith('%')));
    }
}
