// Random choices read one by one from a generated list of numbers, so a generated network shrinks with the list.
using System.Globalization;
using CsCheck;

namespace Study.Core.Tests.Properties;

/// <summary>
/// A sequence of random numbers that a builder reads as choices. Past its end every choice is the
/// smallest (0, false, the first option), so CsCheck's shrinking of the list — fewer and smaller
/// numbers — gives smaller, plainer networks.
/// </summary>
internal sealed class Tape(uint[] values)
{
    private int next;

    public static Gen<uint[]> Gen(int min, int max) => CsCheck.Gen.UInt.Array[min, max];

    private uint Next() => next < values.Length ? values[next++] : 0;

    public int Int(int min, int max) => min + (int)(Next() % (uint)(max - min + 1));

    public bool Chance(int percent) => Next() % 100 < (uint)percent;

    /// <summary>Uniform in [min, max], rounded to a few digits as engineers write values.</summary>
    public double Double(double min, double max, int digits = 4) =>
        Math.Round(min + (max - min) * (Next() / (double)uint.MaxValue), digits);

    public double? Maybe(double min, double max, int percent = 50) => Chance(percent) ? Double(min, max) : null;

    /// <summary>Any finite double, bit pattern and all: tests that numbers survive the file exactly.</summary>
    public double AnyFinite()
    {
        double d = BitConverter.Int64BitsToDouble(((long)Next() << 32) | Next());
        return double.IsFinite(d) ? d : 0;
    }

    public T Pick<T>(IReadOnlyList<T> options) => options[Int(0, options.Count - 1)];

    /// <summary>A name with the characters a real file can hold: accents, other scripts, quotes, backslashes, emoji.</summary>
    public string Text()
    {
        string[] parts = ["Bus", "Quay", "Mühle", "Ωhm", "变电站", "Σ-feeder", "\"quoted\"", "back\\slash", "tab\there", "🔌", "línea", "ø", " ", "/", "#1"];
        int count = Int(0, 3);
        var s = new System.Text.StringBuilder();
        for (int i = 0; i < count; i++) s.Append(Pick(parts));
        return s.ToString();
    }

    public string Id(string prefix, int index) => prefix + index.ToString(CultureInfo.InvariantCulture) + (Chance(10) ? "é" : "");
}
