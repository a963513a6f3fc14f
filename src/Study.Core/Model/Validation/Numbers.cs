// How numbers appear in validation messages: invariant culture, no trailing zeros.
using System.Globalization;

namespace Study.Core.Model.Validation;

internal static class Numbers
{
    public static string Show(double value) => value.ToString("0.######", CultureInfo.InvariantCulture);

    public static string Show(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>Relative difference |a − b| / |b|, for comparing a rated kV with a bus base kV.</summary>
    public static double RelativeDifference(double value, double reference) => Math.Abs(value - reference) / Math.Abs(reference);

    public static string Percent(double fraction) => (fraction * 100).ToString("0", CultureInfo.InvariantCulture);
}
