// Line and transformer data: impedance forms, zero and negative impedance, rated kV against buses, taps.
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class BranchRulesTests
{
    [Fact]
    public void A_transformer_hv_kv_entered_in_volts_suggests_132_kv()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { HvKv = 132000 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T1", "hvKv");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("did you mean 132 kV?", p.Message);
        Assert.Equal("error: transformer T1 (hvKv): hvKv 132000 looks like volts: did you mean 132 kV?", p.Describe());
    }

    [Theory]
    [InlineData("Dyn 11", "clock number")]
    [InlineData("dyn11", "capitals")]
    [InlineData("DYN11", "small letters")]
    [InlineData("Dyn13", "outside 0 to 11")]
    [InlineData("YNyn0d1", "two windings")]
    public void A_vector_group_that_is_not_IEC_60076_1_notation_is_an_error_naming_why(string group, string why)
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { VectorGroup = group }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T1", "vectorGroup");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains($"vector group '{group}' is not IEC 60076-1 notation", p.Message);
        Assert.Contains(why, p.Message);
        // The notation itself, from IEC 60076-1 (from memory): Dyn11, YNd1 and Yzn11 read.
        foreach (string good in new[] { "Dyn11", "YNd1", "Yzn11" })
        {
            Network ok = Clean();
            ok = ok with { Transformers = ok.Transformers.Change(0, t => t with { VectorGroup = good }) };
            Assert.DoesNotContain(NetworkValidator.Validate(ok).Problems, x => x.Field == "vectorGroup");
        }
    }

    [Fact]
    public void Rated_kv_of_the_other_side_is_reported_as_likely_swapped_sides()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { HvKv = 33, LvKv = 132 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem hv = Single(report, ElementKind.Transformer, "T1", "hvKv");
        Assert.Equal(Severity.Warning, hv.Severity);
        Assert.Contains("likely swapped sides: hvKv 33 kV matches lv bus MAIN (33 kV), not hv bus GRID (132 kV)", hv.Message);
        Problem lv = Single(report, ElementKind.Transformer, "T1", "lvKv");
        Assert.Contains("likely swapped sides: lvKv 132 kV matches hv bus GRID (132 kV), not lv bus MAIN (33 kV)", lv.Message);
        Assert.False(report.HasErrors, report.Describe());
    }

    [Fact]
    public void An_hv_rating_below_the_lv_rating_is_a_warning()
    {
        Network net = Clean();
        net = net with
        {
            Buses = [.. net.Buses, new Bus { Id = "UNIT", Kv = 11 }],
            Transformers = [.. net.Transformers, new Transformer { Id = "GT", Hv = "UNIT", Lv = "MILL", Mva = 12, HvKv = 10.5, LvKv = 11, ZPercent = 10, Xr = 20 }],
        };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "GT", "hvKv");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("hvKv 10.5 kV is below lvKv 11 kV: sides swapped?", p.Message);
    }

    [Fact]
    public void Rated_kv_far_from_the_bus_base_kv_gives_the_difference_in_percent()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { HvKv = 66 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T2", "hvKv");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("rated kV 66 differs from bus base kV 33 (bus QUARREND) by 100 %", p.Message);
    }

    [Fact]
    public void Rated_kv_about_1000_times_the_bus_base_kv_is_an_error_naming_the_unit_slip()
    {
        // 11 kV typed as 0.011 (MV) on an 11 kV bus: a ratio a thousand times off, which no study can use.
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { LvKv = 0.011 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T2", "lvKv");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("rated kV 0.011 against bus base kV 11", p.Message);
        Assert.Contains("probably in V or MV rather than kV", p.Message);
    }

    [Fact]
    public void Nameplate_and_ohm_data_on_a_bus_without_base_kv_are_errors()
    {
        Network net = Clean();
        net = net with { Buses = net.Buses.Change(2, b => b with { Kv = 0 }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("bus QUARREND states no base kV", Single(report, ElementKind.Line, "F1", "to").Message);
        Assert.Contains("bus QUARREND states no base kV", Single(report, ElementKind.Transformer, "T2", "hv").Message);
    }

    [Fact]
    public void A_line_with_no_impedance_or_per_km_data_without_a_length_is_an_error()
    {
        Network net = Clean();
        net = net with
        {
            Lines =
            [
                .. net.Lines,
                new Line { Id = "F2", From = "MAIN", To = "QUARREND", RatingMva = 20 },
                new Line { Id = "F3", From = "MAIN", To = "QUARREND", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.3 } },
            ],
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("gives no impedance", Single(report, ElementKind.Line, "F2", "z1").Message);
        Assert.Contains("z1 is given per km but the line has no km", Single(report, ElementKind.Line, "F3", "km").Message);
    }

    [Fact]
    public void A_transformer_with_nameplate_and_per_unit_data_is_an_error()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { XPu = 0.4 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T2", "xPu");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("nameplate (mva, zPercent, xr) and per unit (xPu)", p.Message);
    }

    [Fact]
    public void Zero_series_impedance_belongs_in_a_bus_merge()
    {
        Network net = Clean();
        net = net with
        {
            Lines = [.. net.Lines, new Line { Id = "TIE", From = "MAIN", To = "QUARREND", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0, X = 0 } }],
            Transformers = net.Transformers.Change(1, t => t with { ZPercent = 0 }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("belongs in a bus merge, not a branch", Single(report, ElementKind.Line, "TIE", "z1.x").Message);
        Assert.Contains("belongs in a bus merge, not a branch", Single(report, ElementKind.Transformer, "T2", "zPercent").Message);
    }

    [Fact]
    public void Negative_series_reactance_is_a_warning_not_an_error()
    {
        Network net = PerUnitOnly();
        net = net with { Lines = net.Lines.Change(1, l => l with { Z1 = l.Z1! with { X = -0.02 } }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem p = Single(report, ElementKind.Line, "2-3", "z1.x");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.False(report.HasErrors, report.Describe());
    }

    [Fact]
    public void A_zero_sequence_of_zero_impedance_is_an_error()
    {
        Network net = Clean();
        net = net with { Lines = net.Lines.Change(0, l => l with { Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0, X = 0 } }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Line, "F1", "z0.x");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("z0 is zero", p.Message);
    }

    [Fact]
    public void A_no_load_loss_larger_than_the_no_load_current_allows_is_an_error()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { NoLoad = new NoLoadLoss { I0Percent = 0.1, P0Kw = 30 } }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T2", "noLoad.p0Kw");
        Assert.Contains("is more than i0Percent 0.1 % of 20 MVA allows (20 kW)", p.Message);
    }

    [Fact]
    public void A_line_length_of_zero_is_an_error()
    {
        Network net = Clean();
        net = net with { Lines = net.Lines.Change(0, l => l with { Km = 0 }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Line, "F1", "km");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("km is 0", p.Message);
    }

    [Fact]
    public void Tap_position_outside_its_range_and_a_zero_step_are_errors()
    {
        Network net = Clean();
        net = net with
        {
            Transformers = net.Transformers
                .Change(0, t => t with { Tap = t.Tap! with { Position = 9 } })
                .Change(1, t => t with { Tap = new TapChanger { PercentPerStep = 0, Range = new(-2, 2) } }),
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Contains("tap.position 9 is outside the range [-8, 8]", Single(report, ElementKind.Transformer, "T1", "tap.position").Message);
        Assert.Contains("tap.percentPerStep is 0 with a range [-2, 2]", Single(report, ElementKind.Transformer, "T2", "tap.percentPerStep").Message);
    }

    [Fact]
    public void Tap_range_upside_down_is_an_error_and_a_large_step_a_warning()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { Tap = t.Tap! with { Range = new(8, -8), PercentPerStep = 10 } }) };
        ValidationReport report = NetworkValidator.Validate(net);
        Assert.Equal(Severity.Error, Single(report, ElementKind.Transformer, "T1", "tap.range").Severity);
        Assert.Equal(Severity.Warning, Single(report, ElementKind.Transformer, "T1", "tap.percentPerStep").Severity);
    }

    [Fact]
    public void A_regulation_band_of_zero_is_an_error()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { Tap = t.Tap! with { Regulate = t.Tap.Regulate! with { BandPu = 0 } } }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T1", "tap.regulate.bandPu");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("bandPu is 0", p.Message);
    }

    [Fact]
    public void A_regulation_band_narrower_than_one_step_warns_that_the_tap_may_hunt()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { Tap = t.Tap! with { Regulate = t.Tap.Regulate! with { BandPu = 0.01 } } }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T1", "tap.regulate.bandPu");
        Assert.Equal(Severity.Warning, p.Severity);
        Assert.Contains("narrower than one tap step (0.0125 pu)", p.Message);
    }

    [Fact]
    public void A_three_winding_star_branch_below_zero_is_a_warning_and_a_zero_pair_impedance_an_error()
    {
        Network net = Clean();
        net = net with
        {
            Buses = [.. net.Buses, new Bus { Id = "TERTIARY", Kv = 11 }],
            ThreeWindingTransformers =
            [
                new ThreeWindingTransformer
                {
                    Id = "T3", Hv = "GRID", Mv = "MAIN", Lv = "TERTIARY", HvKv = 132, MvKv = 33, LvKv = 11,
                    MvaHv = 60, MvaMv = 60, MvaLv = 20, ZHmPercent = 10, ZHlPercent = 25, ZMlPercent = 8, ZBaseMva = 60,
                },
                new ThreeWindingTransformer
                {
                    Id = "T4", Hv = "GRID", Mv = "MAIN", Lv = "TERTIARY", HvKv = 132, MvKv = 33, LvKv = 11,
                    MvaHv = 60, MvaMv = 60, MvaLv = 20, ZHmPercent = 12, ZHlPercent = 0, ZMlPercent = 7, ZBaseMva = 60,
                },
            ],
        };
        ValidationReport report = NetworkValidator.Validate(net);
        Problem star = Single(report, ElementKind.ThreeWindingTransformer, "T3", "zHmPercent");
        Assert.Equal(Severity.Warning, star.Severity);
        Assert.Contains("mv star branch comes out at -3.5 %", star.Message);
        Assert.Equal(Severity.Error, Single(report, ElementKind.ThreeWindingTransformer, "T4", "zHlPercent").Severity);
    }
}
