// Splits an IEEE Common Format file into its title, bus and branch cards; other sections are skipped.
using System.Text.RegularExpressions;
using Study.Core.Model;

namespace Study.Core.Io.CommonFormat;

/// <summary>The cards of one case, in file order.</summary>
internal sealed partial record CaseFile(TitleCard Title, IReadOnlyList<BusCard> Buses, IReadOnlyList<BranchCard> Branches)
{
    /// <summary>Line numbers of the non-blank lines before the title card, which are skipped (a comment, a tape label).</summary>
    public IReadOnlyList<int> SkippedLines { get; init; } = [];

    private enum Section { Preamble, Bus, Branch, Skipped }

    /// <summary>
    /// Reads the title card (the last non-blank line before BUS DATA FOLLOWS: archive files may carry a
    /// tape label or comments above it, which are skipped), then the sections. BUS DATA and BRANCH DATA end
    /// with a -999 line; any other section (loss zones, interchange, tie lines) is skipped up to the next
    /// header, because archive files do not close those consistently (-99, -9, or the -9 before the data).
    /// <c>END OF DATA</c> ends the file.
    /// </summary>
    public static CaseFile Read(string text, string? fileName)
    {
        List<string> lines = SplitLines(text);
        TitleCard? title = null;
        var preamble = new List<int>();
        var buses = new List<BusCard>();
        var branches = new List<BranchCard>();
        int busHeader = 0, branchHeader = 0;
        Section open = Section.Preamble;

        for (int i = 0; i < lines.Count; i++)
        {
            string line = lines[i];
            int number = i + 1;
            if (line.TrimStart().StartsWith("END OF DATA", StringComparison.Ordinal))
            {
                if (open is Section.Bus or Section.Branch) throw NotClosed(open, fileName, number, "END OF DATA");
                break;
            }
            Match header = Header().Match(line);
            if (header.Success)
            {
                string name = header.Groups[1].Value;
                if (open is Section.Bus or Section.Branch) throw NotClosed(open, fileName, number, $"'{name} FOLLOWS'");
                Section before = open;
                open = Section.Skipped;
                if (name == "BUS DATA")
                {
                    if (busHeader > 0) throw Twice(name, busHeader, fileName, number);
                    if (before == Section.Preamble)
                    {
                        if (preamble.Count == 0)
                            throw new InputException("no title card before 'BUS DATA FOLLOWS'", fileName, number, 1);
                        int titleLine = preamble[^1];
                        title = TitleCard.Read(new Card(lines[titleLine - 1], titleLine, "title", fileName));
                        preamble.RemoveAt(preamble.Count - 1);
                    }
                    else if (title is null)
                        throw new InputException("no title card before 'BUS DATA FOLLOWS' (a section comes first)", fileName, number, 1);
                    busHeader = number;
                    open = Section.Bus;
                }
                else if (name == "BRANCH DATA")
                {
                    if (branchHeader > 0) throw Twice(name, branchHeader, fileName, number);
                    branchHeader = number;
                    open = Section.Branch;
                }
                continue;
            }
            if (string.IsNullOrWhiteSpace(line)) continue;
            switch (open)
            {
                case Section.Preamble:
                    preamble.Add(number);
                    break;
                case Section.Bus or Section.Branch when IsSectionEnd(line):
                    open = Section.Skipped;
                    break;
                case Section.Bus:
                    buses.Add(BusCard.Read(new Card(line, number, "bus", fileName)));
                    break;
                case Section.Branch:
                    branches.Add(BranchCard.Read(new Card(line, number, "branch", fileName)));
                    break;
            }
        }

        if (open is Section.Bus or Section.Branch)
            throw new InputException(
                $"the file ends inside the {SectionName(open)} section, which has no closing -999 line (truncated file?)",
                fileName, Math.Max(lines.Count, 1), 1);
        if (busHeader == 0) throw new InputException("no 'BUS DATA FOLLOWS' section", fileName, 1, 1);
        if (buses.Count == 0) throw new InputException("the BUS DATA section holds no bus cards", fileName, busHeader, 1);
        if (branchHeader == 0) throw new InputException("no 'BRANCH DATA FOLLOWS' section", fileName, Math.Max(lines.Count, 1), 1);
        return new CaseFile(title!, buses, branches) { SkippedLines = preamble };
    }

    /// <summary>Lines ended by CRLF, LF or CR; a leading byte-order mark is not a column.</summary>
    private static List<string> SplitLines(string text)
    {
        var lines = new List<string>();
        int start = text.StartsWith('\uFEFF') ? 1 : 0;
        for (int i = start; i < text.Length; i++)
        {
            char c = text[i];
            if (c is not ('\r' or '\n')) continue;
            lines.Add(text[start..i]);
            if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n') i++;
            start = i + 1;
        }
        if (start < text.Length) lines.Add(text[start..]);
        return lines;
    }

    private static bool IsSectionEnd(string line)
    {
        ReadOnlySpan<char> s = line.AsSpan().TrimStart();
        return s.StartsWith("-999") && (s.Length == 4 || char.IsWhiteSpace(s[4]));
    }

    private static string SectionName(Section section) => section == Section.Bus ? "BUS DATA" : "BRANCH DATA";

    private static InputException NotClosed(Section open, string? fileName, int line, string what) =>
        new($"the {SectionName(open)} section is not closed by a -999 line before {what}", fileName, line, 1);

    private static InputException Twice(string name, int first, string? fileName, int line) =>
        new($"a second '{name} FOLLOWS' section (the first is on line {first})", fileName, line, 1);

    /// <summary>A section header such as "BUS DATA FOLLOWS    14 ITEMS"; data cards start with a number.</summary>
    [GeneratedRegex(@"^\s*([A-Z][A-Z ]*[A-Z])\s+FOLLOWS\b")]
    private static partial Regex Header();
}
