// A report built once by a study and rendered as plain text (the terminal) or Markdown (a study note).
namespace Study.App.Reports;

/// <summary>
/// Title, the inputs that produced the results, and the blocks of results in order. The inputs
/// are listed only in the Markdown rendering: on the terminal the command line is in view, and the
/// title line already names the file and scenario.
/// </summary>
public sealed class ReportDocument(string title)
{
    private readonly List<ReportInput> inputs = [];
    private readonly List<ReportBlock> blocks = [];

    public string Title { get; } = title;

    /// <summary>
    /// The caution that must come before any number (fault, duty and protection results):
    /// plain text puts it above the title, Markdown right after the inputs.
    /// </summary>
    public string? Caution { get; init; }

    public IReadOnlyList<ReportInput> Inputs => inputs;
    public IReadOnlyList<ReportBlock> Blocks => blocks;

    public ReportDocument Input(string name, string value)
    {
        inputs.Add(new ReportInput(name, value));
        return this;
    }

    public ReportDocument Add(ReportBlock block)
    {
        blocks.Add(block);
        return this;
    }

    public ReportDocument Heading(string text) => Add(new ReportHeading(text));

    public ReportDocument Text(params string[] lines) => Add(new ReportText(lines));

    public ReportDocument SpacedText(params string[] lines) => Add(new ReportText(lines) { SpaceBefore = true });

    public ReportDocument List(IEnumerable<string> items) => Add(new ReportList(items.ToList()));

    public ReportDocument Table<TRow>(ColumnSpec<TRow> spec, IEnumerable<TRow> rows, bool spaceBefore = false) =>
        Add(ReportTable.Of(spec, rows, spaceBefore));
}

/// <summary>One input of a study: "file", "scenario", "options" and the like.</summary>
public sealed record ReportInput(string Name, string Value);
