// --markdown and --csv on solve and taps: one report, rendered as plain text on the terminal and as Markdown in a file.
using Study.App.Cli;
using Study.App.Reports;

namespace Study.App.Tests.Cli;

public class ReportCommandsTests
{
    [Fact]
    public void Solve_markdown_holds_the_same_tables_as_the_terminal_report_and_lists_the_inputs()
    {
        using var dir = new TempDirectory();
        // The folder must exist: output never creates folders (InputSafetyTests).
        Directory.CreateDirectory(dir.File("notes"));
        string md = dir.File("notes/solve.md");
        CliOutcome run = CliRun.Run("solve", DemoNetworks.Demo, "--scenario", "winter-peak", "--markdown", md);
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("Load flow: ", run.Out);
        Assert.Contains("\nBuses (10)   ▼ below vMin, ▲ above vMax\n  bus ", run.Out);
        Assert.Empty(dir.Leftovers());

        string text = File.ReadAllText(md);
        Assert.StartsWith("# Load flow: ", text);
        Assert.Contains("- **scenario:** scenario winter-peak", text);
        Assert.Contains("- **options:** Newton-Raphson, tolerance 1.0e-8 pu", text);
        Assert.Contains("## Violations (0)", text);
        var tables = ReportChecks.MarkdownTables(text);
        Assert.Equal([(11, 10), (13, 11), (5, 5)], tables);
    }

    [Fact]
    public void Taps_csv_and_markdown_carry_every_position_in_every_scenario()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("taps", DemoNetworks.Demo, "--transformer", "CQ-T1", "--csv", dir.Path, "--markdown", dir.File("taps.md"));
        Assert.Equal(0, run.ExitCode);
        Assert.Equal(["position", "ratio", "scenario", "converged", "solvedFromFlatStart", "lowVoltage", "CQ11.vPu", "CS11.vPu", "PS11.vPu",
            "vMinPu", "vMinBus", "vMaxPu", "vMaxBus", "lossMw", "violations", "marginPu"], ReportChecks.CsvHeader(dir.File("positions.csv")));
        Assert.Equal(1 + 5 * 2, File.ReadAllLines(dir.File("positions.csv")).Length);
        Assert.Equal(["rank", "position", "marginPu"], ReportChecks.CsvHeader(dir.File("recommended.csv")));
        string text = File.ReadAllText(dir.File("taps.md"));
        Assert.Contains("```text\nWatched voltage against position", text);
        // position, ratio, scenario, three watched buses, then seven system columns; 5 positions × 2 scenarios.
        Assert.Contains((13, 10), ReportChecks.MarkdownTables(text));
    }

    [Fact]
    public void Fault_markdown_states_the_caution_before_any_table_and_gives_levels_and_duty_as_pipe_tables()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("fault", DemoNetworks.Demo, "--markdown", dir.File("fault.md"));
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("CAUTION: ", run.Out);
        string text = File.ReadAllText(dir.File("fault.md"));
        int caution = text.IndexOf("CAUTION: ", StringComparison.Ordinal);
        Assert.InRange(caution, 0, text.IndexOf("\n|", StringComparison.Ordinal));
        Assert.InRange(caution, 0, text.IndexOf("I''k", StringComparison.Ordinal));
        Assert.Contains("- **method:** IEC 60909", text);
        Assert.DoesNotContain("```", text);
        // Levels: bus, kV, type, I''k, S''k, 3I0, X/R, kappa, ip, Z1, Z0 for 10 buses × (3ph, slg); the breaking and
        // thermal currents (bus, type, I''k, I_b, i_DC, DC %, I_b,asym, I_k, I_th); then one row per breaker and one per check.
        var tables = ReportChecks.MarkdownTables(text);
        Assert.Equal(4, tables.Count);
        Assert.Equal((11, 20), tables[0]);
        Assert.Equal((9, 20), tables[1]);
        Assert.Equal((10, 19), tables[2]);
        Assert.Equal((9, 4 * 19), tables[3]);
        Assert.Contains("| bus | kV | type | I''k kA | S''k MVA |", text);
    }

    [Fact]
    public void Fault_markdown_for_chosen_buses_adds_phase_voltages_and_contributions_as_tables()
    {
        using var dir = new TempDirectory();
        CliOutcome run = CliRun.Run("fault", DemoNetworks.Demo, "--bus", "CQ11", "--markdown", dir.File("fault.md"));
        Assert.Equal(0, run.ExitCode);
        string text = File.ReadAllText(dir.File("fault.md"));
        var tables = ReportChecks.MarkdownTables(text);
        // Levels and their breaking and thermal currents; per fault type a phase-voltage table (bus, Va, Vb, Vc) and a
        // contribution table, and for the three-phase fault the machines' own currents and decay; then breakers and their checks.
        Assert.Equal(2 + 3 + 2 + 2, tables.Count);
        Assert.Equal((11, 2), tables[0]);
        Assert.Equal((9, 2), tables[1]);
        Assert.Equal(4, tables[2].Columns);
        Assert.Equal(4, tables[3].Columns);
        Assert.Equal((8, 4), tables[4]);
        Assert.Contains("## slg at CQ11: phase voltages after the fault (pu)", text);
        Assert.InRange(text.IndexOf("CAUTION: ", StringComparison.Ordinal), 0, text.IndexOf("\n|", StringComparison.Ordinal));
    }

    [Fact]
    public void Markdown_escapes_markup_in_cells_so_columns_stay_aligned()
    {
        var spec = new ColumnSpec<(string Id, double Value)>().Text("id", "id", r => r.Id).Number("value", "value", null, r => r.Value, 1);
        var doc = new ReportDocument("ids with markup").Table(spec, [("LD_A|B*", 1.0)]);
        string md = MarkdownReport.Render(doc);
        Assert.Equal([(2, 1)], ReportChecks.MarkdownTables(md));
        Assert.Contains(@"LD\_A\|B\*", md);
        Assert.Equal("ids with markup\n  id       value\n  -------  -----\n  LD_A|B*    1.0\n", PlainTextReport.Render(doc));
    }
}
