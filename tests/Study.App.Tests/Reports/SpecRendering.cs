// Renders one column spec over its rows in every output and reads each back the way a reader or another tool would.
using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using Study.App.Reports;
using Study.App.Tests.Cli;

namespace Study.App.Tests.Reports;

internal static partial class SpecRendering
{
    /// <summary>
    /// Asserts that plain text, Markdown and the TUI source show the same headers and cells, and that
    /// the CSV carries the same quantities: its header is the spec's keys, and where a readable cell
    /// shows a number the CSV cell holds that number before rounding ('∞' is "inf", '—' an empty cell).
    /// </summary>
    public static void AssertSameCells<TRow>(ColumnSpec<TRow> spec, IReadOnlyList<TRow> rows)
    {
        Assert.NotEmpty(rows);
        List<string[]> text = PlainText(spec, rows);
        List<string[]> markdown = Markdown(spec, rows);
        List<string[]> screen = Screen(spec, rows);
        Assert.Equal(rows.Count + 1, text.Count);
        Assert.Equal(text, markdown);
        Assert.Equal(text, screen);

        List<string[]> csv = Csv(CsvTable.Of(spec, rows).ToString());
        Assert.Equal(spec.Keys, csv[0]);
        Assert.Equal(rows.Count + 1, csv.Count);
        Column<TRow>[] readable = spec.Readable.ToArray(), machine = spec.Machine.ToArray();
        for (int c = 0; c < readable.Length; c++)
        {
            int k = Array.IndexOf(machine, readable[c]);
            if (k < 0) continue;
            for (int r = 0; r < rows.Count; r++)
                AssertSameQuantity(readable[c].Heading, text[r + 1][c], csv[r + 1][k]);
        }
    }

    private static void AssertSameQuantity(string heading, string shown, string written)
    {
        string where = $"column '{heading}': shown '{shown}', written '{written}'";
        if (shown == Numbers.Blank) Assert.True(written is "" or "0", where);
        else if (shown == Numbers.Infinity) Assert.True(written == "inf", where);
        else if (LeadingNumber().Match(shown) is { Success: true } m)
        {
            Assert.True(double.TryParse(written, NumberStyles.Float, CultureInfo.InvariantCulture, out double value), where);
            double number = double.Parse(m.Value, CultureInfo.InvariantCulture);
            int decimals = m.Groups["fraction"].Success ? m.Groups["fraction"].Value.Length : 0;
            double tolerance = m.Groups["exponent"].Success ? 0.051 * Math.Abs(number) : 0.5 * Math.Pow(10, -decimals) + 1e-9 * Math.Abs(value);
            Assert.True(Math.Abs(value - number) <= tolerance, where);
        }
    }

    /// <summary>Cells of an aligned plain-text table, cut at the column rule under the header.</summary>
    public static List<string[]> PlainText<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows)
    {
        string[] lines = PlainTextReport.Table(ReportTable.Of(spec, rows)).TrimEnd('\n').Split('\n');
        // The rule is one run of dashes per column, two spaces apart; an empty column has a run of none.
        var spans = new List<(int Index, int Length)>();
        int at = 0;
        foreach (string dashes in lines[1].Split("  "))
        {
            spans.Add((at, dashes.Length));
            at += dashes.Length + 2;
        }
        return lines.Where((_, i) => i != 1)
            .Select(line => spans.Select(s => s.Index >= line.Length ? "" : line.Substring(s.Index, Math.Min(s.Length, line.Length - s.Index)).Trim()).ToArray())
            .ToList();
    }

    public static List<string[]> Markdown<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows)
    {
        string md = MarkdownReport.Render(new ReportDocument("table").Table(spec, rows));
        string[] lines = md.Split('\n').Where(l => l.StartsWith('|')).ToArray();
        return lines.Where((_, i) => i != 1).Select(l => ReportChecks.Cells(l).ToArray()).ToList();
    }

    public static List<string[]> Screen<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows)
    {
        TextTableSource source = TextTableSource.Of(spec, rows);
        var cells = new List<string[]> { source.ColumnNames.Select(h => h.Trim()).ToArray() };
        for (int r = 0; r < source.Rows; r++)
            cells.Add(Enumerable.Range(0, source.Columns).Select(c => ((string)source[r, c]).Trim()).ToArray());
        return cells;
    }

    /// <summary>RFC 4180 records: quoted cells may hold commas, doubled quotes and line breaks; records end in CRLF.</summary>
    public static List<string[]> Csv(string text)
    {
        var records = new List<string[]>();
        var record = new List<string>();
        var cell = new StringBuilder();
        bool quoted = false;
        for (int i = 0; i < text.Length; i++)
        {
            char ch = text[i];
            if (quoted)
            {
                if (ch == '"' && i + 1 < text.Length && text[i + 1] == '"') { cell.Append('"'); i++; }
                else if (ch == '"') quoted = false;
                else cell.Append(ch);
            }
            else if (ch == '"') quoted = true;
            else if (ch == ',') { record.Add(cell.ToString()); cell.Clear(); }
            else if (ch == '\r' && i + 1 < text.Length && text[i + 1] == '\n')
            {
                record.Add(cell.ToString());
                cell.Clear();
                records.Add([.. record]);
                record.Clear();
                i++;
            }
            else cell.Append(ch);
        }
        return records;
    }

    [GeneratedRegex(@"^[+-]?\d+(\.(?<fraction>\d+))?(?<exponent>e[+-]?\d+)?(?![\w.])")]
    private static partial Regex LeadingNumber();
}
