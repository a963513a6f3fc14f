// Bus voltage bands and kV, supply fault levels, generator limits and set points, loads, scenarios.
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class BusAndSourceRulesTests
{
    [Fact]
    public void A_bus_kv_given_in_volts_is_an_error_suggesting_kv()
    {
        Network net = Clean();
        net = net with { Buses = net.Buses.Change(3, b => b with { Kv = 11000 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Bus, "MILL", "kv");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Equal("kv 11000 looks like volts: did you mean 11 kV?", p.Message);
    }

    [Fact]
    public void A_negative_bus_kv_is_an_error()
    {
        Network net = Clean();
        net = net with { Buses = net.Buses.Change(1, b => b with { Kv = -33 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Bus, "MAIN", "kv");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("-33", p.Message);
    }

    [Fact]
    public void An_empty_voltage_band_is_an_error_and_a_band_in_percent_a_warning()
    {
        Network net = Clean();
        net = net with
        {
            Buses = net.Buses
                .Change(1, b => b with { VMin = 1.05, VMax = 0.95 })
                .Change(2, b => b with { VMax = 105 }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem empty = Single(report, ElementKind.Bus, "MAIN", "vMin");
        Assert.Equal(Severity.Error, empty.Severity);
        Assert.Contains("vMin 1.05 pu is not below vMax 0.95 pu", empty.Message);
        Problem percent = Single(report, ElementKind.Bus, "QUARREND", "vMax");
        Assert.Equal(Severity.Warning, percent.Severity);
        Assert.Contains("105", percent.Message);
    }

    [Fact]
    public void Not_a_number_anywhere_is_an_error_naming_the_key()
    {
        Network net = Clean();
        net = net with
        {
            Buses = net.Buses.Change(0, b => b with { VMin = double.NaN }),
            Lines = net.Lines.Change(0, l => l with { Z1 = l.Z1! with { X = double.PositiveInfinity } }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Equal("vMin is NaN: give a finite number", Single(report, ElementKind.Bus, "GRID", "vMin").Message);
        Assert.Contains("z1.x is Infinity", Single(report, ElementKind.Line, "F1", "z1.x").Message);
    }

    [Fact]
    public void Supply_minimum_fault_level_above_maximum_and_zero_xr_are_errors()
    {
        Network net = Clean();
        net = net with { Supplies = net.Supplies.Change(0, s => s with { ScMvaMin = 3500, Xr = 0 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("scMvaMin 3500 MVA is above scMvaMax 3000 MVA", Single(report, ElementKind.Supply, "SUPPLY", "scMvaMin").Message);
        Assert.Equal(Severity.Error, Single(report, ElementKind.Supply, "SUPPLY", "xr").Severity);
    }

    [Fact]
    public void Generator_q_limits_crossed_are_an_error_and_a_set_point_in_kv_a_warning()
    {
        Network net = Clean();
        net = net with { Generators = net.Generators.Change(0, g => g with { QMinMvar = 6, QMaxMvar = 5, VSet = 11 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem q = Single(report, ElementKind.Generator, "G1", "qMinMvar");
        Assert.Equal(Severity.Error, q.Severity);
        Assert.Contains("qMinMvar 6 Mvar is above qMaxMvar 5 Mvar", q.Message);
        Problem v = Single(report, ElementKind.Generator, "G1", "vSet");
        Assert.Equal(Severity.Warning, v.Severity);
        Assert.Contains("vSet 11 pu", v.Message);
    }

    [Fact]
    public void A_pq_generator_set_point_is_not_checked_because_it_holds_no_voltage()
    {
        Network net = Clean();
        net = net with { Generators = net.Generators.Change(0, g => g with { Mode = GeneratorMode.Pq, VSet = 11 }) };
        AssertClean(NetworkValidator.Validate(net));
    }

    [Fact]
    public void Zip_shares_that_do_not_sum_to_one_are_an_error()
    {
        Network net = Clean();
        net = net with { Loads = net.Loads.Change(0, l => l with { Zip = new ZipMix { Z = 0.5, I = 0.2, P = 0.2 } }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Load, "L1", "zip");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("sum to 0.9, not 1", p.Message);
    }

    [Fact]
    public void A_negative_zip_share_is_an_error_even_when_the_sum_is_one()
    {
        Network net = Clean();
        net = net with { Loads = net.Loads.Change(0, l => l with { Zip = new ZipMix { Z = -0.5, I = 0.5, P = 1 } }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Load, "L1", "zip");
        Assert.Contains("negative share", p.Message);
    }

    [Fact]
    public void A_negative_load_scale_is_an_error_and_no_scenarios_is_fine()
    {
        Network net = Clean();
        Problem p = Single(NetworkValidator.Validate(net with { Scenarios = net.Scenarios.Change(1, s => s with { LoadScale = -0.35 }) }),
            ElementKind.Scenario, "light", "loadScale");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("-0.35", p.Message);
        AssertClean(NetworkValidator.Validate(net with { Scenarios = [] }));
    }

    [Fact]
    public void Negative_ratings_are_errors()
    {
        Network net = Clean();
        net = net with
        {
            Lines = net.Lines.Change(0, l => l with { RatingMva = -30 }),
            Transformers = net.Transformers.Change(1, t => t with { Units = 0, Mva = -20 }),
            Breakers = net.Breakers.Change(0, b => b with { InterruptingKa = -25 }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Equal(Severity.Error, Single(report, ElementKind.Line, "F1", "ratingMva").Severity);
        Assert.Contains("units is 0", Single(report, ElementKind.Transformer, "T2", "units").Message);
        Assert.Contains("mva is -20", Single(report, ElementKind.Transformer, "T2", "mva").Message);
        Assert.Contains("interruptingKa is -25", Single(report, ElementKind.Breaker, "CB1", "interruptingKa").Message);
    }
}
