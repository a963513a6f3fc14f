// How numbers appear in validation messages: invariant culture, rounded, no trailing zeros.
using System.Globalization;

namespace Study.Core.Model.Validation;

internal static class Numbers
{
    /// <summary>
    /// "132", "0.415", "51507.54", "1.25e-12", "1e+300": up to six decimals for the numbers a file normally holds (two from 1000 up),
    /// four significant digits in exponent form for the very large and very small, so a value typed in
    /// the wrong unit reads as a number, not as three hundred digits.
    /// </summary>
    public static string Show(double value)
    {
        double magnitude = Math.Abs(value);
        if (double.IsFinite(value) && value != 0 && (magnitude >= 1e7 || magnitude < 1e-4))
            return value.ToString("0.###e+0", CultureInfo.InvariantCulture);
        return value.ToString(magnitude >= 1000 ? "0.##" : "0.######", CultureInfo.InvariantCulture);
    }

    public static string Show(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>Relative difference |a − b| / |b|, for comparing a rated kV with a bus base kV.</summary>
    public static double RelativeDifference(double value, double reference) => Math.Abs(value - reference) / Math.Abs(reference);

    /// <summary>
    /// How far a value is from a reference, in words: "by 23 %" for an ordinary difference, "by a factor of
    /// 1000" once the two are more than three times apart (a unit slip reads better as a factor).
    /// </summary>
    public static string Difference(double value, double reference)
    {
        double factor = Math.Max(Math.Abs(value / reference), Math.Abs(reference / value));
        if (double.IsFinite(factor) && factor > 3)
            return $"by a factor of {Show(Math.Round(factor, factor < 100 ? 1 : 0))}";
        return $"by {(RelativeDifference(value, reference) * 100).ToString("0", CultureInfo.InvariantCulture)} %";
    }

    /// <summary>The larger of a/b and b/a, for "kV 1000 times its neighbour's".</summary>
    public static double Factor(double a, double b) => Math.Max(Math.Abs(a / b), Math.Abs(b / a));
}
