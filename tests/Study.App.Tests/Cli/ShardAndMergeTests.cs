// `study outages --shard K/N --json` and `study merge`: the merged parts are the unsharded result, byte for byte.
using System.Text.Json;
using Study.Core.Io;
using Study.Core.Synthetic;

namespace Study.App.Tests.Cli;

public class ShardAndMergeTests
{
    /// <summary>A generated 120-bus grid (one scenario: the JSON is one object), written once for these tests.</summary>
    private static readonly Lazy<string> Grid = new(() =>
    {
        string dir = Directory.CreateTempSubdirectory("study-shards").FullName;
        string path = Path.Combine(dir, "grid.study.json");
        NetworkFile.Write(SyntheticGrid.Generate(new SyntheticGridOptions { Buses = 120, Seed = 9 }).Network, path);
        return path;
    });

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(7)]
    public void Merged_shards_of_a_generated_grid_print_exactly_what_one_run_prints(int shards) =>
        AssertMergeEqualsWhole(Grid.Value, shards);

    [Theory]
    [InlineData(2)]
    [InlineData(5)]
    [InlineData(50)]
    public void Merged_shards_of_the_demo_in_both_scenarios_print_exactly_what_one_run_prints(int shards) =>
        // 10 elements in 2 scenarios: with 50 shards most shards hold no outage at all.
        AssertMergeEqualsWhole(DemoNetworks.Demo, shards);

    [Fact]
    public void A_merge_refuses_a_missing_shard_a_repeated_one_and_parts_of_other_screenings()
    {
        using var dir = new TempDirectory();
        string[] parts = WriteParts(Grid.Value, 3, dir);

        CliOutcome missing = CliRun.Run("merge", parts[0], parts[2]);
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("shard 2/3 missing", missing.Err);

        CliOutcome twice = CliRun.Run("merge", parts[0], parts[1], parts[1], parts[2]);
        Assert.Equal(2, twice.ExitCode);
        Assert.Contains("shard 2/3 is given twice", twice.Err);

        // The same grid saved again with one load changed: same file name, other content.
        string other = dir.File("other.study.json");
        File.WriteAllText(other, File.ReadAllText(Grid.Value).Replace("\"pMw\": 1", "\"pMw\": 2", StringComparison.Ordinal));
        CliOutcome otherPart = CliRun.Run("outages", other, "--shard", "2/3", "--json");
        Assert.Equal(0, otherPart.ExitCode);
        File.WriteAllText(parts[1], otherPart.Out);
        CliOutcome network = CliRun.Run("merge", parts[0], parts[1], parts[2]);
        Assert.Equal(2, network.ExitCode);
        Assert.Contains("another network", network.Err);

        string[] two = NetworkFile.Read(Grid.Value).Lines.Take(2).Select(l => l.Id).ToArray();
        CliOutcome fewer = CliRun.Run("outages", Grid.Value, "--shard", "2/3", "--json", "--elements", two[0], two[1]);
        Assert.Equal(0, fewer.ExitCode);
        File.WriteAllText(parts[1], fewer.Out);
        CliOutcome options = CliRun.Run("merge", parts[0], parts[1], parts[2]);
        Assert.Equal(2, options.ExitCode);
        Assert.Contains("different options", options.Err);
    }

    [Fact]
    public void A_file_that_is_not_a_part_is_refused_with_its_name_and_position()
    {
        using var dir = new TempDirectory();
        string plain = dir.File("plain.json");
        File.WriteAllText(plain, CliRun.Run("outages", DemoNetworks.Demo, "--json").Out);
        CliOutcome notPart = CliRun.Run("merge", plain);
        Assert.Equal(2, notPart.ExitCode);
        Assert.Contains("plain.json", notPart.Err);
        Assert.Contains("not a part", notPart.Err);

        string[] parts = WriteParts(DemoNetworks.Demo, 2, dir);
        string text = File.ReadAllText(parts[0]);
        File.WriteAllText(parts[0], text[..(text.Length / 2)]);
        CliOutcome cut = CliRun.Run("merge", parts[0], parts[1]);
        Assert.Equal(2, cut.ExitCode);
        Assert.Matches(@"part-1\.json:\d+:\d+", cut.Err);
        Assert.DoesNotContain("   at ", cut.Err);
    }

    [Fact]
    public void A_shard_that_does_not_exist_is_a_usage_error()
    {
        foreach (string bad in new[] { "0/3", "4/3", "1/0", "two/3", "3" })
        {
            CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--shard", bad, "--json");
            Assert.Equal(2, run.ExitCode);
            Assert.Empty(run.Out);
        }
        Assert.Equal(2, CliRun.Run("outages", DemoNetworks.Demo, "--shard", "1/2", "--slurm", "2").ExitCode);
        Assert.Equal(2, CliRun.Run("outages", DemoNetworks.Demo, "--partition", "debug").ExitCode);
    }

    [Fact]
    public void A_part_carries_the_network_hash_the_options_the_slice_and_each_outages_number()
    {
        CliOutcome run = CliRun.Run("outages", DemoNetworks.Demo, "--shard", "2/3", "--json");
        Assert.Equal(0, run.ExitCode);
        using var part = JsonDocument.Parse(run.Out);
        JsonElement header = part.RootElement.GetProperty("part");
        Assert.Equal("study-outages-part", header.GetProperty("format").GetString());
        Assert.Equal(2, header.GetProperty("shard").GetInt32());
        Assert.Equal(3, header.GetProperty("shards").GetInt32());
        Assert.Equal(64, header.GetProperty("networkSha256").GetString()!.Length);
        // The demo's 11 branches (6 lines, 5 transformers) out in each of its 2 scenarios.
        Assert.Equal(22, header.GetProperty("outageCount").GetInt32());
        var orders = part.RootElement.GetProperty("scenarios").EnumerateArray()
            .SelectMany(s => s.GetProperty("outages").EnumerateArray().Select(o => o.GetProperty("order").GetInt32())).Order().ToList();
        // Outages 1, 4, 7, ... of the 22: i mod 3 = 1.
        Assert.Equal(Enumerable.Range(0, 22).Where(i => i % 3 == 1), orders);
    }

    private static void AssertMergeEqualsWhole(string network, int shards)
    {
        CliOutcome whole = CliRun.Run("outages", network, "--json");
        Assert.Equal(0, whole.ExitCode);
        using var dir = new TempDirectory();
        string[] parts = WriteParts(network, shards, dir);
        // The parts in another order than their numbers: the merge does not depend on it.
        string[] shuffled = parts.Reverse().Skip(1).Append(parts[^1]).ToArray();
        CliOutcome merged = CliRun.Run(["merge", .. shuffled, "--json"]);
        Assert.True(merged.ExitCode == 0, merged.Err);
        Assert.Equal(whole.Out, merged.Out);
    }

    private static string[] WriteParts(string network, int shards, TempDirectory dir)
    {
        var files = new string[shards];
        for (int k = 1; k <= shards; k++)
        {
            CliOutcome part = CliRun.Run("outages", network, "--shard", $"{k}/{shards}", "--json");
            Assert.True(part.ExitCode == 0, part.Err);
            files[k - 1] = dir.File($"part-{k}.json");
            File.WriteAllText(files[k - 1], part.Out);
        }
        return files;
    }
}
