// Renders a report document as Markdown (CommonMark with pipe tables) to attach to a study note.
using System.Text;
using Study.Core.Io;

namespace Study.App.Reports;

public static class MarkdownReport
{
    public static string Render(ReportDocument doc)
    {
        var sb = new StringBuilder();
        sb.Append("# ").Append(Escape(doc.Title)).Append("\n\n");
        if (doc.Inputs.Count > 0)
        {
            foreach (ReportInput input in doc.Inputs)
                sb.Append("- **").Append(Escape(input.Name)).Append(":** ").Append(Escape(input.Value)).Append('\n');
            sb.Append('\n');
        }
        if (doc.Caution is not null) sb.Append("CAUTION: ").Append(Escape(doc.Caution)).Append("\n\n");
        foreach (ReportBlock block in doc.Blocks)
        {
            switch (block)
            {
                case ReportHeading h:
                    sb.Append("## ").Append(Escape(h.Text)).Append("\n\n");
                    break;
                case ReportText t:
                    foreach (string line in t.Lines) sb.Append(Escape(line.Trim())).Append("\n\n");
                    break;
                case ReportList l:
                    foreach (string item in l.Items) sb.Append("- ").Append(Escape(item)).Append('\n');
                    sb.Append('\n');
                    break;
                case ReportTable table:
                    AppendTable(sb, table);
                    break;
                case ReportFigure f when f.Text.Length > 0:
                    sb.Append("```text\n").Append(f.Text.TrimEnd('\n')).Append("\n```\n\n");
                    break;
            }
        }
        return sb.ToString().TrimEnd('\n') + "\n";
    }

    private static void AppendTable(StringBuilder sb, ReportTable table)
    {
        sb.Append('|');
        foreach (ReportColumn c in table.Columns) sb.Append(' ').Append(Cell(c.Header)).Append(" |");
        sb.Append("\n|");
        foreach (ReportColumn c in table.Columns) sb.Append(c.RightAligned ? " ---: |" : " :--- |");
        sb.Append('\n');
        foreach (var row in table.Rows)
        {
            sb.Append('|');
            foreach (string cell in row) sb.Append(' ').Append(Cell(cell)).Append(" |");
            sb.Append('\n');
        }
        sb.Append('\n');
    }

    private static string Cell(string text) => Escape(text.Trim()).Replace("\n", " ");

    /// <summary>Backslash-escapes the characters Markdown would read as markup (ids often hold '_' or '*').</summary>
    internal static string Escape(string text)
    {
        var sb = new StringBuilder(text.Length);
        foreach (char c in text)
        {
            if (c is '\\' or '`' or '*' or '_' or '[' or ']' or '<' or '>' or '|' or '#') sb.Append('\\');
            ControlCharacters.Append(sb, c);
        }
        return sb.ToString();
    }
}

public static class ReportFiles
{
    public static void WriteMarkdown(string path, ReportDocument doc) => AtomicFile.WriteAllText(path, MarkdownReport.Render(doc));
}
