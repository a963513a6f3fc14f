// The decaying DC component of a short-circuit current at the moment a breaker's contacts part.
namespace Study.Core.Faults;

/// <summary>
/// i_DC = √2·I''k·e^(−2π·f·t·R/X) (IEC 60909-0:2016 §4.4, from memory). In meshed networks R/X comes from
/// the equivalent-frequency method with f_c/f = 0.27, 0.15, 0.092, 0.055 for f·t below 1, 2.5, 5 and 12.5
/// (the last beyond), the network's reactances taken at f_c: R/X = (R_c/X_c)·(f_c/f).
/// </summary>
public static class DcComponent
{
    private static readonly (double Cycles, double Ratio)[] Steps = [(1, 0.27), (2.5, 0.15), (5, 0.092), (12.5, 0.055)];

    /// <summary>f_c/f for a current observed <paramref name="timeS"/> after the fault begins.</summary>
    public static double FrequencyRatio(double frequencyHz, double timeS)
    {
        double cycles = frequencyHz * timeS;
        foreach (var (limit, ratio) in Steps)
            if (cycles < limit) return ratio;
        return Steps[^1].Ratio;
    }

    /// <summary>i_DC for an initial symmetrical current <paramref name="ik"/> (any unit: the result is in the same one).</summary>
    public static double Current(double ik, double frequencyHz, double timeS, double rOverX) =>
        Math.Sqrt(2) * ik * Math.Exp(-2 * Math.PI * frequencyHz * timeS * Math.Max(rOverX, 0));
}
