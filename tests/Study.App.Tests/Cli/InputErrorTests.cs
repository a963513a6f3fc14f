// Bad input gives exit code 2 and a message a user can act on, never a stack trace.
namespace Study.App.Tests.Cli;

public class InputErrorTests
{
    private const string Good = """
        {
          "format": "study-network",
          "version": 1,
          "name": "Input error check",
          "buses": [
            {"id": "HV", "kv": 132},
            {"id": "MV", "kv": 33}
          ],
          "supplies": [{"id": "GRID", "bus": "HV", "scMvaMax": 3000, "xr": 12}],
          "transformers": [
            {"id": "T1", "hv": "HV", "lv": "MV", "mva": 45, "hvKv": 132, "lvKv": 33, "zPercent": 12.5, "xr": 30, "vectorGroup": "Dyn1"}
          ],
          "loads": [{"id": "L1", "bus": "MV", "pMw": 10, "qMvar": 3}]
        }
        """;

    [Fact]
    public void A_clean_network_checks_clean_and_solves()
    {
        string path = CliRun.TempFile("good.study.json", Good);
        CliOutcome check = CliRun.Run("check", path);
        Assert.Equal(0, check.ExitCode);
        Assert.Contains("clean", check.Out);
        Assert.Equal(0, CliRun.Run("solve", path).ExitCode);
    }

    [Fact]
    public void Malformed_json_exits_2_with_file_line_and_column()
    {
        string path = CliRun.TempFile("broken.study.json", Good.Replace("\"kv\": 33}", "\"kv\": 33"));
        CliOutcome r = CliRun.Run("check", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Matches(@"broken\.study\.json:\d+:\d+: ", r.Err);
        Assert.DoesNotContain("   at ", r.Err);
    }

    [Fact]
    public void A_dangling_bus_reference_exits_2_naming_the_element_and_the_missing_bus()
    {
        string path = CliRun.TempFile("dangling.study.json", Good.Replace("\"bus\": \"MV\", \"pMw\"", "\"bus\": \"MV2\", \"pMw\""));
        CliOutcome r = CliRun.Run("check", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("L1", r.Out);
        Assert.Contains("MV2", r.Out);
        CliOutcome solve = CliRun.Run("solve", path);
        Assert.Equal(2, solve.ExitCode);
        Assert.Contains("MV2", solve.Err);
    }

    [Fact]
    public void A_transformer_entered_in_volts_exits_2_suggesting_kv()
    {
        string path = CliRun.TempFile("volts.study.json", Good.Replace("\"hvKv\": 132,", "\"hvKv\": 132000,"));
        CliOutcome r = CliRun.Run("check", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("T1", r.Out);
        Assert.Contains("132 kV", r.Out);
    }

    [Fact]
    public void An_unknown_option_or_command_exits_2()
    {
        Assert.Equal(2, CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"), "--tolerence", "1e-6").ExitCode);
        Assert.Equal(2, CliRun.Run("sovle", "x").ExitCode);
        CliOutcome missing = CliRun.Run("solve", "no-such-file.study.json");
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("no-such-file.study.json", missing.Err);
    }

    [Fact]
    public void Convert_of_ieee14_gives_a_network_file_that_checks_clean()
    {
        string dir = Directory.CreateTempSubdirectory("study-convert").FullName;
        string output = Path.Combine(dir, "ieee14.study.json");
        Assert.Equal(0, CliRun.Run("convert", CliRun.Network("ieee14cdf.txt"), output).ExitCode);
        CliOutcome check = CliRun.Run("check", output);
        Assert.Equal(0, check.ExitCode);
        Assert.Contains("clean", check.Out);
    }

    [Fact]
    public void Taps_refuses_bad_requests_with_exit_2()
    {
        string demo = CliRun.Network("harbour-estate.study.json");
        CliOutcome unknown = CliRun.Run("taps", demo, "--transformer", "NOPE");
        Assert.Equal(2, unknown.ExitCode);
        Assert.Contains("NOPE", unknown.Err);
        CliOutcome band = CliRun.Run("taps", demo, "--transformer", "CQ-T1", "--band", "1.03,0.97");
        Assert.Equal(2, band.ExitCode);
        Assert.Contains("the band 1.03..0.97 is empty", band.Err);
        string path = CliRun.TempFile("notap.study.json", Good);
        CliOutcome noTap = CliRun.Run("taps", path, "--transformer", "T1");
        Assert.Equal(2, noTap.ExitCode);
        Assert.Contains("no tap changer", noTap.Err);
    }
}
