// Collects derivation steps while a converter computes, so the number and its audit trail are one line.
using System.Globalization;
using System.Runtime.CompilerServices;

namespace Study.Core.Units;

/// <summary>
/// A growing list of <see cref="DerivationStep"/>; each call records a value and returns it.
/// A derivation made with <c>record: false</c> returns the values and keeps nothing: the model
/// build converts every element and needs no steps, and formatting them was most of its time.
/// Labels and formulas are <see cref="StepText"/>, so their holes are not even evaluated then.
/// </summary>
internal sealed class Derivation(bool record = true)
{
    private readonly List<DerivationStep>? steps = record ? [] : null;

    /// <summary>False when the steps are not wanted (the model build); the step texts are then never formatted.</summary>
    public bool Recording => steps is not null;

    public double Step(
        [InterpolatedStringHandlerArgument("")] StepText label,
        [InterpolatedStringHandlerArgument("")] StepText formula,
        double value, string unit)
    {
        steps?.Add(new DerivationStep(label.ToStringAndClear(), formula.ToStringAndClear(), value, unit));
        return value;
    }

    /// <summary>A value that is a default or an assumption, not data.</summary>
    public double Assumed(
        [InterpolatedStringHandlerArgument("")] StepText label,
        [InterpolatedStringHandlerArgument("")] StepText formula,
        double value, string unit, string note)
    {
        steps?.Add(new DerivationStep(label.ToStringAndClear(), formula.ToStringAndClear(), value, unit, note));
        return value;
    }

    public IReadOnlyList<DerivationStep> ToList() => steps is null ? [] : steps.ToArray();

    /// <summary>A number as it appears inside a formula: six significant digits, invariant culture.</summary>
    public static string N(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}

/// <summary>
/// One step from nameplate data towards a system per-unit value: what it is, the formula with its
/// numbers substituted, and the result. <paramref name="Note"/> is set when the value is a default
/// or an assumption rather than data, so nobody mistakes it for data.
/// </summary>
public sealed record DerivationStep(string Label, string Formula, double Value, string Unit, string? Note = null);
