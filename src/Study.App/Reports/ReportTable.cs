// A table of a report: the readable headings, alignment and cells of a column spec over its rows.
namespace Study.App.Reports;

/// <summary>Made only from a <see cref="ColumnSpec{TRow}"/>; plain text and Markdown render it.</summary>
public sealed class ReportTable : ReportBlock
{
    private ReportTable(IReadOnlyList<ReportColumn> columns, IReadOnlyList<string[]> rows)
    {
        Columns = columns;
        Rows = rows;
    }

    public IReadOnlyList<ReportColumn> Columns { get; }
    public IReadOnlyList<IReadOnlyList<string>> Rows { get; }

    public static ReportTable Of<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows, bool spaceBefore = false) =>
        new(spec.Readable.Select(c => new ReportColumn(c.Heading, c.Align == Align.Right)).ToList(), spec.ReadableRows(rows))
        {
            SpaceBefore = spaceBefore,
        };
}

public sealed record ReportColumn(string Header, bool RightAligned);
