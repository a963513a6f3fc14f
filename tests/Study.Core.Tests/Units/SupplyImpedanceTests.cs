// Network feeder impedance from the declared fault level (IEC 60909-0, from memory).
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class SupplyImpedanceTests
{
    private static readonly Bus Bus132 = new() { Id = "B0", Kv = 132 };

    // IEC 60909-0:2016, network feeder (from memory): Z_Q = c · U_nQ² / S''kQ = 1.1 · 132² / 3000 = 6.389 ohm;
    // per unit on 100 MVA: 1.1 · 100 / 3000 = 0.036667.
    [Fact]
    public void A_3000_MVA_infeed_at_132_kV_with_c_1_1_is_6_389_ohm()
    {
        var s = new Supply { Id = "GRID", Bus = "B0", ScMvaMax = 3000, ScMvaMin = 2000, Xr = 12, Z0Z1 = 1.5 };
        var c = SupplyImpedance.Convert(s, Bus132, 100, c: 1.1, FaultLevel.Max);
        Assert.Equal(6.389, c.Z1Ohm!.Value.Magnitude, 3);
        Assert.Equal(1.1 * 100 / 3000, c.Z1Pu.Magnitude, 12);
        Assert.Equal(12.0, c.Z1Pu.Imaginary / c.Z1Pu.Real, 9);
        Assert.Equal(1.5 * c.Z1Pu.Magnitude, c.Z0Pu.Magnitude, 12);
    }

    [Fact]
    public void The_minimum_fault_level_with_c_min_gives_a_larger_impedance()
    {
        var s = new Supply { Id = "GRID", Bus = "B0", ScMvaMax = 3000, ScMvaMin = 2000, Xr = 12 };
        var min = SupplyImpedance.Convert(s, Bus132, 100, SupplyImpedance.CMin(132), FaultLevel.Min);
        Assert.Equal(1.0 * 132 * 132 / 2000, min.Z1Ohm!.Value.Magnitude, 9);
        Assert.Equal(1.0, min.Z0Z1);
        Assert.Contains(min.Steps, st => st.Label == "Z0/Z1" && st.Note is not null);
    }

    [Fact]
    public void A_supply_without_a_fault_level_cannot_give_an_impedance()
    {
        var s = new Supply { Id = "GRID", Bus = "B0" };
        Assert.Equal("GRID", Assert.Throws<InputException>(() => SupplyImpedance.Convert(s, Bus132, 100, 1.1, FaultLevel.Max)).ElementId);
    }
}
