// The factors μ and q of IEC 60909-0 that give the symmetrical breaking current of machines near the fault.
namespace Study.Core.Faults;

/// <summary>
/// IEC 60909-0:2016 §9.1 (from memory), as functions of the minimum time delay t_min:
/// μ = 0.84 + 0.26·e^(−0.26·r) at 0.02 s, 0.71 + 0.51·e^(−0.30·r) at 0.05 s, 0.62 + 0.72·e^(−0.32·r) at
/// 0.10 s and 0.56 + 0.94·e^(−0.38·r) at 0.25 s and later, with r = I''kG/I_rG (or I''kM/I_rM), μ = 1 for
/// r ≤ 2 and never above 1; q = 1.03 + 0.12·ln m at 0.02 s, 0.79 + 0.12·ln m at 0.05 s, 0.57 + 0.12·ln m at
/// 0.10 s, 0.26 + 0.10·ln m at 0.25 s and later, with m the rated power per pole pair in MW, q within 0..1.
/// Between the tabulated times both are interpolated linearly (the standard allows it); before 0.02 s
/// the 0.02 s values hold.
/// </summary>
public static class DecayFactors
{
    /// <summary>The minimum time delays the standard tabulates, s.</summary>
    public static IReadOnlyList<double> Times { get; } = [0.02, 0.05, 0.10, 0.25];

    private static readonly (double A, double B, double C)[] MuCurves =
        [(0.84, 0.26, 0.26), (0.71, 0.51, 0.30), (0.62, 0.72, 0.32), (0.56, 0.94, 0.38)];

    private static readonly (double A, double B)[] QCurves = [(1.03, 0.12), (0.79, 0.12), (0.57, 0.12), (0.26, 0.10)];

    /// <summary>μ at <paramref name="tMinS"/> for a machine whose contribution is <paramref name="ratio"/> times its rated current.</summary>
    public static double Mu(double tMinS, double ratio)
    {
        if (ratio <= 2) return 1.0;
        return Math.Min(1.0, Interpolate(tMinS, k => MuCurves[k].A + MuCurves[k].B * Math.Exp(-MuCurves[k].C * ratio)));
    }

    /// <summary>q at <paramref name="tMinS"/> for an asynchronous machine of <paramref name="mwPerPolePair"/> MW per pole pair.</summary>
    public static double Q(double tMinS, double mwPerPolePair)
    {
        if (!(mwPerPolePair > 0)) return 0.0;
        double ln = Math.Log(mwPerPolePair);
        return Math.Clamp(Interpolate(tMinS, k => QCurves[k].A + QCurves[k].B * ln), 0.0, 1.0);
    }

    /// <summary>The value of the curve for t_min, linear between the tabulated times, flat outside them.</summary>
    private static double Interpolate(double tMinS, Func<int, double> curve)
    {
        IReadOnlyList<double> t = Times;
        if (tMinS <= t[0]) return curve(0);
        for (int k = 1; k < t.Count; k++)
        {
            if (tMinS > t[k]) continue;
            double w = (tMinS - t[k - 1]) / (t[k] - t[k - 1]);
            return (1 - w) * curve(k - 1) + w * curve(k);
        }
        return curve(t.Count - 1);
    }
}
