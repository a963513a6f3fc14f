// Writes a report document as a Markdown file, atomically (a crash never leaves half a report).
using Study.Core.Io;

namespace Study.App.Cli.Reports;

public static class ReportFiles
{
    public static void WriteMarkdown(string path, ReportDocument doc) => AtomicFile.WriteAllText(path, MarkdownReport.Render(doc));
}
