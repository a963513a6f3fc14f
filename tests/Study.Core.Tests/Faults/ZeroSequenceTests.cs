// Zero-sequence paths through transformer banks by vector group (common practice, any protection text).
using Study.Core.Faults;
using Study.Core.Model;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class ZeroSequenceTests
{
    private static readonly FaultRequest Earth = new() { Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth] };

    // Zero sequence through transformers (common practice, any protection text; DEVELOPERS.md, Outside references): an earth fault on the delta side of a YNd unit
    // with no other earthing draws no earth-fault current (only charging).
    [Fact]
    public void Earth_fault_on_the_delta_side_of_a_YNd_unit_draws_no_current()
    {
        var network = OneBank(Bank("T1", "HV", "LV", 30, 132, 33, 10, 20, "YNd11", hvNeutral: Solid), 132, 33, scMva: 3000);
        var lv = Run(network, Earth).At("LV", FaultKind.LineToEarth);
        Assert.Null(lv.Z0Pu);
        Assert.Equal(0, lv.IkPu);
        // The star side is earthed through the bank: there the earth fault is larger than with the grid alone.
        Assert.NotNull(Run(network, Earth).At("HV", FaultKind.LineToEarth).Z0Pu);
    }

    // The same with line charging represented (load-flow method, cable with zero-sequence susceptance):
    // only the small capacitive current flows.
    [Fact]
    public void Earth_fault_on_the_delta_side_with_charging_draws_only_charging_current()
    {
        var network = OneBank(Bank("T1", "HV", "LV", 30, 132, 33, 10, 20, "YNd11", hvNeutral: Solid), 132, 33, scMva: 3000) with
        {
            Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "LV", Kv = 33 }, new Bus { Id = "FAR", Kv = 33 }],
            Lines =
            [
                new Line
                {
                    Id = "C1", From = "LV", To = "FAR", Km = 10,
                    Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.12, B = 60 },
                    Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.4, X = 0.3, B = 60 },
                },
            ],
        };
        var result = Run(network, Earth with { Method = FaultMethod.LoadFlow });
        var slg = result.At("LV", FaultKind.LineToEarth);
        // 3·U/√3·ω·C0 = √3·33 kV·(600 µS) ≈ 34 A: a charging current, far below the three-phase fault.
        Assert.InRange(slg.IkKa!.Value, 0.02, 0.05);
        Assert.True(slg.IkKa < 0.01 * result.At("LV", FaultKind.ThreePhase).IkKa);
    }

    // DEVELOPERS.md, Outside references: a Dyn unit with a solidly earthed star feeds an lv earth fault roughly equal to its
    // three-phase fault when Z0 ≈ Z1 of the unit (infinite source).
    [Fact]
    public void Dyn_unit_with_solid_star_feeds_an_earth_fault_equal_to_its_three_phase_fault()
    {
        var network = OneBank(Bank("T1", "HV", "LV", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid), 33, 11);
        var result = Run(network, Earth);
        double ratio = result.At("LV", FaultKind.LineToEarth).IkKa!.Value / result.At("LV", FaultKind.ThreePhase).IkKa!.Value;
        Assert.Equal(1.0, ratio, 0.01);
    }

    // Common practice: an ungrounded star (Yy) blocks zero sequence, even with the other star earthed.
    [Theory]
    [InlineData("Yyn0")]
    [InlineData("Yy0")]
    [InlineData("YNy0")]
    public void Ungrounded_star_blocks_the_earth_fault(string group)
    {
        var network = OneBank(Bank("T1", "HV", "LV", 20, 33, 11, 10, 15, group, hvNeutral: Solid, lvNeutral: Solid), 33, 11);
        var lv = Run(network, Earth).At("LV", FaultKind.LineToEarth);
        Assert.Null(lv.Z0Pu);
        Assert.Equal(0, lv.IkPu);
    }

    // Common practice: YNyn with both neutrals earthed passes zero sequence from the earthed grid.
    [Fact]
    public void YNyn_with_both_neutrals_earthed_passes_the_earth_fault()
    {
        var network = OneBank(Bank("T1", "HV", "LV", 20, 33, 11, 10, 15, "YNyn0", hvNeutral: Solid, lvNeutral: Solid), 33, 11);
        var result = Run(network, Earth);
        double ratio = result.At("LV", FaultKind.LineToEarth).IkKa!.Value / result.At("LV", FaultKind.ThreePhase).IkKa!.Value;
        Assert.Equal(1.0, ratio, 0.01);
    }

    // "grounded": false on the YN neutral opens the path; a neutral resistor 3·R_N limits the earth fault.
    [Fact]
    public void Neutral_earthing_resistor_limits_the_earth_fault_and_an_unearthed_neutral_blocks_it()
    {
        var resistor = new Earthing { Grounded = true, ROhm = 6.35 };
        var limited = Run(OneBank(Bank("T1", "HV", "LV", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: resistor), 33, 11), Earth)
            .At("LV", FaultKind.LineToEarth);
        // 3·R_N = 19.05 ohm dominates: I = √3·c·U_n/|Z1 + Z2 + Z0 + 3R_N| with Z1 = Z2 = Z0 = K_T·Z_T
        // = 0.0397 + j0.5952 ohm, so √3·1.1·11/|19.169 + j1.786| = 20.957/19.252 = 1.089 kA (worked by hand).
        Assert.Equal(1.089, limited.IkKa!.Value, 0.005);
        var open = Run(OneBank(Bank("T1", "HV", "LV", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: Unearthed), 33, 11), Earth)
            .At("LV", FaultKind.LineToEarth);
        Assert.Equal(0, open.IkPu);
    }

    [Fact]
    public void Vector_groups_parse_in_IEC_60076_1_notation()
    {
        var g = VectorGroup.Parse("YNd11", "T");
        Assert.Equal((WindingConnection.StarNeutral, WindingConnection.Delta, 11), (g.Hv, g.Lv, g.LvClock));
        var z = VectorGroup.Parse("Yzn11", "T");
        Assert.Equal((WindingConnection.Star, WindingConnection.ZigzagNeutral), (z.Hv, z.Lv));
        var three = VectorGroup.Parse("YNyn0d1", "T3", threeWinding: true);
        Assert.Equal((WindingConnection.StarNeutral, WindingConnection.StarNeutral, 0, WindingConnection.Delta, 1),
            (three.Hv, three.Mv!.Value, three.MvClock, three.Lv, three.LvClock));
        var e = Assert.Throws<InputException>(() => VectorGroup.Parse("Xd1", "T9"));
        Assert.Equal("T9", e.ElementId);
        Assert.Throws<InputException>(() => VectorGroup.Parse("Dyn", "T9"));
    }
}
