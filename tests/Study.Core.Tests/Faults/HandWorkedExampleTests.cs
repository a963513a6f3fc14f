// IEC 60909 against values worked by hand, and the transformer-limited fault of common practice.
using Study.Core.Faults;
using Study.Core.Model;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class HandWorkedExampleTests
{
    // Common practice (common practice; DEVELOPERS.md, Outside references): infinite source, I_fault = I_rated / z_pu.
    // 20 MVA, 11 kV secondary, z = 10 %: I_rated = 20 / (√3 · 11) = 1049.7 A, I_fault = 10.50 kA at c = 1.
    // The load-flow method drives the fault from the solved 1.0 pu with no c factor.
    [Fact]
    public void Transformer_limited_fault_is_rated_current_over_per_unit_impedance()
    {
        var network = OneBank(Bank("T1", "HV", "LV", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid), 33, 11);
        var result = Run(network, new FaultRequest { Kinds = [FaultKind.ThreePhase], Method = FaultMethod.LoadFlow });
        Assert.Equal(10.50, result.At("LV", FaultKind.ThreePhase).IkKa!.Value, 2);
    }

    // IEC 60909-0:2016 equivalent voltage source (formulas from memory; DEVELOPERS.md, Outside references), a radial network
    // worked by hand. Grid 132 kV, S''kQ = 3000 MVA, X/R = 12; bank 132/33 kV, 30 MVA, 10 %, X/R 20,
    // z0 9 %, Dyn11 with its 33 kV star solidly earthed; cable 5 km of 0.1 + j0.12 ohm/km (zero
    // sequence 0.4 + j0.3 ohm/km). c = c_max = 1.10 at both levels. All ohm at 33 kV:
    //   Z_Q  = c·U_nQ²/S''kQ · (33/132)² = 1.1·132²/3000/16 = 0.399300 ohm; R_Q = Z_Q/√145 = 0.033160, X_Q = 0.397921
    //   Z_T  = 0.10·33²/30 = 3.63 ohm; R_T = 3.63/√401 = 0.181272, X_T = 3.625471
    //   x_T  = 0.10·20/√401 = 0.099875; K_T = 0.95·c_max/(1 + 0.6·x_T) = 1.045/1.059925 = 0.985919
    //   Z_TK = 0.178721 + j3.574420; Z0_TK = 0.09·33²/30 · K_T → 0.160849 + j3.216978
    //   cable Z = 0.5 + j0.6, Z0 = 2.0 + j1.5 (charging neglected, IEC 60909)
    //   busbar: Z1 = Z2 = 0.211881 + j3.972340, Z0 = 0.160849 + j3.216978 (the delta hides the grid's zero sequence)
    //   end:    Z1 = Z2 = 0.711881 + j4.572340, Z0 = 2.160849 + j4.716978
    //   I''k3 = c·U_n/(√3·|Z1|); I''k1 = √3·c·U_n/|Z1 + Z2 + Z0|; I''k2 = c·U_n/|Z1 + Z2|;
    //   dlg from the sequence currents (largest phase current; earth current √3·c·U_n/|Z1 + 2·Z0|);
    //   κ = 1.02 + 0.98·e^(−3R/X) with R/X of Z1 (radial: method C gives the same R/X).
    //   busbar: 3ph 5.2684, slg 5.6253, ll 4.5626, dlg 5.4751 (earth 6.0339) kA; R/X 0.05334, κ 1.85509, i_p 13.8217 kA
    //   end:    3ph 4.5290, slg 4.3913, ll 3.9223, dlg 4.7942 (earth 4.2244) kA; R/X 0.15569, κ 1.63429, i_p 10.4677 kA
    private static Network Radial() => new()
    {
        Name = "IEC 60909 hand example",
        Buses = [new Bus { Id = "G132", Kv = 132 }, new Bus { Id = "B33", Kv = 33 }, new Bus { Id = "END", Kv = 33 }],
        Supplies = [Grid("G132", 3000, 12, 1.0)],
        Transformers = [Bank("T1", "G132", "B33", 30, 132, 33, 10, 20, "Dyn11", z0Percent: 9, lvNeutral: Solid)],
        Lines =
        [
            new Line
            {
                Id = "C1", From = "B33", To = "END", Km = 5,
                Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.12, B = 60 },
                Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.4, X = 0.3, B = 60 },
            },
        ],
    };

    public static TheoryData<string, FaultKind, double> HandValues => new()
    {
        { "B33", FaultKind.ThreePhase, 5.2684 },
        { "B33", FaultKind.LineToEarth, 5.6253 },
        { "B33", FaultKind.LineToLine, 4.5626 },
        { "B33", FaultKind.LineLineToEarth, 5.4751 },
        { "END", FaultKind.ThreePhase, 4.5290 },
        { "END", FaultKind.LineToEarth, 4.3913 },
        { "END", FaultKind.LineToLine, 3.9223 },
        { "END", FaultKind.LineLineToEarth, 4.7942 },
    };

    [Theory]
    [MemberData(nameof(HandValues))]
    public void Iec60909_radial_example_matches_the_hand_calculation(string bus, FaultKind kind, double ikKa)
    {
        var result = Run(Radial(), new FaultRequest { Kinds = AllKinds });
        Assert.Equal(ikKa, result.At(bus, kind).IkKa!.Value, ikKa * 0.005);
    }

    [Theory]
    [InlineData("B33", 6.0339, 0.05334, 1.85509, 13.8217)]
    [InlineData("END", 4.2244, 0.15569, 1.63429, 10.4677)]
    public void Iec60909_radial_example_earth_current_kappa_and_peak_match_the_hand_calculation(
        string bus, double earthKa, double rOverX, double kappa, double ipKa)
    {
        var result = Run(Radial(), new FaultRequest { Kinds = AllKinds });
        Assert.Equal(earthKa, result.At(bus, FaultKind.LineLineToEarth).EarthCurrentKa!.Value, earthKa * 0.005);
        var three = result.At(bus, FaultKind.ThreePhase);
        Assert.Equal(rOverX, three.ROverX, rOverX * 0.005);
        Assert.Equal(rOverX, three.KappaROverX, rOverX * 0.005);
        Assert.Equal(kappa, three.Kappa, kappa * 0.005);
        Assert.Equal(ipKa, three.IpKa!.Value, ipKa * 0.005);
        Assert.Equal(Math.Sqrt(3) * 33 * three.IkKa!.Value, three.SkMva, 1e-6 * three.SkMva);
    }

    [Fact]
    public void Iec60909_radial_example_sequence_impedances_in_ohm_match_the_hand_calculation()
    {
        var end = Run(Radial(), new FaultRequest { Kinds = [FaultKind.LineToEarth] }).At("END", FaultKind.LineToEarth);
        Assert.Equal(0.711881, end.Z1Ohm!.Value.Real, 1e-4);
        Assert.Equal(4.572340, end.Z1Ohm!.Value.Imaginary, 1e-4);
        Assert.Equal(2.160849, end.Z0Ohm!.Value.Real, 1e-4);
        Assert.Equal(4.716978, end.Z0Ohm!.Value.Imaginary, 1e-4);
    }

    // IEC 60909-0 (from memory): the minimum calculation takes c_min = 1.00 above 1 kV and scMvaMin.
    [Fact]
    public void Minimum_level_uses_c_min_and_the_minimum_declared_fault_level()
    {
        var network = Radial() with { Supplies = [Grid("G132", 3000, 12) with { ScMvaMin = 2000 }] };
        var max = Run(network, new FaultRequest { Kinds = [FaultKind.ThreePhase] }).At("G132", FaultKind.ThreePhase);
        var min = Run(network, new FaultRequest { Kinds = [FaultKind.ThreePhase], Level = Study.Core.Units.FaultLevel.Min }).At("G132", FaultKind.ThreePhase);
        // At the supply bus I''k = c·U_n/(√3·c·U_n²/S''kQ) = S''kQ/(√3·U_n), whatever c.
        Assert.Equal(3000 / (Math.Sqrt(3) * 132), max.IkKa!.Value, 1e-6);
        Assert.Equal(2000 / (Math.Sqrt(3) * 132), min.IkKa!.Value, 1e-6);
        Assert.Equal(1.00, min.VoltageFactor);
    }
}
