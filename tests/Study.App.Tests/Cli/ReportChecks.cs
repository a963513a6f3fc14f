// Reads report files back the way another tool would: CSV headers, Markdown pipe tables.
using System.Text.RegularExpressions;

namespace Study.App.Tests.Cli;

internal static partial class ReportChecks
{
    /// <summary>The header row of a CSV file, split on commas (the headers never need quoting).</summary>
    public static string[] CsvHeader(string path) => File.ReadAllLines(path)[0].Split(',');

    /// <summary>
    /// Every pipe table in a Markdown text: each must have a header row, then a separator row of
    /// dashes, then rows with as many cells as the header. Returns the tables' cell counts and row counts.
    /// </summary>
    public static List<(int Columns, int Rows)> MarkdownTables(string markdown)
    {
        var tables = new List<(int, int)>();
        var lines = markdown.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            if (!lines[i].StartsWith('|')) continue;
            int start = i;
            while (i < lines.Length && lines[i].StartsWith('|')) i++;
            var block = lines[start..i];
            Assert.True(block.Length >= 2, $"table at line {start + 1} has no separator row");
            int columns = Cells(block[0]).Count;
            Assert.Matches(Separator(), block[1]);
            foreach (string row in block)
                Assert.True(Cells(row).Count == columns, $"row '{row}' has {Cells(row).Count} cells, header has {columns}");
            tables.Add((columns, block.Length - 2));
        }
        return tables;
    }

    /// <summary>Cells of one table row, splitting on pipes that are not backslash-escaped.</summary>
    public static List<string> Cells(string row)
    {
        var cells = new List<string>();
        var cell = new System.Text.StringBuilder();
        for (int i = 1; i < row.Length; i++)
        {
            if (row[i] == '\\' && i + 1 < row.Length) { cell.Append(row[i + 1]); i++; }
            else if (row[i] == '|') { cells.Add(cell.ToString().Trim()); cell.Clear(); }
            else cell.Append(row[i]);
        }
        return cells;
    }

    [GeneratedRegex(@"^\|( :?-{3,}:? \|)+$")]
    private static partial Regex Separator();
}
