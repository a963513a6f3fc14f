// The one number formatter of every output: invariant culture, fixed decimals, one mark for an absent value
// and one for an unbounded one in readable text; machine-friendly cells for CSV.
using System.Globalization;

namespace Study.App.Reports;

public static class Numbers
{
    /// <summary>What a readable table shows where a quantity has no value (kV not stated, a dead bus, no rating).</summary>
    public const string Blank = "—";

    /// <summary>What a readable table shows for an unbounded quantity (X/R of a fault with no resistance).</summary>
    public const string Infinity = "∞";

    /// <summary>An unbounded value in CSV: a word other tools read back as a number.</summary>
    public const string CsvInfinity = "inf";

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Fixed decimals: "1.0120"; null or NaN reads <see cref="Blank"/>, ±infinity reads <see cref="Infinity"/>.</summary>
    public static string Fixed(double? value, int decimals) => Marked(value) ?? value!.Value.ToString("F" + decimals, Inv);

    /// <summary>Up to <paramref name="decimals"/> decimals, trailing zeros dropped: "132", "0.415".</summary>
    public static string UpTo(double? value, int decimals) => Marked(value) ?? value!.Value.ToString("0." + new string('#', decimals), Inv);

    /// <summary>"+0.0043", "-0.0120"; a change that rounds to nothing reads "+0.00", never "-0.00".</summary>
    public static string Signed(double? value, int decimals)
    {
        if (Marked(value) is string mark) return value is double v && v > 0 ? "+" + mark : mark;
        double shown = Math.Round(value!.Value, decimals);
        if (shown == 0) shown = 0;
        return (shown >= 0 ? "+" : "") + shown.ToString("F" + decimals, Inv);
    }

    public static string Integer(int? value) => value is int v ? v.ToString(Inv) : Blank;

    /// <summary>A mismatch or tolerance: "4.0e-9".</summary>
    public static string Exponent(double value) => Marked(value) ?? value.ToString("0.0e+0", Inv);

    public static string Text(string? value) => value ?? Blank;

    /// <summary>
    /// A CSV cell: absent is an empty cell, numbers round-trip ("R"), infinity is "inf", anything
    /// else in the invariant culture.
    /// </summary>
    public static string Csv(object? value) => value switch
    {
        null => "",
        double d when double.IsNaN(d) => "",
        double d when double.IsInfinity(d) => d > 0 ? CsvInfinity : "-" + CsvInfinity,
        double d => d.ToString("R", Inv),
        IFormattable f => f.ToString(null, Inv),
        _ => value.ToString() ?? "",
    };

    /// <summary>The mark for a value that is not an ordinary number, or null for one that is.</summary>
    private static string? Marked(double? value) => value switch
    {
        null => Blank,
        double v when double.IsNaN(v) => Blank,
        double.PositiveInfinity => Infinity,
        double.NegativeInfinity => "-" + Infinity,
        _ => null,
    };
}
