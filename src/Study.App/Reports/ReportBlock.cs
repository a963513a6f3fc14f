// The parts a report is made of: headings, lines of text, lists, tables and preformatted figures.
namespace Study.App.Reports;

/// <summary>One block of a <see cref="ReportDocument"/>; renderers read these and nothing else.</summary>
public abstract class ReportBlock
{
    /// <summary>In plain text, leave a blank line before this block (Markdown separates every block anyway).</summary>
    public bool SpaceBefore { get; init; }
}

/// <summary>A section heading; plain text puts a blank line before it.</summary>
public sealed class ReportHeading(string text) : ReportBlock
{
    public string Text { get; } = text;
}

/// <summary>Sentences, one per line.</summary>
public sealed class ReportText(IReadOnlyList<string> lines) : ReportBlock
{
    public IReadOnlyList<string> Lines { get; } = lines;
}

/// <summary>Short items such as violations, one per line, indented in plain text and bulleted in Markdown.</summary>
public sealed class ReportList(IReadOnlyList<string> items) : ReportBlock
{
    public IReadOnlyList<string> Items { get; } = items;
}

/// <summary>Text whose layout carries meaning (a character chart): kept as is, fenced in Markdown.</summary>
public sealed class ReportFigure(string text) : ReportBlock
{
    public string Text { get; } = text;
}
