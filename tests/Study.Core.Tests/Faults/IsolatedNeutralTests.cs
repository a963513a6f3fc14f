// Post-fault phase voltages where the faulted part of the network has no path to earth: the neutral
// shifts, and the zero-sequence voltage follows from the fault condition (symmetrical components,
// Fortescue; the isolated-neutral case as any protection text works it).
using Study.Core.Faults;
using Study.Core.Model;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class IsolatedNeutralTests
{
    /// <summary>Earthed 132 kV grid, a YNd1 bank (its 33 kV side a delta: no zero-sequence path), a 33 kV cable to FAR.</summary>
    private static Network DeltaFed() => OneBank(Bank("T1", "HV", "LV", 20, 132, 33, 10, 15, "YNd1", hvNeutral: Solid), 132, 33, scMva: 3000) with
    {
        Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "LV", Kv = 33 }, new Bus { Id = "FAR", Kv = 33 }],
        Lines =
        [
            new Line
            {
                Id = "C1", From = "LV", To = "FAR", Km = 3,
                Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.1, X = 0.12 },
                Z0 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.4, X = 0.3 },
            },
        ],
    };

    private static ShortCircuitLevel Fault(FaultKind kind) =>
        Run(DeltaFed(), new FaultRequest { Buses = ["LV"], Kinds = [kind] }).At("LV", kind);

    [Fact]
    public void An_earth_fault_on_an_isolated_neutral_bus_puts_the_faulted_phase_at_zero_and_the_others_at_root_three()
    {
        // No zero-sequence path: I0 = I1 = I2 = 0, so V1 = E = c = 1.10 (IEC 60909 above 1 kV, from memory),
        // V2 = 0 and the fault condition V_a = 0 gives V0 = −E: V_b = V_c = |a² − 1|·E = √3 · 1.10 = 1.905 pu.
        ShortCircuitLevel f = Fault(FaultKind.LineToEarth);
        Assert.Equal(0, f.IkPu, 12);
        double rootThree = Math.Sqrt(3) * 1.1;
        PhaseVoltages at = f.Voltages.Single(v => v.Bus == "LV");
        Assert.Equal(0, at.VaPu, 9);
        Assert.Equal(rootThree, at.VbPu, 9);
        Assert.Equal(rootThree, at.VcPu, 9);
        // The cable's far end is in the same isolated part: its neutral shifts alike.
        PhaseVoltages far = f.Voltages.Single(v => v.Bus == "FAR");
        Assert.Equal((0.0, rootThree, rootThree), (far.VaPu, far.VbPu, far.VcPu), (x, y) =>
            Math.Abs(x.Item1 - y.Item1) < 1e-9 && Math.Abs(x.Item2 - y.Item2) < 1e-9 && Math.Abs(x.Item3 - y.Item3) < 1e-9);
        // Beyond the delta the earthed side sees no zero sequence and no current: 1.10 pu in every phase.
        PhaseVoltages hv = f.Voltages.Single(v => v.Bus == "HV");
        Assert.Equal(1.1, hv.VaPu, 9);
        Assert.Equal(1.1, hv.VbPu, 9);
        Assert.Equal(1.1, hv.VcPu, 9);
    }

    [Fact]
    public void A_double_earth_fault_on_an_isolated_neutral_bus_leaves_one_and_a_half_times_e_on_the_sound_phase()
    {
        // I0 = 0 leaves a b–c fault: I1 = −I2 = E/(Z1 + Z2) and with Z2 = Z1 (IEC 60909, no machines)
        // V1 = V2 = E/2. V_b = V_c = 0 gives V0 = V1, so V_a = 3·E/2 = 1.65 pu and V_b = V_c = 0.
        ShortCircuitLevel f = Fault(FaultKind.LineLineToEarth);
        PhaseVoltages at = f.Voltages.Single(v => v.Bus == "LV");
        Assert.Equal(1.65, at.VaPu, 9);
        Assert.Equal(0, at.VbPu, 9);
        Assert.Equal(0, at.VcPu, 9);
        // The line-to-line current is what the b–c fault alone gives: √3·E/|Z1 + Z2| (Fortescue).
        ShortCircuitLevel ll = Run(DeltaFed(), new FaultRequest { Buses = ["LV"], Kinds = [FaultKind.LineToLine] }).At("LV", FaultKind.LineToLine);
        Assert.Equal(ll.IkPu, f.IkPu, 12);
    }

    [Fact]
    public void With_an_earthed_star_on_the_same_bus_the_zero_sequence_comes_from_the_current_as_before()
    {
        // An earthed Dyn bank on LV gives a zero-sequence path, so V0 = −Z0·I0 and V_a at a bolted fault is 0
        // with both sound phases below √3 (they are √3 only when Z0 is infinite).
        Network n = DeltaFed();
        n = n with
        {
            Buses = [.. n.Buses, new Bus { Id = "LV2", Kv = 11 }],
            Transformers = [.. n.Transformers, Bank("T2", "LV", "LV2", 5, 33, 11, 7, 10, "YNd11", hvNeutral: Solid)],
        };
        ShortCircuitLevel f = Run(n, new FaultRequest { Buses = ["LV"], Kinds = [FaultKind.LineToEarth] }).At("LV", FaultKind.LineToEarth);
        Assert.True(f.IkPu > 0);
        PhaseVoltages at = f.Voltages.Single(v => v.Bus == "LV");
        Assert.Equal(0, at.VaPu, 9);
        Assert.InRange(at.VbPu, 1.0, Math.Sqrt(3) * 1.1 - 1e-3);
    }
}
