// `study fault` with the duty figures and `study start`: the documented JSON shapes, the options, the caution.
using System.Text.Json;
using Study.Core.Faults;

namespace Study.App.Tests.Cli;

public sealed class DutyAndStartCommandTests
{
    [Fact]
    public void Fault_json_gives_the_breaking_and_thermal_figures_and_every_check_of_every_breaker()
    {
        CliOutcome run = CliRun.Run("fault", DemoNetworks.Demo, "--json", "--tmin", "0.05", "--duration", "0.5");
        Assert.Equal(0, run.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(run.Out);
        JsonElement root = doc.RootElement;
        Assert.Equal(FaultStudy.Caution, root.GetProperty("caution").GetString());
        Assert.Equal(0.05, root.GetProperty("tMinS").GetDouble());
        Assert.Equal(0.5, root.GetProperty("tkS").GetDouble());
        JsonElement fault = root.GetProperty("faults")[0];
        foreach (string key in new[] { "bus", "kv", "type", "ikKa", "skMva", "xOverR", "kappa", "ipKa", "ibKa", "idcKa", "ibAsymKa",
                     "ikSteadyKa", "ithKa", "z1Ohm", "z2Ohm", "z0Ohm", "contributions" })
            Assert.True(fault.TryGetProperty(key, out _), $"fault lacks {key}");
        JsonElement breaker = root.GetProperty("breakers").EnumerateArray().Single(b => b.GetProperty("id").GetString() == "CB-CS11");
        foreach (string key in new[] { "id", "bus", "branch", "dutyPercent", "status", "checks" })
            Assert.True(breaker.TryGetProperty(key, out _), $"breaker lacks {key}");
        Assert.Equal("CQ-CS", breaker.GetProperty("branch").GetString());
        Assert.Equal(["breaking", "breakingAsym", "making", "shortTime"],
            breaker.GetProperty("checks").EnumerateArray().Select(c => c.GetProperty("check").GetString()));
        foreach (JsonElement check in breaker.GetProperty("checks").EnumerateArray())
            foreach (string key in new[] { "check", "requiredKa", "ratedKa", "dutyPercent", "status" })
                Assert.True(check.TryGetProperty(key, out _), $"check lacks {key}");
        // The cold store board: its motors' contribution decays, so I_b is below I''k at 3ph and equal for an earth fault.
        JsonElement cs3 = root.GetProperty("faults").EnumerateArray().Single(f => f.GetProperty("bus").GetString() == "CS11" && f.GetProperty("type").GetString() == "3ph");
        Assert.True(cs3.GetProperty("ibKa").GetDouble() < cs3.GetProperty("ikKa").GetDouble());
        Assert.True(cs3.GetProperty("ikSteadyKa").GetDouble() < cs3.GetProperty("ikKa").GetDouble());
        JsonElement csE = root.GetProperty("faults").EnumerateArray().Single(f => f.GetProperty("bus").GetString() == "CS11" && f.GetProperty("type").GetString() == "slg");
        Assert.Equal(csE.GetProperty("ikKa").GetDouble(), csE.GetProperty("ibKa").GetDouble());
    }

    [Fact]
    public void The_conservative_breaking_current_is_the_initial_current_everywhere()
    {
        using JsonDocument doc = JsonDocument.Parse(CliRun.Run("fault", DemoNetworks.Demo, "--json", "--ib", "conservative").Out);
        Assert.Equal("conservative", doc.RootElement.GetProperty("breakingCurrent").GetString());
        Assert.All(doc.RootElement.GetProperty("faults").EnumerateArray(),
            f => Assert.Equal(f.GetProperty("ikKa").GetDouble(), f.GetProperty("ibKa").GetDouble()));
    }

    [Theory]
    [InlineData(new[] { "--line-temp", "100" }, "give it with --min")]
    [InlineData(new[] { "--ib", "sometimes" }, "--ib is decay or conservative")]
    [InlineData(new[] { "--tmin", "0" }, "the minimum time delay t_min 0 s is outside")]
    [InlineData(new[] { "--duration", "soon" }, "--duration needs a number")]
    [InlineData(new[] { "--min", "--line-temp", "900" }, "the line temperature 900 °C is outside")]
    public void A_bad_duty_option_is_an_input_error_in_plain_words(string[] options, string message)
    {
        CliOutcome run = CliRun.Run(["fault", DemoNetworks.Demo, .. options]);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains(message, run.Err);
    }

    [Fact]
    public void Fault_report_lists_each_breaker_check_on_its_own_line_after_the_caution()
    {
        CliOutcome run = CliRun.Run("fault", DemoNetworks.Demo, "--min");
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("CAUTION: ", run.Out);
        Assert.Contains("Breaking and thermal currents", run.Out);
        Assert.Contains("line resistance at 80 °C", run.Out);
        Assert.Contains("breaking asym.", run.Out);
        Assert.Contains("short-time I_th", run.Out);
    }

    [Fact]
    public void Start_json_has_the_documented_shape_and_the_caution()
    {
        CliOutcome run = CliRun.Run("start", DemoNetworks.Demo, "--motor", "M-CS-COMP", "--watch", "CQ11", "--json");
        Assert.Equal(0, run.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(run.Out);
        JsonElement root = doc.RootElement;
        Assert.Equal(FaultStudy.Caution, root.GetProperty("caution").GetString());
        Assert.Equal(["M-CS-COMP"], root.GetProperty("motors").EnumerateArray().Select(m => m.GetString()));
        foreach (string key in new[] { "id", "beforePu", "duringPu", "dipPercent" })
            Assert.True(root.GetProperty("buses")[0].TryGetProperty(key, out _), $"bus lacks {key}");
        double terminal = root.GetProperty("motorTerminalPu").GetDouble();
        JsonElement cs = root.GetProperty("buses").EnumerateArray().Single(b => b.GetProperty("id").GetString() == "CS11");
        Assert.Equal(cs.GetProperty("duringPu").GetDouble(), terminal);
        Assert.Equal(terminal >= 0.8, root.GetProperty("ok").GetBoolean());
        Assert.Equal(0.8, root.GetProperty("minTerminalPu").GetDouble());
    }

    [Fact]
    public void Start_report_and_markdown_state_the_caution_before_any_number()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("start", DemoNetworks.Demo, "--motor", "M-PS-PUMP", "--min-terminal-pu", "0.85", "--markdown", dir.File("start.md"));
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("CAUTION: ", run.Out);
        Assert.Contains("Finding: every started motor gets at least 0.85 pu", run.Out);
        Assert.Contains("autotransformer", run.Out);
        string md = File.ReadAllText(dir.File("start.md"));
        Assert.InRange(md.IndexOf("CAUTION: ", StringComparison.Ordinal), 0, md.IndexOf("\n|", StringComparison.Ordinal));
        // The started motor (motor, bus, starter, terminal, verdict, current kA and × rated), then every bus.
        Assert.Equal([(7, 1), (5, 10)], ReportChecks.MarkdownTables(md));
    }

    [Theory]
    [InlineData(new[] { "--motor", "M-CS-COMPRESSOR" }, "no motor with id M-CS-COMPRESSOR")]
    [InlineData(new[] { "--motor", "M-CS-COMP", "--min-terminal-pu", "80" }, "is not in per unit")]
    [InlineData(new[] { "--motor", "M-CS-COMP", "--watch", "NOWHERE" }, "watched bus NOWHERE is not in the network")]
    [InlineData(new string[0], "--motor ID is required")]
    public void A_bad_start_request_is_an_input_error(string[] options, string message)
    {
        CliOutcome run = CliRun.Run(["start", DemoNetworks.Demo, .. options]);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains(message, run.Err);
        Assert.DoesNotContain("   at ", run.Err);
    }
}
