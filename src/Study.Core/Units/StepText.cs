// The label or formula of a derivation step, formatted only when the derivation records its steps.
using System.Runtime.CompilerServices;

namespace Study.Core.Units;

/// <summary>
/// An interpolated-string handler bound to a <see cref="Derivation"/>: when the derivation does not
/// record, the compiler skips every hole (no <c>N(...)</c> call, no string built). A plain string
/// converts to it as is, so fixed labels and formulas need no interpolation.
/// </summary>
[InterpolatedStringHandler]
internal ref struct StepText
{
    private DefaultInterpolatedStringHandler builder;
    private readonly string? text;
    private readonly bool building;

    public StepText(int literalLength, int formattedCount, Derivation derivation, out bool enabled)
    {
        enabled = derivation.Recording;
        building = enabled;
        text = null;
        if (enabled) builder = new DefaultInterpolatedStringHandler(literalLength, formattedCount);
    }

    private StepText(string text)
    {
        this.text = text;
        building = false;
    }

    public static implicit operator StepText(string text) => new(text);

    public void AppendLiteral(string value) => builder.AppendLiteral(value);

    public void AppendFormatted<T>(T value) => builder.AppendFormatted(value);

    public void AppendFormatted<T>(T value, string? format) => builder.AppendFormatted(value, format);

    /// <summary>The text; empty when the derivation was not recording.</summary>
    public string ToStringAndClear() => text ?? (building ? builder.ToStringAndClear() : "");
}
