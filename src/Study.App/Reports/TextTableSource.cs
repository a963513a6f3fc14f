// Ready-formatted text cells as a Terminal.Gui table source: the one source every TUI table uses.
using Terminal.Gui.Views;

namespace Study.App.Reports;

/// <summary>
/// Headers and rows of text; views only display it. Result tables are made from a column spec. A
/// group-naming cell (the scenario of a run of outages) is blank where it repeats the row above;
/// <see cref="FullCells"/> keeps every cell, for a table sorted into another order.
/// </summary>
public sealed class TextTableSource(IReadOnlyList<string> headers, IReadOnlyList<string[]> rows, IReadOnlyList<string[]>? fullCells = null) : ITableSource
{
    public static TextTableSource Empty(params string[] headers) => new(headers, []);

    /// <summary>The readable cells of a spec over its rows, exactly as plain text and Markdown show them.</summary>
    public static TextTableSource Of<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows)
    {
        var list = rows as IReadOnlyList<TRow> ?? rows.ToList();
        return new(spec.Headings, spec.ReadableRows(list), spec.ReadableRows(list, blankRepeats: false));
    }

    public IReadOnlyList<string[]> RowCells => rows;

    /// <summary>Every cell, group names repeated on every row.</summary>
    public IReadOnlyList<string[]> FullCells { get; } = fullCells ?? rows;

    public string[] ColumnNames { get; } = [.. headers];
    public int Columns => ColumnNames.Length;
    public int Rows => rows.Count;
    public object this[int row, int col] => rows[row][col];
}
