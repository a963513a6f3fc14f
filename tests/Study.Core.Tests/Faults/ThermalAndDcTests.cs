// The DC component at contact separation and the thermal equivalent current, against their formulas.
using Study.Core.Faults;

namespace Study.Core.Tests.Faults;

public class ThermalAndDcTests
{
    // IEC 60909-0 asymmetric breaking current (arithmetic on the formula): i_DC = √2·I''k·e^(−2π·f·t·R/X);
    // with R/X = 0.1 at 50 Hz and t = 0.05 s, i_DC/(√2·I''k) = e^(−π/2) ≈ 0.208.
    [Fact]
    public void The_dc_component_with_R_over_X_0_1_at_50_Hz_after_50_ms_is_e_to_minus_pi_over_2()
    {
        double ratio = DcComponent.Current(1.0, 50, 0.05, 0.1) / Math.Sqrt(2);
        Assert.Equal(Math.Exp(-Math.PI / 2), ratio, 12);
        Assert.Equal(0.208, ratio, 3);
        Assert.Equal(Math.Sqrt(2) * 7.5, DcComponent.Current(7.5, 50, 0.1, 0), 12);
    }

    // IEC 60909-0 §4.4 (from memory): f_c/f = 0.27, 0.15, 0.092, 0.055 for f·t_min below 1, 2.5, 5, 12.5.
    [Theory]
    [InlineData(50, 0.010, 0.27)]
    [InlineData(50, 0.0199, 0.27)]
    [InlineData(50, 0.020, 0.15)]
    [InlineData(50, 0.035, 0.15)]
    [InlineData(50, 0.050, 0.092)]
    [InlineData(50, 0.080, 0.092)]
    [InlineData(50, 0.100, 0.055)]
    [InlineData(50, 0.200, 0.055)]
    [InlineData(60, 0.040, 0.15)]
    [InlineData(60, 0.080, 0.092)]
    [InlineData(60, 0.090, 0.055)]
    [InlineData(50, 1.000, 0.055)]
    public void The_equivalent_frequency_for_the_dc_component_follows_f_times_t_min(double f, double t, double ratio) =>
        Assert.Equal(ratio, DcComponent.FrequencyRatio(f, t));

    // IEC 60909-0:2016 §12 (from memory): I_th = I''k·√(m + n), m = (e^(4·f·T_k·ln(κ−1)) − 1)/(2·f·T_k·ln(κ−1)).
    // m is the heat of the DC component √2·I''k·e^(−t/τ) over T_k relative to I''k²·T_k, with the τ that gives
    // κ − 1 = e^(−1/(2·f·τ)) at the first peak: m = (1/(I''k²·T_k))·∫₀^T_k 2·I''k²·e^(−2t/τ) dt. The check
    // integrates that numerically, independently of the closed form, over the κ and f·T_k the standard's
    // figure covers (the grid below) and at points between its curves.
    [Theory]
    [InlineData(1.1, 0.5)]
    [InlineData(1.1, 10)]
    [InlineData(1.3, 1)]
    [InlineData(1.5, 0.5)]
    [InlineData(1.5, 5)]
    [InlineData(1.7, 2)]
    [InlineData(1.8, 5)]
    [InlineData(1.8, 10)]
    [InlineData(1.9, 1)]
    [InlineData(1.9, 50)]
    [InlineData(1.95, 100)]
    [InlineData(1.65, 3)]
    public void The_factor_m_is_the_heat_of_the_decaying_dc_component(double kappa, double fTk)
    {
        const double f = 50;
        double tk = fTk / f;
        double tau = -1 / (2 * f * Math.Log(kappa - 1));
        const int steps = 200_000;
        double sum = 0, dt = tk / steps;
        for (int i = 0; i < steps; i++)
        {
            double t = (i + 0.5) * dt;
            sum += 2 * Math.Exp(-2 * t / tau) * dt;
        }
        Assert.Equal(sum / tk, ThermalEquivalent.M(kappa, f, tk), 6);
    }

    // With no resistance (κ = 2) the DC component never decays: its heat is (√2·I''k)² = 2·I''k², so m = 2;
    // at the instant of the fault m is 2 for any κ; a long fault leaves little of it.
    [Fact]
    public void The_factor_m_is_two_without_decay_and_falls_with_the_fault_duration()
    {
        Assert.Equal(2.0, ThermalEquivalent.M(2.0, 50, 1.0), 9);
        Assert.Equal(2.0, ThermalEquivalent.M(1.8, 50, 1e-9), 6);
        Assert.True(ThermalEquivalent.M(1.8, 50, 3) < ThermalEquivalent.M(1.8, 50, 0.1));
        Assert.Equal(10 * Math.Sqrt(ThermalEquivalent.M(1.8, 50, 1) + 1), ThermalEquivalent.Current(10, 1.8, 50, 1), 12);
    }
}
