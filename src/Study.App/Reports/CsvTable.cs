// A column spec over its rows as CSV: the machine keys as the header, RFC 4180 quoting, written atomically.
using System.Text;
using Study.Core.Io;

namespace Study.App.Reports;

public sealed class CsvTable
{
    private readonly StringBuilder text = new();

    private CsvTable(string[] header, IEnumerable<string[]> rows)
    {
        AppendRow(header);
        foreach (string[] row in rows) AppendRow(row);
    }

    /// <summary>Cells as <see cref="Numbers.Csv"/> writes them: empty where absent, numbers round-trip, "inf".</summary>
    public static CsvTable Of<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows) => new(spec.Keys, spec.MachineRows(rows));

    public override string ToString() => text.ToString();

    public void Write(string path) => AtomicFile.WriteAllText(path, text.ToString());

    /// <summary>RFC 4180: a cell holding a comma, quote or line break is quoted, its quotes doubled; rows end in CRLF.</summary>
    private void AppendRow(string[] cells)
    {
        for (int i = 0; i < cells.Length; i++)
        {
            if (i > 0) text.Append(',');
            string c = cells[i];
            if (c.IndexOfAny([',', '"', '\n', '\r']) >= 0) text.Append('"').Append(c.Replace("\"", "\"\"")).Append('"');
            else text.Append(c);
        }
        text.Append("\r\n");
    }
}
