// Renders a report document for the terminal: the caution and title lines, blocks in order, tables as aligned columns.
using System.Text;

namespace Study.App.Reports;

public static class PlainTextReport
{
    private const string Indent = "  ";

    public static string Render(ReportDocument doc)
    {
        var sb = new StringBuilder();
        if (doc.Caution is not null) sb.Append("CAUTION: ").Append(doc.Caution).Append("\n\n");
        sb.Append(doc.Title).Append('\n');
        foreach (ReportBlock block in doc.Blocks)
        {
            if (block.SpaceBefore || block is ReportHeading) sb.Append('\n');
            switch (block)
            {
                case ReportHeading h:
                    sb.Append(h.Text).Append('\n');
                    break;
                case ReportText t:
                    foreach (string line in t.Lines) sb.Append(line).Append('\n');
                    break;
                case ReportList l:
                    foreach (string item in l.Items) sb.Append(Indent).Append(item).Append('\n');
                    break;
                case ReportTable table:
                    sb.Append(Table(table, Indent));
                    break;
                case ReportFigure f:
                    sb.Append(f.Text);
                    break;
            }
        }
        return sb.ToString();
    }

    /// <summary>Aligned columns, numbers right and text left, a rule of dashes under the header; lines end without spaces.</summary>
    public static string Table(ReportTable table, string indent = "")
    {
        int[] widths = table.Columns.Select((c, i) => Math.Max(c.Header.Length, table.Rows.Count == 0 ? 0 : table.Rows.Max(r => r[i].Length))).ToArray();
        var sb = new StringBuilder();
        AppendRow(sb, table, indent, table.Columns.Select(c => c.Header).ToArray(), widths);
        sb.Append(indent).AppendJoin("  ", widths.Select(w => new string('-', w))).Append('\n');
        foreach (IReadOnlyList<string> row in table.Rows) AppendRow(sb, table, indent, row, widths);
        return sb.ToString();
    }

    private static void AppendRow(StringBuilder sb, ReportTable table, string indent, IReadOnlyList<string> cells, int[] widths)
    {
        var parts = new string[cells.Count];
        for (int i = 0; i < cells.Count; i++)
            parts[i] = table.Columns[i].RightAligned ? cells[i].PadLeft(widths[i]) : cells[i].PadRight(widths[i]);
        sb.Append(indent).Append(string.Join("  ", parts).TrimEnd()).Append('\n');
    }
}
