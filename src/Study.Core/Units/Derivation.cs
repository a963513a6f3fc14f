// Collects derivation steps while a converter computes, so the number and its audit trail are one line.
using System.Globalization;

namespace Study.Core.Units;

/// <summary>A growing list of <see cref="DerivationStep"/>; each call records a value and returns it.</summary>
internal sealed class Derivation
{
    private readonly List<DerivationStep> steps = [];

    public double Step(string label, string formula, double value, string unit)
    {
        steps.Add(new DerivationStep(label, formula, value, unit));
        return value;
    }

    /// <summary>A value that is a default or an assumption, not data.</summary>
    public double Assumed(string label, string formula, double value, string unit, string note)
    {
        steps.Add(new DerivationStep(label, formula, value, unit, note));
        return value;
    }

    public IReadOnlyList<DerivationStep> ToList() => steps.ToArray();

    /// <summary>A number as it appears inside a formula: six significant digits, invariant culture.</summary>
    public static string N(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
