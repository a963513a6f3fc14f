// The columns of one kind of result row, in order; the renderers read a spec plus rows and nothing else.
namespace Study.App.Reports;

/// <summary>
/// Built once per result record by chaining the column kinds below; each returns the spec so a
/// declaration reads as the table does, left to right.
/// </summary>
public sealed class ColumnSpec<TRow>
{
    private readonly List<Column<TRow>> columns = [];

    public IReadOnlyList<Column<TRow>> Columns => columns;
    public IEnumerable<Column<TRow>> Readable => columns.Where(c => c.IsReadable);
    public IEnumerable<Column<TRow>> Machine => columns.Where(c => c.IsMachine);
    public string[] Headings => Readable.Select(c => c.Heading).ToArray();
    public string[] Keys => Machine.Select(c => c.Key!).ToArray();

    public ColumnSpec<TRow> Add(Column<TRow> column)
    {
        columns.Add(column);
        return this;
    }

    /// <summary>Text, left-aligned; null reads as the blank mark (and an empty CSV cell).</summary>
    public ColumnSpec<TRow> Text(string? key, string? header, Func<TRow, string?> value, Align align = Align.Left, bool namesGroup = false) =>
        Add(new() { Key = key, Header = header, Align = align, Value = value, Text = r => Numbers.Text(value(r)), NamesGroup = namesGroup });

    /// <summary>A quantity the reader sees in words: a flag as "on-load, holds WRB33", a list joined with commas.</summary>
    public ColumnSpec<TRow> Words(string? key, string header, Func<TRow, object?> value, Func<TRow, string> reads,
        Align align = Align.Left, string? unit = null) =>
        Add(new() { Key = key, Header = header, Unit = unit, Align = align, Value = value, Text = reads });

    /// <summary>
    /// A number with fixed decimals, right-aligned, optionally followed by a mark (▼, ▲, " !");
    /// <paramref name="reads"/> replaces the readable text where the reader is told more than the number.
    /// </summary>
    public ColumnSpec<TRow> Number(string? key, string? header, string? unit, Func<TRow, double?> value, int decimals,
        Func<TRow, string>? mark = null, Func<TRow, string>? reads = null) =>
        Add(new()
        {
            Key = key, Header = header, Unit = unit, Value = r => value(r),
            Text = reads ?? (mark is null ? r => Numbers.Fixed(value(r), decimals) : r => Numbers.Fixed(value(r), decimals) + mark(r)),
        });

    public ColumnSpec<TRow> Integer(string? key, string? header, string? unit, Func<TRow, int?> value, Func<TRow, string>? reads = null) =>
        Add(new() { Key = key, Header = header, Unit = unit, Value = r => value(r), Text = reads ?? (r => Numbers.Integer(value(r))) });

    /// <summary>A column for readers only whose text is composed from the row (a sentence, a list, a number with a name).</summary>
    public ColumnSpec<TRow> Shown(string header, Func<TRow, string> text, Align align = Align.Left, bool namesGroup = false) =>
        Add(new() { Header = header, Align = align, Text = text, NamesGroup = namesGroup });

    /// <summary>A column for CSV only (a flag, a machine name, a quantity the readable table leaves out).</summary>
    public ColumnSpec<TRow> CsvOnly(string key, Func<TRow, object?> value) => Add(new() { Key = key, Value = value });

    /// <summary>Appends the columns of another spec, read from a part of this row.</summary>
    public ColumnSpec<TRow> Include<TPart>(ColumnSpec<TPart> part, Func<TRow, TPart> of)
    {
        foreach (Column<TPart> c in part.Columns)
            Add(new()
            {
                Key = c.Key, Header = c.Header, Unit = c.Unit, Align = c.Align, NamesGroup = c.NamesGroup,
                Value = r => c.Value(of(r)), Text = r => c.Text(of(r)),
            });
        return this;
    }

    /// <summary>
    /// The same columns, a chosen few in a chosen order (a narrow screen puts duty before the currents):
    /// each named by its machine key, or by its header when it has none. The columns themselves stay
    /// declared once.
    /// </summary>
    /// <exception cref="ArgumentException">A name matches no column.</exception>
    public ColumnSpec<TRow> Select(params string[] names)
    {
        var chosen = new ColumnSpec<TRow>();
        foreach (string name in names)
            chosen.Add(columns.FirstOrDefault(c => c.Key == name) ?? columns.FirstOrDefault(c => c.Key is null && c.Header == name)
                ?? throw new ArgumentException($"no column '{name}' in this spec", nameof(names)));
        return chosen;
    }

    /// <summary>The readable cells of each row; a group-naming cell that repeats the row above is left empty unless <paramref name="blankRepeats"/> is false.</summary>
    public List<string[]> ReadableRows(IEnumerable<TRow> rows, bool blankRepeats = true)
    {
        Column<TRow>[] shown = Readable.ToArray();
        var cells = new List<string[]>();
        string[]? previous = null;
        foreach (TRow row in rows)
        {
            string[] full = shown.Select(c => c.Text(row)).ToArray();
            string[] line = (string[])full.Clone();
            for (int i = 0; i < shown.Length; i++)
                if (blankRepeats && shown[i].NamesGroup && previous is not null && previous[i] == full[i]) line[i] = "";
            cells.Add(line);
            previous = full;
        }
        return cells;
    }

    /// <summary>The CSV cells of each row (see <see cref="Numbers.Csv"/>).</summary>
    public List<string[]> MachineRows(IEnumerable<TRow> rows)
    {
        Column<TRow>[] written = Machine.ToArray();
        return rows.Select(row => written.Select(c => Numbers.Csv(c.Value(row))).ToArray()).ToList();
    }
}
