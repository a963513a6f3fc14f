// Ready-formatted text cells as a Terminal.Gui table source: the one source every TUI table uses.
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>Headers and rows of text; views only display it.</summary>
public sealed class TextTableSource(IReadOnlyList<string> headers, IReadOnlyList<string[]> rows) : ITableSource
{
    public static TextTableSource Empty(params string[] headers) => new(headers, []);

    public IReadOnlyList<string[]> RowCells => rows;
    public string[] ColumnNames { get; } = [.. headers];
    public int Columns => ColumnNames.Length;
    public int Rows => rows.Count;
    public object this[int row, int col] => rows[row][col];
}
