// Per-unit bases and the base-change rule, held against the common worked examples.
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class BaseChangeTests
{
    // Per-unit base change (common practice, any power systems text; DEVELOPERS.md, Outside references):
    // Z_new = Z_old · (S_new / S_old) · (V_old / V_new)²; 8 % on 50 MVA is 0.16 pu on 100 MVA at the same kV.
    [Fact]
    public void Eight_percent_on_50_MVA_is_0_16_pu_on_100_MVA_at_the_same_kV()
    {
        var t = new Transformer { Id = "T", Hv = "H", Lv = "L", Mva = 50, HvKv = 33, LvKv = 11, ZPercent = 8, Xr = 10 };
        var c = TransformerImpedance.Convert(t, new Bus { Id = "H", Kv = 33 }, new Bus { Id = "L", Kv = 11 }, baseMva: 100);
        Assert.Equal(0.16, c.ZPu.Magnitude, 12);
    }

    // Common practice: Z_base = kV² / MVA, I_base = MVA / (√3 · kV). 11 kV on 100 MVA: 1.21 ohm, 5248.6 A.
    [Fact]
    public void An_11_kV_bus_on_100_MVA_has_a_base_of_1_21_ohm_and_5248_6_A()
    {
        var b = BaseQuantities.ForBus(new Bus { Id = "B", Kv = 11 }, 100);
        Assert.Equal(1.21, b.ZBaseOhm!.Value, 12);
        Assert.Equal(5248.6, b.IBaseA!.Value, 1);
    }

    [Fact]
    public void A_bus_without_kV_has_no_ohm_or_ampere_base()
    {
        var b = BaseQuantities.ForBus(new Bus { Id = "B", Kv = 0 }, 100);
        Assert.Null(b.ZBaseOhm);
        Assert.Null(b.IBaseA);
    }
}
