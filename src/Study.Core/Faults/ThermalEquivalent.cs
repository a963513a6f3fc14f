// The thermal equivalent short-circuit current of IEC 60909-0: the steady current that heats as much as the fault.
namespace Study.Core.Faults;

/// <summary>
/// I_th = I''k·√(m + n) for a fault lasting T_k (IEC 60909-0:2016 §12, from memory). m is the heat of the DC
/// component, m = (1/(2·f·T_k·ln(κ − 1)))·(e^(4·f·T_k·ln(κ − 1)) − 1): the DC component √2·I''k·e^(−t/τ) with
/// the time constant τ that gives κ − 1 = e^(−1/(2·f·τ)) at the first peak; m → 2 as κ → 2 (no decay). n is
/// the heat of the decaying AC component; far from generators n = 1.
/// </summary>
public static class ThermalEquivalent
{
    /// <summary>n far from generators (no AC decay), the simplification this program makes.</summary>
    public const double FarFromGenerators = 1.0;

    public static double M(double kappa, double frequencyHz, double durationS)
    {
        double a = Math.Log(Math.Max(kappa - 1, 1e-300));
        double x = 2 * frequencyHz * durationS * a;
        // (e^(2x) − 1)/x → 2 as x → 0; the series keeps it exact to rounding near there.
        if (Math.Abs(x) < 1e-8) return 2 + 2 * x;
        return (Math.Exp(2 * x) - 1) / x;
    }

    public static double Current(double ik, double kappa, double frequencyHz, double durationS, double n = FarFromGenerators) =>
        ik * Math.Sqrt(M(kappa, frequencyHz, durationS) + n);
}
