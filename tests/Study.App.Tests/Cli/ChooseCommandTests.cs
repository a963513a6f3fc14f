// `study choose`: the JSON shape on the demo, the ranked text with its caution, the outputs it writes, and bad candidates files refused with exit 2.
using System.Text.Json;

namespace Study.App.Tests.Cli;

public sealed class ChooseCommandTests
{
    private static string Candidates => CliRun.Network("harbour-estate-cold-quay.candidates.json");

    private static readonly string[] Rates = ["--no-load-rate", "6500", "--load-rate", "1800", "--loss-load-factor", "0.3"];

    private static CliOutcome Choose(params string[] extra) =>
        CliRun.Run(["choose", DemoNetworks.Demo, "--transformer", "CQ-T1", "--candidates", Candidates, .. Rates, .. extra]);

    [Fact]
    public void Json_has_the_documented_shape_and_ranks_feasible_units_by_total_owning_cost()
    {
        CliOutcome run = Choose("--json");
        Assert.Equal(0, run.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(run.Out);
        JsonElement root = doc.RootElement;
        Assert.Equal("CQ-T1", root.GetProperty("transformer").GetString());
        Assert.Contains("licensed", root.GetProperty("caution").GetString());
        var candidates = root.GetProperty("candidates").EnumerateArray().ToList();
        Assert.Equal(5, candidates.Count);
        foreach (string key in new[] { "id", "feasible", "reasons", "bestTap", "marginPu", "maxDutyPercent", "n1WorstPct", "noLoadLossKw",
                     "loadLossKw", "energyLossMwh", "totalOwningCost" })
            Assert.True(candidates[0].TryGetProperty(key, out _), key);

        var feasible = candidates.TakeWhile(c => c.GetProperty("feasible").GetBoolean()).ToList();
        Assert.Equal(feasible[0].GetProperty("id").GetString(), root.GetProperty("recommended").GetString());
        var costs = feasible.Select(c => c.GetProperty("totalOwningCost").GetDouble()).ToList();
        Assert.Equal(costs.Order(), costs);
        Assert.All(candidates.Skip(feasible.Count), c => Assert.NotEmpty(c.GetProperty("reasons").EnumerateArray()));

        // The demo's offers: the 25 MVA 8 % unit overdoes the Saltings board's 8 kA breaker, the 10 MVA unit is too small.
        JsonElement Of(string id) => candidates.Single(c => c.GetProperty("id").GetString() == id);
        Assert.Contains(Of("CQ-25-8").GetProperty("reasons").EnumerateArray(), r => r.GetString()!.StartsWith("CB-CS11 breaking duty"));
        Assert.Contains(Of("CQ-10-6").GetProperty("reasons").EnumerateArray(), r => r.GetString()!.StartsWith("CQ-T1 loaded 1"));
        // The board's feeder breaker is over its rating with the existing bank too: a note, never a reason against a candidate.
        Assert.Contains(root.GetProperty("notes").EnumerateArray(), n => n.GetString()!.StartsWith("CB-CS11-T2 short-time duty is") && n.GetString()!.Contains("existing CQ-T1 as well"));
        Assert.All(candidates, c => Assert.DoesNotContain(c.GetProperty("reasons").EnumerateArray(), r => r.GetString()!.StartsWith("CB-CS11-T2 short-time")));
    }

    [Fact]
    public void Text_gives_the_recommendation_first_under_the_caution_and_lists_network_limits_as_notes()
    {
        using var dir = new TempDirectory();
        string markdown = dir.File("choice.md");
        CliOutcome run = Choose("--csv", dir.Path, "--markdown", markdown);
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("CAUTION:", run.Out);
        Assert.Contains("recommended: CQ-20-10-LL", run.Out);
        Assert.Contains("Why the others fail", run.Out);
        // RING-1 is overloaded with RING-3 out whatever bank stands at Cold Quay: a note, not a reason.
        Assert.Contains("with RING-3 out RING-1 is loaded", run.Out);
        Assert.DoesNotContain("CQ-20-10-LL: with RING-3", run.Out);
        string[] header = ReportChecks.CsvHeader(dir.File("candidates.csv"));
        Assert.Equal(["rank", "id", "feasible", "bestTap", "marginPu", "maxDutyPercent", "maxDutyBreaker", "n1WorstPct", "n1WorstCase",
            "noLoadLossKw", "loadLossKw", "peakLoadLossKw", "energyLossMwh", "price", "capitalisedLosses", "totalOwningCost", "reasons"], header);
        Assert.Equal(6, File.ReadAllLines(dir.File("candidates.csv")).Length);
        Assert.Contains("CAUTION", File.ReadAllText(markdown));
    }

    [Theory]
    [InlineData("{\"format\": \"study-candidates\", \"version\": 1, \"candidates\": [{\"id\": \"A\", \"mva\": 20, \"colour\": 1}]}", ":1:")]
    [InlineData("{\"format\": \"study-candidates\", \"version\": 1, \"candidates\": []}", ":1:1: the file offers no candidates")]
    [InlineData("{\"format\": \"study-candidates\", \"version\": 2, \"candidates\": [{\"id\": \"A\"}]}", ":1:1: candidates file version 2")]
    [InlineData("{\"format\": \"study-network\", \"version\": 1, \"candidates\": [{\"id\": \"A\"}]}", ":1:1: 'format' is 'study-network'")]
    [InlineData("{\"format\": \"study-candidates\", \"version\": 1, \"candidates\": [\n{\"id\": \"A\"},\n{\"id\": \"A\"}]}", ":3: candidate id 'A' is used twice")]
    [InlineData("{\"format\": \"study-candidates\", \"version\": 1, \"candidates\": [{\"id\": \"A\", \"mva\": \"big\"}]}", ":1:")]
    [InlineData("{\"format\": \"study-candidates\", \"version\": 1, \"transformer\": \"GT1\", \"candidates\": [{\"id\": \"A\"}]}", ": the candidates file is for transformer GT1, not CQ-T1")]
    public void A_bad_candidates_file_exits_2_naming_the_file_and_where(string text, string message)
    {
        string file = CliRun.TempFile("offers.json", text);
        CliOutcome run = CliRun.Run(["choose", DemoNetworks.Demo, "--transformer", "CQ-T1", "--candidates", file, .. Rates]);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("offers.json" + message, run.Err);
        Assert.DoesNotContain("   at ", run.Err);
    }

    [Fact]
    public void A_candidate_whose_figures_cannot_be_is_infeasible_with_its_line()
    {
        string file = CliRun.TempFile("offers.json",
            "{\"format\": \"study-candidates\", \"version\": 1, \"candidates\": [\n  {\"id\": \"A\", \"mva\": 20, \"zPercent\": 1, \"loadLossKw\": 400, \"price\": 1}\n]}");
        CliOutcome run = CliRun.Run(["choose", DemoNetworks.Demo, "--transformer", "CQ-T1", "--candidates", file, .. Rates, "--json"]);
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("offers.json:2: candidate A: a load loss of 400.0 kW on 20.0 MVA is a resistance of 2.00 %, above its impedance 1.00 %", run.Out);
    }

    [Fact]
    public void Without_an_energy_basis_or_the_candidates_it_is_a_usage_error()
    {
        CliOutcome run = CliRun.Run("choose", DemoNetworks.Demo, "--transformer", "CQ-T1", "--candidates", Candidates);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--loss-load-factor", run.Err);
        run = CliRun.Run("choose", DemoNetworks.Demo, "--transformer", "CQ-T1", "--loss-load-factor", "0.3");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--candidates FILE is required", run.Err);
    }
}
