// Writes one table as CSV (RFC 4180 quoting, invariant numbers), atomically.
using System.Globalization;
using System.Text;
using Study.Core.Io;

namespace Study.App.Cli.Reports;

public sealed class CsvTable
{
    private readonly StringBuilder text = new();
    private readonly int columns;

    public CsvTable(params string[] header)
    {
        columns = header.Length;
        AppendRow(header);
    }

    public void Row(params object?[] cells)
    {
        if (cells.Length != columns) throw new ArgumentException($"row has {cells.Length} cells for {columns} columns");
        AppendRow(cells.Select(Cell).ToArray());
    }

    public override string ToString() => text.ToString();

    public void Write(string path) => AtomicFile.WriteAllText(path, text.ToString());

    private static string Cell(object? value) => value switch
    {
        null => "",
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
        _ => value.ToString() ?? "",
    };

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
