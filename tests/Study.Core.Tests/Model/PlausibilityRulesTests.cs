// Valid numbers far outside what plant has: unit slips and branches that should be bus merges are reported before any solve.
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class PlausibilityRulesTests
{
    [Fact]
    public void A_network_without_buses_is_an_error()
    {
        ValidationReport report = NetworkValidator.Validate(new Network());
        Problem p = Assert.Single(report.Errors);
        Assert.Equal("buses", p.Field);
        Assert.Contains("the network has no buses", p.Message);
    }

    [Theory]
    [InlineData(1e8, "it looks like VA, not MVA — did you mean 100?")]
    [InlineData(1e9, "it looks like VA, not MVA — did you mean 1000?")]
    [InlineData(50_000, "it looks like kVA, not MVA — did you mean 50?")]
    public void A_system_base_typed_in_va_or_kva_is_refused_with_the_base_it_likely_means(double baseMva, string hint)
    {
        // Per unit = MVA / baseMva (DEVELOPERS.md, Per-unit rules): a base 10^6 too large makes the 1e-8 pu
        // tolerance a whole MW on 100 MVA, so such a case "converges" without balancing.
        ValidationReport report = NetworkValidator.Validate(Clean() with { BaseMva = baseMva });
        Problem p = Assert.Single(report.Errors);
        Assert.Equal("baseMva", p.Field);
        Assert.Contains(hint, p.Message);
    }

    [Fact]
    public void A_small_bank_rated_in_kva_typed_as_mva_is_warned_by_its_lv_current()
    {
        // 1.6 MVA at 0.433 kV typed as 1600 MVA: I = S/(√3·U) = 1600/(1.732·0.433) ≈ 2133 kA, no winding carries that;
        // below the 5000 MVA that any unit tops, so the rating alone would pass.
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { Mva = 1600, LvKv = 0.433 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = report.Problems.Single(x => x.ElementId == "T2" && x.Field == "mva");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("2133 kA on the lv side", p.Message);
        Assert.Contains("is it in kVA?", p.Message);
    }

    [Fact]
    public void A_line_of_one_picohm_per_km_is_warned_as_a_bus_merge_before_any_solve()
    {
        Network net = Clean();
        net = net with { Lines = net.Lines.Change(0, l => l with { Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 1e-12, X = 1e-12 } }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = Single(report, ElementKind.Line, "F1", "z1");
        Assert.Equal(Severity.Warning, p.Severity);
        // |z| = √2·1e-12 Ω/km · 5.2 km / (33² / 100) Ω = 6.75e-13 pu (the per-unit rule, by hand).
        Assert.Contains("series impedance 6.753e-13 pu on the system base is next to nothing", p.Message);
        Assert.Contains("merge its two buses", p.Message);
    }

    [Fact]
    public void A_bank_of_a_billion_units_is_warned_twice_its_count_and_its_vanishing_impedance()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { Units = 1_000_000_000 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("units 1000000000 is more identical units than any bank has", Single(report, ElementKind.Transformer, "T2", "units").Message);
        // z = 0.08 · 100 / (20 · 1e9) = 4e-10 pu on the system base (base change, common practice).
        Assert.Contains("series impedance 4e-10 pu", Single(report, ElementKind.Transformer, "T2", "zPercent").Message);
        Assert.False(report.HasErrors, report.Describe());
    }

    [Fact]
    public void A_transformer_impedance_in_per_unit_where_percent_belongs_is_warned()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { ZPercent = 0.08 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T2", "zPercent");
        Assert.Contains("is it per unit rather than percent (0.08 pu = 8 %)?", p.Message);
    }

    [Fact]
    public void Line_data_in_milliohm_per_km_is_warned_with_the_likely_unit()
    {
        Network net = Clean();
        net = net with { Lines = net.Lines.Change(0, l => l with { Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 120, X = 380 } }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("is it in mΩ/km", Single(report, ElementKind.Line, "F1", "z1.x").Message);
        Assert.Contains("is it in mΩ/km", Single(report, ElementKind.Line, "F1", "z1.r").Message);
    }

    [Fact]
    public void A_line_to_a_bus_whose_kv_is_a_thousand_times_off_names_the_likely_unit_slip()
    {
        Network net = Clean();
        net = net with { Buses = net.Buses.Change(2, b => b with { Kv = 0.033 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = Single(report, ElementKind.Line, "F1", "to");
        Assert.Contains("probably in V or MV rather than kV", p.Message);
        // A thousand times off is a unit slip no study can use: an error for the line and the winding alike.
        Assert.Equal(Severity.Error, p.Severity);
        Problem hv = Single(report, ElementKind.Transformer, "T2", "hvKv");
        Assert.Equal(Severity.Error, hv.Severity);
        Assert.Contains("probably in V or MV rather than kV", hv.Message);
    }

    [Fact]
    public void A_generator_rated_at_another_voltage_than_its_bus_is_warned()
    {
        Network net = Clean();
        net = net with { Generators = net.Generators.Change(0, g => g with { Kv = 33 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Generator, "G1", "kv");
        Assert.Contains("rated kV 33 differs from bus MILL (11 kV) by 200 %", p.Message);
    }

    [Theory]
    [InlineData(1e300, "1e+300")]
    [InlineData(1.23456789e-9, "1.235e-9")]
    [InlineData(51507.542868, "51507.54")]
    [InlineData(0.415, "0.415")]
    public void Numbers_in_messages_are_rounded_so_a_unit_slip_reads_as_a_number(double value, string shown)
    {
        Assert.Equal(shown, Numbers.Show(value));
    }

    [Fact]
    public void A_bus_kv_of_ten_to_the_three_hundred_is_shown_in_a_dozen_characters()
    {
        Network net = Clean();
        net = net with { Buses = net.Buses.Change(3, b => b with { Kv = 1e300 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Bus, "MILL", "kv");
        Assert.Equal("kv 1e+300 looks like volts: did you mean 1e+297 kV?", p.Message);
    }
}
