// Ids unique within their family, and bus references that name real buses.
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class IdAndReferenceRulesTests
{
    [Fact]
    public void The_clean_example_network_has_no_problems()
    {
        AssertClean(NetworkValidator.Validate(Clean()));
    }

    [Fact]
    public void A_generator_with_the_id_of_a_supply_is_a_duplicate_source_id()
    {
        Network net = Clean();
        net = net with { Generators = net.Generators.Change(0, g => g with { Id = "SUPPLY" }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Generator, "SUPPLY", "id");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("supply entry 1 of supplies", p.Message);
        Assert.StartsWith("error: generator SUPPLY (id): ", p.Describe());
    }

    [Fact]
    public void Elements_of_different_families_may_share_an_id()
    {
        Network net = Clean();
        net = net with { Loads = net.Loads.Change(0, l => l with { Id = "T1" }) };
        AssertClean(NetworkValidator.Validate(net));
    }

    [Fact]
    public void An_empty_bus_id_and_a_repeated_scenario_name_are_both_errors()
    {
        Network net = Clean();
        net = net with
        {
            Buses = [.. net.Buses, new Bus { Id = "", Kv = 33 }],
            Scenarios = [.. net.Scenarios, new Scenario { Name = "peak", LoadScale = 1.1 }],
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem empty = Single(report, ElementKind.Bus, null!, "id");
        Assert.Contains("entry 5 of buses has no id", empty.Message);
        Problem repeated = Single(report, ElementKind.Scenario, "peak", "name");
        Assert.Contains("name 'peak' is already used", repeated.Message);
    }

    [Fact]
    public void A_dangling_reference_names_the_missing_bus_and_suggests_a_near_id()
    {
        Network net = Clean();
        net = net with { Loads = net.Loads.Change(0, l => l with { Bus = "mill" }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Load, "L1", "bus");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("'mill', which is not in the network: did you mean 'MILL'?", p.Message);
    }

    [Fact]
    public void A_dangling_line_end_and_regulated_bus_are_each_reported()
    {
        Network net = Clean();
        net = net with
        {
            Lines = net.Lines.Change(0, l => l with { To = "QUAREND" }),
            Transformers = net.Transformers.Change(0, t => t with { Tap = t.Tap! with { Regulate = t.Tap.Regulate! with { Bus = "NOWHERE" } } }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("'QUAREND'", Single(report, ElementKind.Line, "F1", "to").Message);
        Assert.Contains("did you mean 'QUARREND'?", Single(report, ElementKind.Line, "F1", "to").Message);
        Problem tap = Single(report, ElementKind.Transformer, "T1", "tap.regulate.bus");
        Assert.Contains("'NOWHERE'", tap.Message);
        Assert.DoesNotContain("did you mean", tap.Message);
    }

    [Fact]
    public void A_line_from_a_bus_to_itself_is_an_error()
    {
        Network net = Clean();
        net = net with { Lines = net.Lines.Change(0, l => l with { To = "MAIN" }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Line, "F1", "to");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("from and to are both bus 'MAIN'", p.Message);
    }

    [Fact]
    public void A_breaker_on_a_missing_bus_and_one_without_ratings_are_reported()
    {
        Network net = Clean();
        net = net with
        {
            Breakers = [.. net.Breakers, new Breaker { Id = "CB2", Bus = "GRIDD" }, new Breaker { Id = "CB3", Bus = "MAIN" }],
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("did you mean 'GRID'?", Single(report, ElementKind.Breaker, "CB2", "bus").Message);
        Problem unrated = Single(report, ElementKind.Breaker, "CB3", "interruptingKa");
        Assert.Equal(Severity.Warning, unrated.Severity);
        Assert.Contains("no rating: duty not checked", unrated.Message);
    }
}
