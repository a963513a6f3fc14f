// Compiling a hand-made network into the indexed per-unit model, and stepping a tap on the result.
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class PerUnitModelBuildTests
{
    private static readonly Scenario Light = new() { Name = "light", LoadScale = 0.35, GenerationScale = 0.5 };

    private static Network Sample() => new()
    {
        Name = "Harrowfield", BaseMva = 100,
        Buses =
        [
            new Bus { Id = "B0", Kv = 132 }, new Bus { Id = "B1", Kv = 33 }, new Bus { Id = "B2", Kv = 33 },
            new Bus { Id = "BX", Kv = 33, InService = false }, new Bus { Id = "B3", Kv = 11 },
        ],
        Supplies = [new Supply { Id = "GRID", Bus = "B0", VSet = 1.02, AngleDeg = 0, ScMvaMax = 3000 }],
        Generators = [new Generator { Id = "G1", Bus = "B2", Mode = GeneratorMode.Pv, PMw = 8, VSet = 1.01, Mva = 10, Kv = 33, XdppPu = 0.18 }],
        Lines =
        [
            new Line { Id = "F1", From = "B1", To = "B2", Km = 5.2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38, B = 3 } },
            new Line { Id = "F2", From = "B1", To = "B2", Km = 5.2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38 }, InService = false },
            new Line { Id = "FX", From = "B1", To = "BX", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 1, X = 2 } },
        ],
        Transformers =
        [
            TransformerImpedanceTests.Bank132To33(new TapChanger
            {
                Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-8, 8), Position = 0,
                Regulate = new TapRegulation { Bus = "B1", VTarget = 1.0, BandPu = 0.015 },
            }),
        ],
        ThreeWindingTransformers = [ThreeWindingStarTests.Bank() with { Hv = "B0", Mv = "B1", Lv = "B3" }],
        Loads =
        [
            new Load { Id = "L1", Bus = "B2", PMw = 12, QMvar = 4 },
            new Load { Id = "L2", Bus = "B2", PMw = 5, InService = false },
            new Load { Id = "LX", Bus = "BX", PMw = 3 },
        ],
        Shunts = [new Shunt { Id = "C1", Bus = "B2", QMvar = 4 }],
    };

    [Fact]
    public void In_service_buses_are_indexed_in_order_with_the_star_bus_last()
    {
        var m = PerUnitModel.Build(Sample());
        Assert.Equal(["B0", "B1", "B2", "B3", "T3/star"], m.Buses.Select(b => b.Id));
        Assert.Equal(4, m.BusIndex["T3/star"]);
        Assert.True(m.Buses[4].IsInternal);
        Assert.Equal(132.0, m.Buses[4].BaseKv);
        Assert.False(m.BusIndex.ContainsKey("BX"));
    }

    [Fact]
    public void Out_of_service_elements_and_elements_on_dead_buses_are_left_out()
    {
        var m = PerUnitModel.Build(Sample());
        Assert.Equal(["F1", "T1", "T3", "T3", "T3"], m.Branches.Select(b => b.Id));
        Assert.Equal(["L1"], m.Loads.Select(l => l.Id));
        Assert.Equal(["GRID", "G1"], m.Sources.Select(s => s.Id));
        Assert.Single(m.Shunts);
    }

    [Fact]
    public void Branches_use_the_same_conversions_with_transformers_from_their_hv_terminal()
    {
        var m = PerUnitModel.Build(Sample());
        var f1 = m.Branches[0];
        Assert.Equal((1, 2), (f1.From, f1.To));
        Assert.Equal(0.624 / 10.89, f1.Z.Real, 12);
        var t1 = m.Branches[1];
        Assert.Equal((0, 1), (t1.From, t1.To));
        Assert.Equal(BranchKind.Transformer, t1.Kind);
        Assert.Equal(0.125 * 100 / 60, t1.Z.Magnitude, 12);
        Assert.Equal(0, t1.Tap);
        var windings = m.Branches.Where(b => b.Kind == BranchKind.ThreeWindingTransformer).ToList();
        Assert.Equal(["hv", "mv", "lv"], windings.Select(w => w.Winding));
        Assert.Equal([0, 1, 3], windings.Select(w => w.From));
        Assert.All(windings, w => Assert.Equal(4, w.To));
        // The mv star branch is negative for this bank (z_M = −0.5 %): accepted with a warning (README, Network files).
        Assert.Contains(m.Warnings, w => w.Contains("T3 (mv winding)"));
    }

    [Fact]
    public void The_scenario_scales_loads_and_non_slack_generation()
    {
        var m = PerUnitModel.Build(Sample(), Light);
        Assert.Equal(12 * 0.35 / 100, m.Loads[0].P, 12);
        Assert.Equal(4 * 0.35 / 100, m.Loads[0].Q, 12);
        var g1 = m.Sources.Single(s => s.Id == "G1");
        Assert.Equal(8 * 0.5 / 100, g1.P, 12);
        Assert.Equal(GeneratorMode.Pv, g1.Mode);
        Assert.NotNull(g1.Z1);
        var grid = m.Sources.Single(s => s.Id == "GRID");
        Assert.Equal((ElementKind.Supply, GeneratorMode.Slack, 1.02), (grid.Kind, grid.Mode, grid.VSet));
        Assert.Same(Light, m.Scenario);
    }

    [Fact]
    public void A_regulating_tap_points_at_its_regulated_bus()
    {
        var tap = PerUnitModel.Build(Sample()).Taps.Single();
        Assert.Equal(("T1", 1, 1, 1.0, 0.015), (tap.Id, tap.Branch, tap.RegulatedBus!.Value, tap.VTarget, tap.BandPu));
    }

    // Tap direction (common practice; DEVELOPERS.md, Outside references): +2 steps of 1.25 % on the hv side give t = 1.025.
    [Fact]
    public void WithTapPosition_changes_only_that_branch_ratio_and_the_tap_position()
    {
        var m = PerUnitModel.Build(Sample());
        var moved = m.WithTapPosition(0, 2);
        Assert.Equal(1.025, moved.Branches[1].Ratio, 12);
        Assert.Equal(2, moved.Taps[0].Position);
        Assert.Equal(1.0, m.Branches[1].Ratio, 12);
        Assert.Equal(0, m.Taps[0].Position);
        for (int i = 0; i < m.Branches.Count; i++)
            if (i != 1) Assert.Equal(m.Branches[i], moved.Branches[i]);
        Assert.Equal(m.Branches[1] with { Ratio = moved.Branches[1].Ratio }, moved.Branches[1]);
        Assert.Throws<ArgumentOutOfRangeException>(() => m.WithTapPosition(0, 9));
    }

    // PuTap.RatioAt must agree with the nameplate formula at every position, on either side, including
    // a winding rated off its bus kV and a three-winding lv tap (DEVELOPERS.md, Per-unit rules).
    [Theory]
    [InlineData(TapWinding.Hv, 33.0)]
    [InlineData(TapWinding.Lv, 33.0)]
    [InlineData(TapWinding.Hv, 34.5)]
    [InlineData(TapWinding.Lv, 31.5)]
    public void Tap_ratio_at_any_position_matches_a_fresh_conversion(TapWinding side, double lvKv)
    {
        var tap = new TapChanger { Winding = side, PercentPerStep = 1.25, Range = new(-8, 8), Position = 0 };
        var network = Sample() with { Transformers = [TransformerImpedanceTests.Bank132To33(tap) with { LvKv = lvKv }] };
        var m = PerUnitModel.Build(network);
        for (int p = -8; p <= 8; p++)
        {
            var fresh = PerUnitModel.Build(network with { Transformers = [network.Transformers[0] with { Tap = tap with { Position = p } }] });
            Assert.Equal(fresh.Branches[1].Ratio, m.WithTapPosition(0, p).Branches[1].Ratio, 12);
        }
    }

    [Fact]
    public void A_three_winding_lv_tap_steps_the_lv_winding_branch()
    {
        var tap = new TapChanger { Winding = TapWinding.Lv, PercentPerStep = 2.5, Range = new(-2, 2), Position = 0 };
        var network = Sample() with { Transformers = [], ThreeWindingTransformers = [Sample().ThreeWindingTransformers[0] with { Tap = tap }] };
        var m = PerUnitModel.Build(network);
        var t = m.Taps.Single();
        Assert.Equal("lv", m.Branches[t.Branch].Winding);
        for (int p = -2; p <= 2; p++)
        {
            var fresh = ThreeWindingStar.Convert(network.ThreeWindingTransformers[0] with { Tap = tap with { Position = p } },
                network.Buses[0], network.Buses[1], network.Buses[4], 100);
            Assert.Equal(fresh.Lv.Ratio, m.WithTapPosition(0, p).Branches[t.Branch].Ratio, 12);
        }
    }

    [Fact]
    public void A_per_unit_only_network_with_ohm_data_is_refused_naming_the_element()
    {
        var network = new Network
        {
            Buses = [new Bus { Id = "1" }, new Bus { Id = "2" }],
            Lines = [new Line { Id = "1-2", From = "1", To = "2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 1, X = 3 } }],
        };
        var e = Assert.Throws<InputException>(() => PerUnitModel.Build(network));
        Assert.Equal("1-2", e.ElementId);
        Assert.Contains("bus 1 has no base kV", e.Message);
    }

    [Fact]
    public void A_reference_to_a_missing_bus_is_refused_naming_the_element()
    {
        var network = Sample() with { Loads = [new Load { Id = "L9", Bus = "NOWHERE", PMw = 1 }] };
        Assert.Equal("L9", Assert.Throws<InputException>(() => PerUnitModel.Build(network)).ElementId);
    }
}
