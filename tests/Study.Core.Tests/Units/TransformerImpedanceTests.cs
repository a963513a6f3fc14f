// Two-winding transformer nameplate data to the system base, tap ratio and magnetising branch.
using System.Numerics;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class TransformerImpedanceTests
{
    private static readonly Bus Hv132 = new() { Id = "B0", Kv = 132 };
    private static readonly Bus Lv33 = new() { Id = "B1", Kv = 33 };

    internal static Transformer Bank132To33(TapChanger? tap = null) => new()
    {
        Id = "T1", Hv = "B0", Lv = "B1", Mva = 60, HvKv = 132, LvKv = 33, ZPercent = 12.5, Xr = 25, Tap = tap,
    };

    // Base change (common practice; DEVELOPERS.md, Outside references): 12.5 % on 60 MVA at rated kV is
    // z_sys = 0.125 · 100 / 60 = 0.2083333 pu on 100 MVA; with X/R 25,
    // r = 0.2083333 / √(1 + 25²) = 0.2083333 / 25.019992 = 0.00832667 pu, x = 25 · r = 0.2081668 pu.
    [Fact]
    public void A_132_33_kV_60_MVA_bank_of_12_5_percent_is_0_2083_pu_on_100_MVA()
    {
        var c = TransformerImpedance.Convert(Bank132To33(), Hv132, Lv33, 100);
        Assert.Equal(0.125 * 100 / 60, c.ZPu.Magnitude, 12);
        Assert.Equal(0.00832667, c.ZPu.Real, 7);
        Assert.Equal(0.2081668, c.ZPu.Imaginary, 6);
        Assert.Equal(1.0, c.Ratio, 12);
        Assert.Equal(60.0, c.RatingMva);
    }

    // Tap direction (common practice; DEVELOPERS.md, Outside references): +2 steps of 1.25 % on the hv winding raise the turns
    // ratio by 2.5 %: t = 1.025 when the bus kV equal the rated kV; on the lv winding t = 1/1.025.
    [Fact]
    public void Two_hv_tap_steps_of_1_25_percent_give_a_ratio_of_1_025()
    {
        var c = TransformerImpedance.Convert(Bank132To33(new TapChanger { Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-8, 8), Position = 2 }), Hv132, Lv33, 100);
        Assert.Equal(1.025, c.Ratio, 12);
    }

    [Fact]
    public void Two_lv_tap_steps_of_1_25_percent_give_a_ratio_of_1_over_1_025()
    {
        var c = TransformerImpedance.Convert(Bank132To33(new TapChanger { Winding = TapWinding.Lv, PercentPerStep = 1.25, Range = new(-8, 8), Position = 2 }), Hv132, Lv33, 100);
        Assert.Equal(1 / 1.025, c.Ratio, 12);
    }

    // Per-unit rules (base change, common practice; DEVELOPERS.md): a 33/11.5 kV, 20 MVA, 10 % unit between a 33 kV
    // and an 11 kV bus: z_sys = 0.1 · (100/20) · (11.5/11)² = 0.5 · 1.0929752 = 0.5464876 pu and
    // t = (33/33) / (11.5/11) = 0.9565217.
    [Fact]
    public void An_11_5_kV_winding_on_an_11_kV_bus_scales_z_by_the_square_and_t_by_the_inverse()
    {
        var t = new Transformer { Id = "T2", Hv = "H", Lv = "L", Mva = 20, HvKv = 33, LvKv = 11.5, ZPercent = 10, Xr = 10 };
        var c = TransformerImpedance.Convert(t, new Bus { Id = "H", Kv = 33 }, new Bus { Id = "L", Kv = 11 }, 100);
        Assert.Equal(0.5464876, c.ZPu.Magnitude, 6);
        Assert.Equal(0.9565217, c.Ratio, 6);
    }

    [Fact]
    public void Two_parallel_units_halve_the_impedance_and_double_the_magnetising_admittance()
    {
        var one = Bank132To33() with { NoLoad = new NoLoadLoss { I0Percent = 0.3, P0Kw = 40 } };
        var two = one with { Units = 2 };
        var a = TransformerImpedance.Convert(one, Hv132, Lv33, 100);
        var b = TransformerImpedance.Convert(two, Hv132, Lv33, 100);
        Assert.Equal(a.ZPu.Real / 2, b.ZPu.Real, 12);
        Assert.Equal(a.ZPu.Imaginary / 2, b.ZPu.Imaginary, 12);
        Assert.Equal(a.MagnetisingY.Real * 2, b.MagnetisingY.Real, 12);
        Assert.Equal(a.MagnetisingY.Imaginary * 2, b.MagnetisingY.Imaginary, 12);
        Assert.Equal(120.0, b.RatingMva);
    }

    // Open-circuit test (any transformer text): at rated voltage the bank draws its iron loss P0, so
    // G_sys = P0 / S_base = 0.040 / 100 = 4e-4 pu; |y| = 0.3 % on 60 MVA, b = √(0.003² − (0.04/60)²) = 2.92499e-3
    // on own base, 2.92499e-3 · 60/100 = 1.754994e-3 pu on the system base (inductive: Y_m = G − jB).
    [Fact]
    public void The_magnetising_branch_draws_the_no_load_loss_at_rated_voltage()
    {
        var t = Bank132To33() with { NoLoad = new NoLoadLoss { I0Percent = 0.3, P0Kw = 40 } };
        var c = TransformerImpedance.Convert(t, Hv132, Lv33, 100);
        Assert.Equal(4e-4, c.MagnetisingY.Real, 12);
        Assert.Equal(-1.754994e-3, c.MagnetisingY.Imaginary, 8);
    }

    [Fact]
    public void The_zero_sequence_defaults_to_the_positive_sequence_and_says_so()
    {
        var c = TransformerImpedance.Convert(Bank132To33(), Hv132, Lv33, 100);
        Assert.True(c.Z0IsDefault);
        Assert.Equal(c.ZPu.Real, c.Z0Pu.Real, 12);
        Assert.Equal(c.ZPu.Imaginary, c.Z0Pu.Imaginary, 12);
        Assert.Contains(c.Steps, s => s.Note == TransformerImpedance.Z0DefaultNote);

        var given = TransformerImpedance.Convert(Bank132To33() with { Z0Percent = 11 }, Hv132, Lv33, 100);
        Assert.False(given.Z0IsDefault);
        Assert.Equal(0.11 * 100 / 60, given.Z0Pu.Magnitude, 12);
    }

    // Transformer-limited fault (common practice; DEVELOPERS.md, Outside references): 20 MVA, 11 kV secondary, z = 10 %:
    // I_rated = 20 MVA / (√3 · 11 kV) = 1049.7 A; with an infinite source I_fault = I_rated / z = 10.50 kA.
    // Through the conversion: z_sys = 0.1 · 100/20 = 0.5 pu, I_base at 11 kV = 5248.6 A, 5248.6 / 0.5 = 10.497 kA.
    [Fact]
    public void A_20_MVA_10_percent_bank_limits_an_11_kV_fault_to_10_50_kA()
    {
        var t = new Transformer { Id = "T4", Hv = "H", Lv = "L", Mva = 20, HvKv = 33, LvKv = 11, ZPercent = 10, Xr = 15 };
        var lv = new Bus { Id = "L", Kv = 11 };
        var c = TransformerImpedance.Convert(t, new Bus { Id = "H", Kv = 33 }, lv, 100);
        Assert.Equal(0.5, c.ZPu.Magnitude, 12);
        double iBaseA = BaseQuantities.ForBus(lv, 100).IBaseA!.Value;
        double iRatedA = BaseQuantities.IBaseA(11, 20);
        Assert.Equal(1049.7, iRatedA, 1);
        Assert.Equal(10.497, iBaseA / c.ZPu.Magnitude / 1000, 3);
        Assert.Equal(iRatedA / 0.10, iBaseA / c.ZPu.Magnitude, 6);
    }

    [Fact]
    public void Per_unit_data_passes_through_and_a_ratio_of_0_means_nominal()
    {
        var t = new Transformer { Id = "4-7", Hv = "4", Lv = "7", RPu = 0, XPu = 0.20912, Ratio = 0 };
        var c = TransformerImpedance.Convert(t, new Bus { Id = "4" }, new Bus { Id = "7" }, 100);
        Assert.Equal(new Complex(0, 0.20912), c.ZPu);
        Assert.Equal(1.0, c.Ratio);
        var tapped = TransformerImpedance.Convert(t with { Ratio = 0.978 }, new Bus { Id = "4" }, new Bus { Id = "7" }, 100);
        Assert.Equal(0.978, tapped.Ratio);
    }

    [Fact]
    public void Nameplate_data_on_a_bus_without_kV_is_an_input_error_naming_the_transformer()
    {
        var e = Assert.Throws<InputException>(() => TransformerImpedance.Convert(Bank132To33(), new Bus { Id = "B0", Kv = 0 }, Lv33, 100));
        Assert.Equal("T1", e.ElementId);
        Assert.Contains("bus B0 has no base kV: give rPu/xPu", e.Message);
    }

    [Fact]
    public void Nameplate_and_per_unit_data_together_are_an_input_error()
    {
        var t = Bank132To33() with { XPu = 0.2 };
        Assert.Equal("T1", Assert.Throws<InputException>(() => TransformerImpedance.Convert(t, Hv132, Lv33, 100)).ElementId);
    }

    [Fact]
    public void A_no_load_loss_larger_than_the_no_load_current_allows_is_an_input_error()
    {
        var t = Bank132To33() with { NoLoad = new NoLoadLoss { I0Percent = 0.05, P0Kw = 40 } };
        Assert.Equal("T1", Assert.Throws<InputException>(() => TransformerImpedance.Convert(t, Hv132, Lv33, 100)).ElementId);
    }
}
