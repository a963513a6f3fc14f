// Ready-formatted text cells as a Terminal.Gui table source: the one source every TUI table uses.
using Terminal.Gui.Views;

namespace Study.App.Reports;

/// <summary>Headers and rows of text; views only display it. Result tables are made from a column spec.</summary>
public sealed class TextTableSource(IReadOnlyList<string> headers, IReadOnlyList<string[]> rows) : ITableSource
{
    public static TextTableSource Empty(params string[] headers) => new(headers, []);

    /// <summary>The readable cells of a spec over its rows, exactly as plain text and Markdown show them.</summary>
    public static TextTableSource Of<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows) => new(spec.Headings, spec.ReadableRows(rows));

    public IReadOnlyList<string[]> RowCells => rows;
    public string[] ColumnNames { get; } = [.. headers];
    public int Columns => ColumnNames.Length;
    public int Rows => rows.Count;
    public object this[int row, int col] => rows[row][col];
}
