// The one table renderer of the command line: aligned columns, numbers right, text left.
using System.Text;

namespace Study.App.Cli;

/// <summary>A plain-text table: add columns, add rows of cells, render with a rule under the header.</summary>
public sealed class TextTable
{
    private readonly List<(string Header, bool RightAligned)> columns = [];
    private readonly List<string[]> rows = [];

    public TextTable Column(string header, bool rightAligned = true)
    {
        columns.Add((header, rightAligned));
        return this;
    }

    public TextTable Left(string header) => Column(header, rightAligned: false);

    public void Row(params string?[] cells)
    {
        if (cells.Length != columns.Count) throw new ArgumentException($"row has {cells.Length} cells for {columns.Count} columns");
        rows.Add(cells.Select(c => c ?? "").ToArray());
    }

    public int RowCount => rows.Count;

    public string Render(string indent = "")
    {
        int[] widths = columns.Select((c, i) => Math.Max(c.Header.Length, rows.Count == 0 ? 0 : rows.Max(r => r[i].Length))).ToArray();
        var sb = new StringBuilder();
        AppendRow(sb, indent, columns.Select(c => c.Header).ToArray(), widths);
        sb.Append(indent).AppendJoin("  ", widths.Select(w => new string('-', w))).Append('\n');
        foreach (string[] row in rows) AppendRow(sb, indent, row, widths);
        return sb.ToString();
    }

    private void AppendRow(StringBuilder sb, string indent, string[] cells, int[] widths)
    {
        var parts = new string[cells.Length];
        for (int i = 0; i < cells.Length; i++)
            parts[i] = columns[i].RightAligned ? cells[i].PadLeft(widths[i]) : cells[i].PadRight(widths[i]);
        sb.Append(indent).Append(string.Join("  ", parts).TrimEnd()).Append('\n');
    }
}
