// Three-winding transformer star equivalent (common practice; DEVELOPERS.md, Per-unit rules).
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class ThreeWindingStarTests
{
    internal static ThreeWindingTransformer Bank(TapChanger? tap = null) => new()
    {
        Id = "T3", Hv = "H", Mv = "M", Lv = "L", HvKv = 132, MvKv = 33, LvKv = 11,
        MvaHv = 60, MvaMv = 60, MvaLv = 20, ZHmPercent = 12, ZHlPercent = 20, ZMlPercent = 7, ZBaseMva = 60, Xr = 30, Tap = tap,
    };

    private static ThreeWindingStarResult Convert(ThreeWindingTransformer t, double lvBusKv = 11) =>
        ThreeWindingStar.Convert(t, new Bus { Id = "H", Kv = 132 }, new Bus { Id = "M", Kv = 33 }, new Bus { Id = "L", Kv = lvBusKv }, 100);

    // Star equivalent (common practice; DEVELOPERS.md, Outside references): z_H = (12 + 20 − 7)/2 = 12.5 %, z_M = (12 + 7 − 20)/2 = −0.5 %,
    // z_L = (20 + 7 − 12)/2 = 7.5 % on 60 MVA; any two star branches in series give the pairwise impedance.
    [Fact]
    public void Each_pair_of_star_branches_adds_up_to_the_pairwise_impedance()
    {
        var c = Convert(Bank());
        double k = 100.0 / 60.0;
        Assert.Equal(0.12 * k, (c.Hv.ZPu + c.Mv.ZPu).Magnitude, 12);
        Assert.Equal(0.20 * k, (c.Hv.ZPu + c.Lv.ZPu).Magnitude, 12);
        Assert.Equal(0.07 * k, (c.Mv.ZPu + c.Lv.ZPu).Magnitude, 12);
        Assert.Equal(0.125 * k, c.Hv.ZPu.Magnitude, 12);
        Assert.True(c.Mv.ZPu.Imaginary < 0, "the mv star branch comes out negative for these data");
        Assert.Equal(30.0, c.Lv.ZPu.Imaginary / c.Lv.ZPu.Real, 9);
    }

    [Fact]
    public void Windings_at_bus_kV_have_unit_ratio_and_a_tap_changes_only_its_own_winding()
    {
        var plain = Convert(Bank());
        Assert.All(plain.Windings, w => Assert.Equal(1.0, w.Ratio, 12));
        var tapped = Convert(Bank(new TapChanger { Winding = TapWinding.Lv, PercentPerStep = 2.5, Range = new(-2, 2), Position = 1 }));
        Assert.Equal(1.0, tapped.Hv.Ratio, 12);
        Assert.Equal(1.0, tapped.Mv.Ratio, 12);
        Assert.Equal(1.025, tapped.Lv.Ratio, 12);
    }

    // The ratio rule (DEVELOPERS.md, Per-unit rules) applied per winding: an 11 kV winding on a 10.5 kV bus gives t_L = 11 / 10.5.
    [Fact]
    public void A_winding_rated_above_its_bus_kV_raises_that_winding_ratio()
    {
        var c = Convert(Bank(), lvBusKv: 10.5);
        Assert.Equal(11 / 10.5, c.Lv.Ratio, 12);
        Assert.Equal(11 / 10.5, c.Lv.WindingFactor, 12);
        Assert.Equal(132.0, c.StarBaseKv);
    }
}
