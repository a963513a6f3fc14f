// A table of a report: columns with their alignment, rows of formatted cells.
namespace Study.App.Cli.Reports;

/// <summary>Add columns, then rows of cells; numbers right-aligned, text left (the same calls as <see cref="TextTable"/>).</summary>
public sealed class ReportTable : ReportBlock
{
    private readonly List<ReportColumn> columns = [];
    private readonly List<string[]> rows = [];

    public IReadOnlyList<ReportColumn> Columns => columns;
    public IReadOnlyList<IReadOnlyList<string>> Rows => rows;

    public ReportTable Column(string header, bool rightAligned = true)
    {
        columns.Add(new ReportColumn(header, rightAligned));
        return this;
    }

    public ReportTable Left(string header) => Column(header, rightAligned: false);

    public void Row(params string?[] cells)
    {
        if (cells.Length != columns.Count) throw new ArgumentException($"row has {cells.Length} cells for {columns.Count} columns");
        rows.Add(cells.Select(c => c ?? "").ToArray());
    }
}

public sealed record ReportColumn(string Header, bool RightAligned);
