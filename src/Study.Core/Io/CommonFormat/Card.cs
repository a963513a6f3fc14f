// One card (line) of an IEEE Common Format file, read by the fixed columns the format defines.
using System.Globalization;
using Study.Core.Model;

namespace Study.Core.Io.CommonFormat;

/// <summary>A field of a card: its name in messages and its 1-based first and last column.</summary>
internal readonly record struct Field(string Name, int First, int Last);

/// <summary>
/// One line of the file with its 1-based line number. Columns past the end of a short line read as
/// blank and a blank numeric field reads as 0: archive files often stop after the last non-zero field.
/// Every problem becomes an <see cref="InputException"/> at the field's first column.
/// </summary>
internal readonly struct Card
{
    private readonly string text;
    private readonly string kind;
    private readonly string? fileName;

    /// <param name="kind">"title", "bus" or "branch": the first word of every message.</param>
    public Card(string text, int line, string kind, string? fileName)
    {
        this.text = text;
        this.kind = kind;
        this.fileName = fileName;
        Line = line;
    }

    public int Line { get; }

    /// <summary>The field's columns as written, clipped to the line; "" when the line stops before it.</summary>
    public string Text(Field field)
    {
        int start = field.First - 1;
        if (start >= text.Length) return "";
        return text.Substring(start, Math.Min(field.Last, text.Length) - start);
    }

    public string Trimmed(Field field) => Text(field).Trim();

    /// <summary>A real number; blank is 0. NaN and infinity are refused, whatever their spelling.</summary>
    public double Number(Field field)
    {
        string s = Trimmed(field);
        if (s.Length == 0) return 0;
        if (!double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
            throw Error(field, $"is not a number: '{s}'");
        if (!double.IsFinite(value)) throw Error(field, $"is not a finite number: '{s}'");
        return value;
    }

    /// <summary>A whole number; blank is 0.</summary>
    public int Integer(Field field) => OptionalInteger(field) ?? 0;

    /// <summary>A whole number, or null when the field is blank.</summary>
    public int? OptionalInteger(Field field)
    {
        string s = Trimmed(field);
        if (s.Length == 0) return null;
        if (!int.TryParse(s, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int value))
            throw Error(field, $"is not a whole number: '{s}'");
        return value;
    }

    /// <summary>A bus number: a whole number above zero, never blank.</summary>
    public int BusNumber(Field field)
    {
        int? number = OptionalInteger(field);
        if (number is null) throw Error(field, "is blank");
        if (number <= 0) throw Error(field, $"must be above zero: '{Trimmed(field)}'");
        return number.Value;
    }

    /// <summary>
    /// Whitespace-separated numbers inside a span of columns, each checked at its own column; for
    /// trailing fields that the archive files do not keep inside their nominal columns.
    /// </summary>
    public double[] Numbers(Field span, string[] names)
    {
        var values = new double[names.Length];
        string s = Text(span);
        int index = 0;
        int i = 0;
        while (i < s.Length)
        {
            if (char.IsWhiteSpace(s[i])) { i++; continue; }
            int start = i;
            while (i < s.Length && !char.IsWhiteSpace(s[i])) i++;
            int column = span.First + start;
            if (index == names.Length)
                throw Error(new Field(span.Name, column, column), $"holds more than {names.Length} numbers");
            values[index] = Number(new Field(names[index], column, span.First + i - 1));
            index++;
        }
        return values;
    }

    /// <summary>Tabs would shift every later field: the format counts columns, not separators.</summary>
    public void RejectTabs()
    {
        int tab = text.IndexOf('\t', StringComparison.Ordinal);
        if (tab >= 0)
            throw new InputException(
                $"{kind} card: tab character at column {tab + 1}; the format is read by fixed columns, so use spaces",
                fileName, Line, tab + 1);
    }

    public InputException Error(Field field, string problem) =>
        new($"{kind} card: '{field.Name}' {problem}", fileName, Line, field.First);
}
