// The factors μ and q of IEC 60909-0:2016 §9.1 at the tabulated minimum time delays and between them.
using Study.Core.Faults;

namespace Study.Core.Tests.Faults;

public class DecayFactorTests
{
    // IEC 60909-0:2016 §9.1.1, equations for μ (from memory): 0.84 + 0.26·e^(−0.26·r) at 0.02 s,
    // 0.71 + 0.51·e^(−0.30·r) at 0.05 s, 0.62 + 0.72·e^(−0.32·r) at 0.10 s, 0.56 + 0.94·e^(−0.38·r) at ≥ 0.25 s,
    // r = I''kG/I_rG. The values below are those equations worked for r = 3, 5 and 8.
    [Theory]
    [InlineData(0.02, 3, 0.959186)]
    [InlineData(0.02, 5, 0.910858)]
    [InlineData(0.02, 8, 0.872482)]
    [InlineData(0.05, 3, 0.917351)]
    [InlineData(0.05, 5, 0.823796)]
    [InlineData(0.05, 8, 0.756266)]
    [InlineData(0.10, 3, 0.895683)]
    [InlineData(0.10, 5, 0.765365)]
    [InlineData(0.10, 8, 0.675659)]
    [InlineData(0.25, 3, 0.860630)]
    [InlineData(0.25, 5, 0.700595)]
    [InlineData(0.25, 8, 0.604965)]
    public void Mu_at_the_tabulated_minimum_time_delays_follows_the_standards_curves(double tMinS, double ratio, double mu) =>
        Assert.Equal(mu, DecayFactors.Mu(tMinS, ratio), 6);

    // Between the tabulated times the standard allows linear interpolation: 0.075 s is halfway from 0.05 to 0.10 s.
    [Theory]
    [InlineData(0.075, 5, 0.794581)]
    [InlineData(0.035, 5, 0.867327)]
    [InlineData(0.175, 5, 0.732980)]
    public void Mu_between_the_tabulated_times_is_interpolated_linearly(double tMinS, double ratio, double mu) =>
        Assert.Equal(mu, DecayFactors.Mu(tMinS, ratio), 6);

    // IEC 60909-0 (from memory): μ = 1 when the machine's current is at most twice its rated current (a distant
    // fault: no decay); later than 0.25 s the 0.25 s curve holds, earlier than 0.02 s the 0.02 s curve; far out
    // the curves level off at 0.84, 0.71, 0.62 and 0.56.
    [Fact]
    public void Mu_is_one_at_or_below_twice_rated_current_and_levels_off_at_the_curves_constants()
    {
        foreach (double t in DecayFactors.Times)
        {
            Assert.Equal(1.0, DecayFactors.Mu(t, 2.0));
            Assert.Equal(1.0, DecayFactors.Mu(t, 0.5));
            Assert.True(DecayFactors.Mu(t, 2.0001) < 1.0);
        }
        Assert.Equal(DecayFactors.Mu(0.25, 6), DecayFactors.Mu(1.0, 6));
        Assert.Equal(DecayFactors.Mu(0.02, 6), DecayFactors.Mu(0.005, 6));
        Assert.Equal(0.84, DecayFactors.Mu(0.02, 1e6), 9);
        Assert.Equal(0.71, DecayFactors.Mu(0.05, 1e6), 9);
        Assert.Equal(0.62, DecayFactors.Mu(0.10, 1e6), 9);
        Assert.Equal(0.56, DecayFactors.Mu(0.25, 1e6), 9);
    }

    // IEC 60909-0:2016 §9.1.2, equations for q (from memory): 1.03 + 0.12·ln m at 0.02 s, 0.79 + 0.12·ln m at
    // 0.05 s, 0.57 + 0.12·ln m at 0.10 s, 0.26 + 0.10·ln m at ≥ 0.25 s, m the rated power per pole pair in MW,
    // q never above 1 (worked for m = 0.1, 0.3, 1 and 5 MW).
    [Theory]
    [InlineData(0.02, 0.1, 0.753690)]
    [InlineData(0.02, 0.3, 0.885523)]
    [InlineData(0.02, 1, 1.0)]
    [InlineData(0.02, 5, 1.0)]
    [InlineData(0.05, 0.1, 0.513690)]
    [InlineData(0.05, 0.3, 0.645523)]
    [InlineData(0.05, 1, 0.79)]
    [InlineData(0.05, 5, 0.983133)]
    [InlineData(0.10, 0.1, 0.293690)]
    [InlineData(0.10, 0.3, 0.425523)]
    [InlineData(0.10, 1, 0.57)]
    [InlineData(0.10, 5, 0.763133)]
    [InlineData(0.25, 0.1, 0.029741)]
    [InlineData(0.25, 0.3, 0.139603)]
    [InlineData(0.25, 1, 0.26)]
    [InlineData(0.25, 5, 0.420944)]
    public void Q_at_the_tabulated_minimum_time_delays_follows_the_standards_curves(double tMinS, double mwPerPolePair, double q) =>
        Assert.Equal(q, DecayFactors.Q(tMinS, mwPerPolePair), 6);

    [Fact]
    public void Q_between_the_tabulated_times_is_interpolated_and_stays_within_zero_and_one()
    {
        // Halfway from 0.05 to 0.10 s at 0.5 MW per pole pair: (0.79 + 0.57)/2 + 0.12·ln 0.5.
        Assert.Equal(0.596822, DecayFactors.Q(0.075, 0.5), 6);
        // A very small motor late on: 0.26 + 0.10·ln 0.01 is below zero, clipped to 0 (its AC part has gone).
        Assert.Equal(0.0, DecayFactors.Q(0.25, 0.01));
        Assert.Equal(1.0, DecayFactors.Q(0.02, 50));
    }

    // The decay of one machine's current: ΔU''/(c·U_n/√3)·(1 − μ·q)·I''k_i (IEC 60909-0 §9.1.3, from memory).
    [Fact]
    public void A_machines_decay_is_its_voltage_share_times_one_minus_mu_q_times_its_current()
    {
        var motor = new MachineContribution("M", Asynchronous: true, CurrentPu: 0.4, DropOverC: 0.95, RatedRatio: 5, MwPerPolePair: 1);
        Assert.Equal(0.95 * (1 - 0.765365 * 0.57) * 0.4, motor.DecayPu(0.10), 6);
        var generator = motor with { Asynchronous = false };
        Assert.Equal(0.95 * (1 - 0.765365) * 0.4, generator.DecayPu(0.10), 6);
        Assert.Equal(0, (motor with { RatedRatio = 1.5, Asynchronous = false }).DecayPu(0.10));
    }
}
