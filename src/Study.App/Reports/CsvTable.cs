// A column spec over its rows as CSV: the machine keys as the header, RFC 4180 quoting, formula-safe cells,
// written atomically, a result's tables as one set.
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

    /// <summary>The tables of one result into <paramref name="dir"/> as a set: all of them replace the previous set, or none does.</summary>
    public static void WriteSet(string dir, params (string Name, CsvTable Table)[] tables) =>
        AtomicFolder.Write(dir, tables.Select(t => (t.Name, Utf8.GetBytes(t.Table.ToString()))).ToList());

    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>
    /// A text cell that a spreadsheet would run as a formula (it starts with =, +, -, @, a tab or a carriage
    /// return) gets a leading apostrophe, the usual guard against formula injection (OWASP, "CSV
    /// Injection"). A number keeps its sign: "-3.75" is data, not a formula.
    /// </summary>
    public static string Neutralised(string cell)
    {
        if (cell.Length == 0 || cell[0] is not ('=' or '+' or '-' or '@' or '\t' or '\r')) return cell;
        if (double.TryParse(cell, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out _)
            || cell is "-" + Numbers.CsvInfinity)
            return cell;
        return "'" + cell;
    }

    /// <summary>RFC 4180: a cell holding a comma, quote or line break is quoted, its quotes doubled; rows end in CRLF.</summary>
    private void AppendRow(string[] cells)
    {
        for (int i = 0; i < cells.Length; i++)
        {
            if (i > 0) text.Append(',');
            string c = Neutralised(cells[i]);
            if (c.IndexOfAny([',', '"', '\n', '\r']) >= 0) text.Append('"').Append(c.Replace("\"", "\"\"")).Append('"');
            else text.Append(c);
        }
        text.Append("\r\n");
    }
}
