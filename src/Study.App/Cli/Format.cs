// Number formatting for readable output: invariant culture, fixed decimals, "-" for absent values.
using System.Globalization;

namespace Study.App.Cli;

public static class Format
{
    public static string F(double value, int decimals) => value.ToString("F" + decimals, CultureInfo.InvariantCulture);

    public static string F(double? value, int decimals, string absent = "-") => value is double v ? F(v, decimals) : absent;

    public static string I(int value) => value.ToString(CultureInfo.InvariantCulture);

    public static string E(double value) => value.ToString("0.0e+0", CultureInfo.InvariantCulture);
}
