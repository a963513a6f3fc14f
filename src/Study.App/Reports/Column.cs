// One column of a result table, declared once and read by every renderer (plain text, Markdown, CSV, the TUI).
namespace Study.App.Reports;

public enum Align { Left, Right }

/// <summary>
/// The machine key CSV writes as its header, the header in words and the unit the readable tables
/// show, the alignment, and the two readings of a row: <see cref="Value"/> is the quantity itself
/// (what CSV writes, null when absent), <see cref="Text"/> how a person reads it (decimals, marks).
/// A column without a key is for readers only; one without a header is for CSV only.
/// </summary>
public sealed record Column<TRow>
{
    public string? Key { get; init; }
    public string? Header { get; init; }
    public string? Unit { get; init; }
    public Align Align { get; init; } = Align.Right;
    public Func<TRow, object?> Value { get; init; } = _ => null;
    public Func<TRow, string> Text { get; init; } = _ => "";

    /// <summary>Readable tables leave the cell empty where it repeats the row above, so each group is named once.</summary>
    public bool NamesGroup { get; init; }

    public bool IsReadable => Header is not null;
    public bool IsMachine => Key is not null;

    /// <summary>The header with its unit: "V pu", "loading %", or the unit alone ("kV").</summary>
    public string Heading => string.IsNullOrEmpty(Unit) ? Header ?? "" : string.IsNullOrEmpty(Header) ? Unit : $"{Header} {Unit}";
}
