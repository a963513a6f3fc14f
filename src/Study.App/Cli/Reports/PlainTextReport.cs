// Renders a report document for the terminal: the title line, blocks in order, tables through TextTable.
using System.Text;

namespace Study.App.Cli.Reports;

public static class PlainTextReport
{
    private const string Indent = "  ";

    public static string Render(ReportDocument doc)
    {
        var sb = new StringBuilder();
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
                    sb.Append(ToTextTable(table).Render(Indent));
                    break;
                case ReportFigure f:
                    sb.Append(f.Text);
                    break;
            }
        }
        return sb.ToString();
    }

    private static TextTable ToTextTable(ReportTable table)
    {
        var text = new TextTable();
        foreach (ReportColumn c in table.Columns) text.Column(c.Header, c.RightAligned);
        foreach (var row in table.Rows) text.Row(row.ToArray());
        return text;
    }
}
