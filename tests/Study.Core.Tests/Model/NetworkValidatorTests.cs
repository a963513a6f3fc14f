// Whole-network validation: islands, every problem at once, per-unit cases, file lines, one-element checks.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class NetworkValidatorTests
{
    [Fact]
    public void An_island_without_any_source_is_an_error_listing_its_buses()
    {
        Network net = Clean();
        net = net with
        {
            Lines = net.Lines.Change(0, l => l with { InService = false }),
            Generators = [],
        };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Bus, "QUARREND", null!);
        Assert.Equal(Severity.Error, p.Severity);
        Assert.StartsWith("no source in the island containing buses QUARREND, MILL (2 buses)", p.Message);
    }

    [Fact]
    public void An_island_fed_only_by_a_pv_generator_has_no_slack()
    {
        Network net = Clean();
        net = net with { Lines = net.Lines.Change(0, l => l with { InService = false }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Bus, "QUARREND", null!);
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("no slack source in the island containing buses QUARREND, MILL (2 buses), which is fed only by G1", p.Message);
    }

    [Fact]
    public void Out_of_service_buses_form_no_island()
    {
        Network net = Clean();
        net = net with { Buses = [.. net.Buses, new Bus { Id = "SPARE", Kv = 33, InService = false }] };
        AssertClean(NetworkValidator.Validate(net));
    }

    [Fact]
    public void A_network_with_several_problems_reports_all_of_them_at_once()
    {
        Network net = Clean();
        net = net with
        {
            Buses = net.Buses.Change(1, b => b with { VMin = 1.1 }),
            Loads = net.Loads.Change(0, l => l with { Bus = "MILL2" }),
            Lines = net.Lines.Change(0, l => l with { Km = -1 }),
            Transformers = net.Transformers.Change(0, t => t with { HvKv = 132000 }),
            Generators = net.Generators.Change(0, g => g with { QMinMvar = 9 }),
            Scenarios = net.Scenarios.Change(0, s => s with { LoadScale = -1 }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.True(report.HasErrors);
        var found = report.Errors.Select(p => (p.Kind, p.ElementId, p.Field)).ToHashSet();
        Assert.Contains((ElementKind.Bus, "MAIN", "vMin"), found);
        Assert.Contains((ElementKind.Load, "L1", "bus"), found);
        Assert.Contains((ElementKind.Line, "F1", "km"), found);
        Assert.Contains((ElementKind.Transformer, "T1", "hvKv"), found);
        Assert.Contains((ElementKind.Generator, "G1", "qMinMvar"), found);
        Assert.Contains((ElementKind.Scenario, "peak", "loadScale"), found);
        Assert.Equal(6, report.Errors.Count());
    }

    [Fact]
    public void A_per_unit_only_case_with_base_kv_zero_is_clean()
    {
        Network net = PerUnitOnly();
        Assert.True(net.IsPerUnitOnly);
        AssertClean(NetworkValidator.Validate(net));
    }

    [Fact]
    public void Problems_of_a_parsed_file_carry_its_name_and_the_element_line()
    {
        const string json = """
            {
              "format": "study-network", "version": 1, "name": "Demo",
              "buses": [
                {"id": "GRID", "kv": 132},
                {"id": "MAIN", "kv": 33}
              ],
              "supplies": [{"id": "SUPPLY", "bus": "GRID", "scMvaMax": 3000}],
              "transformers": [
                {"id": "T1", "hv": "GRID", "lv": "MAIN",
                 "mva": 60, "hvKv": 132000, "lvKv": 33, "zPercent": 12.5, "xr": 25}
              ]
            }
            """;
        Network net = NetworkFile.Parse(json, "demo.study.json");
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T1", "hvKv");
        Assert.Equal("demo.study.json", p.File);
        Assert.Equal(9, p.Line);
        Assert.StartsWith("demo.study.json:9: error: transformer T1 (hvKv): ", p.Describe());
    }

    [Fact]
    public void A_hand_edited_file_with_a_null_entry_and_a_null_id_gets_problems_not_a_crash()
    {
        const string json = """
            {"format": "study-network", "version": 1,
             "buses": [{"id": "GRID", "kv": 132}, null, {"id": null, "kv": 33}],
             "supplies": [{"id": "SUPPLY", "bus": "GRID"}]}
            """;
        ValidationReport report = NetworkValidator.Validate(NetworkFile.Parse(json, "hand.study.json"));
        Assert.Contains(report.Errors, p => p.Message.StartsWith("entry 2 of buses is null", StringComparison.Ordinal));
        Assert.Contains(report.Errors, p => p.Message.StartsWith("entry 3 of buses has no id", StringComparison.Ordinal));
    }

    [Fact]
    public void Validating_one_element_gives_only_its_problems_by_the_same_rules()
    {
        Network net = Clean();
        net = net with
        {
            Transformers = net.Transformers.Change(0, t => t with { HvKv = 132000 }),
            Lines = [.. net.Lines, new Line { Id = "T2", From = "MAIN", To = "QUARREND", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0.002, X = 0.01 } }],
        };
        IReadOnlyList<Problem> t1 = NetworkValidator.ValidateElement(net, ElementKind.Transformer, "T1");
        Problem only = Assert.Single(t1);
        Assert.Equal(NetworkValidator.Validate(net).For(ElementKind.Transformer, "T1").Single(), only);

        IReadOnlyList<Problem> line = NetworkValidator.ValidateElement(net, ElementKind.Line, "T2");
        Problem duplicate = Assert.Single(line);
        Assert.Equal("id", duplicate.Field);
        Assert.Contains("already used by transformer entry 2 of transformers", duplicate.Message);
        Assert.Empty(NetworkValidator.ValidateElement(net, ElementKind.Bus, "MAIN"));
    }

    [Theory]
    [InlineData("harbour-estate.study.json")]
    [InlineData("harbour-estate-before.study.json")]
    public void The_bundled_example_networks_have_no_errors(string file)
    {
        Network net = NetworkFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", file));
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.False(report.HasErrors, report.Describe());
    }

    [Fact]
    public void Describe_leaves_out_the_parts_that_are_not_known()
    {
        var network = new Problem(Severity.Error, null, null, "baseMva", "baseMva is 0: the system base must be above 0 MVA");
        Assert.Equal("error: baseMva: baseMva is 0: the system base must be above 0 MVA", network.Describe());
        var warning = new Problem(Severity.Warning, ElementKind.ThreeWindingTransformer, "T3", null, "check it", "a.study.json");
        Assert.Equal("a.study.json: warning: three-winding transformer T3: check it", warning.Describe());
    }
}
