// Fortescue identities of the symmetrical-component fault formulas, directly and through a network.
using System.Numerics;
using Study.Core.Faults;
using Study.Core.Model;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class SymmetricalComponentTests
{
    private static readonly Complex Z = new(0.02, 0.3);

    // Symmetrical components (Fortescue; DEVELOPERS.md, Outside references): with Z0 = Z1 = Z2 an earth fault equals the three-phase fault.
    [Fact]
    public void Equal_sequence_impedances_make_the_earth_fault_equal_the_three_phase_fault()
    {
        var three = SymmetricalComponents.FaultCurrents(FaultKind.ThreePhase, 1.1, Z, Z, Z, Complex.Zero);
        var earth = SymmetricalComponents.FaultCurrents(FaultKind.LineToEarth, 1.1, Z, Z, Z, Complex.Zero);
        Assert.Equal(three.LargestPhaseMagnitude, earth.PhaseA.Magnitude, 12);
        Assert.Equal(three.LargestPhaseMagnitude, (3 * earth.Zero).Magnitude, 12);
    }

    // Fortescue (DEVELOPERS.md, Outside references): with Z2 = Z1, I_ll = (√3/2)·I_3ph.
    [Fact]
    public void Line_to_line_fault_is_root_three_over_two_of_the_three_phase_fault()
    {
        var three = SymmetricalComponents.FaultCurrents(FaultKind.ThreePhase, 1.0, Z, Z, null, Complex.Zero);
        var ll = SymmetricalComponents.FaultCurrents(FaultKind.LineToLine, 1.0, Z, Z, null, Complex.Zero);
        Assert.Equal(Math.Sqrt(3) / 2 * three.LargestPhaseMagnitude, ll.LargestPhaseMagnitude, 12);
        Assert.Equal(0, ll.PhaseA.Magnitude, 12);
    }

    // Fortescue (DEVELOPERS.md, Outside references): I_slg = 3E/|Z1 + Z2 + Z0 + 3Zf|, and a fault impedance lowers the current.
    [Fact]
    public void Earth_fault_with_fault_impedance_follows_the_textbook_formula()
    {
        Complex z0 = new(0.05, 0.9), zf = new(0.4, 0);
        var slg = SymmetricalComponents.FaultCurrents(FaultKind.LineToEarth, 1.0, Z, Z, z0, zf);
        Assert.Equal(3.0 / (Z + Z + z0 + 3 * zf).Magnitude, slg.PhaseA.Magnitude, 12);
        Assert.Equal(0, slg.PhaseB.Magnitude, 12);
    }

    // Double line-to-earth: the earth current 3·I0 equals √3·E·... with Z1 = Z2 it is 3E/|Z1 + 2Z0| (IEC 60909-0 I''kE2E, from memory).
    [Fact]
    public void Double_line_to_earth_earth_current_matches_the_closed_form()
    {
        Complex z0 = new(0.05, 0.9);
        var dlg = SymmetricalComponents.FaultCurrents(FaultKind.LineLineToEarth, 1.0, Z, Z, z0, Complex.Zero);
        Assert.Equal(3.0 / (Z + 2 * z0).Magnitude, (3 * dlg.Zero).Magnitude, 12);
        Assert.Equal(0, dlg.PhaseA.Magnitude, 12);
    }

    // Same identity through the engine: a supply alone with Z0/Z1 = 1 gives Z0 = Z1 = Z2 at its bus.
    [Fact]
    public void Supply_bus_with_equal_sequence_impedances_has_equal_earth_and_three_phase_faults()
    {
        var network = new Network { Buses = [new Bus { Id = "B", Kv = 33 }], Supplies = [Grid("B", 1500, 10, 1.0)] };
        var result = Run(network, new FaultRequest { Kinds = AllKinds });
        double three = result.At("B", FaultKind.ThreePhase).IkKa!.Value;
        Assert.Equal(three, result.At("B", FaultKind.LineToEarth).IkKa!.Value, 1e-9);
        Assert.Equal(Math.Sqrt(3) / 2 * three, result.At("B", FaultKind.LineToLine).IkKa!.Value, 1e-9);
    }
}
