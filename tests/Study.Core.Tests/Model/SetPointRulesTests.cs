// Set points that contradict each other: which one governs, and when the result would be undefined.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Units;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class SetPointRulesTests
{
    [Fact]
    public void Two_supplies_on_one_bus_holding_different_voltages_are_an_error_naming_both()
    {
        Network net = Clean();
        net = net with { Supplies = [.. net.Supplies, net.Supplies[0] with { Id = "SUPPLY2", VSet = 1.05 }] };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = Single(report, ElementKind.Supply, "SUPPLY2", "vSet");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("supply SUPPLY and supply SUPPLY2 on bus GRID are both slack sources with different set points (1 pu and 1.05 pu)", p.Message);
    }

    [Fact]
    public void Two_supplies_on_one_bus_at_different_angles_are_an_error()
    {
        Network net = Clean();
        net = net with { Supplies = [.. net.Supplies, net.Supplies[0] with { Id = "SUPPLY2", AngleDeg = 10 }] };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Supply, "SUPPLY2", "angleDeg");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("1 pu at 0° and 1 pu at 10°", p.Message);
    }

    [Fact]
    public void Two_voltage_controlling_generators_on_one_bus_warn_that_the_first_governs()
    {
        Network net = Clean();
        net = net with { Generators = [.. net.Generators, net.Generators[0] with { Id = "G2", VSet = 1.03 }] };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = Single(report, ElementKind.Generator, "G2", "vSet");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("generator G1 and generator G2 on bus MILL hold different voltages (1.01 and 1.03 pu): generator G1 governs", p.Message);
        // The load flow does what the warning says: the bus sits at G1's set point.
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(net));
        Assert.True(r.Converged, r.Message);
        Assert.Equal(1.01, r.Buses.Single(b => b.Id == "MILL").VPu, 6);
    }

    [Fact]
    public void A_generator_holding_voltage_on_a_supplys_bus_warns_that_the_supply_governs()
    {
        Network net = Clean();
        net = net with { Generators = [.. net.Generators, new Generator { Id = "G9", Bus = "GRID", Mode = GeneratorMode.Pv, PMw = 5, VSet = 1.04 }] };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Generator, "G9", "vSet");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("supply SUPPLY governs (a slack source holds its bus), so G9's vSet is not used", p.Message);
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(net));
        Assert.Equal(1.0, r.Buses.Single(b => b.Id == "GRID").VPu, 9);
    }

    [Fact]
    public void Two_slack_buses_in_one_island_warn_with_the_reference_and_the_angle_difference()
    {
        Network net = Clean();
        net = net with { Supplies = [.. net.Supplies, new Supply { Id = "SUPPLY2", Bus = "QUARREND", AngleDeg = 5, ScMvaMax = 500 }] };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = Single(report, ElementKind.Supply, "SUPPLY2", "bus");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("2 slack buses in one island: supply SUPPLY at bus GRID and supply SUPPLY2 at bus QUARREND; their angles differ by 5°", p.Message);
        Assert.Contains("SUPPLY is the angle reference", p.Message);
    }

    [Fact]
    public void Equal_set_points_on_one_bus_are_not_a_conflict()
    {
        Network net = Clean();
        net = net with { Generators = [.. net.Generators, net.Generators[0] with { Id = "G2" }] };
        Assert.DoesNotContain(NetworkValidator.Validate(net).Problems, p => p.ElementId == "G2");
    }
}
