// A table of ready-formatted text cells: the one table source every TUI table uses.
using Terminal.Gui.Views;

namespace Study.App.Tui;

/// <summary>Headers and rows of text; views only display it.</summary>
public sealed class TextTable(IReadOnlyList<string> headers, IReadOnlyList<string[]> rows) : ITableSource
{
    public static TextTable Empty(params string[] headers) => new(headers, []);

    public IReadOnlyList<string[]> RowCells => rows;
    public string[] ColumnNames { get; } = [.. headers];
    public int Columns => ColumnNames.Length;
    public int Rows => rows.Count;
    public object this[int row, int col] => rows[row][col];
}
