// Damages an IEEE Common Format case the ways fixed-column files get damaged: shifted columns, bad fields, cut files.
using System.Text;
using CsCheck;

namespace Study.Core.Tests.Properties;

internal static class CardMutator
{
    /// <summary>Tokens written over a field: not numbers, non-finite, out of range, negative, odd characters.</summary>
    private static readonly string[] Tokens =
    [
        "NaN", "Infinity", "-Infinity", "1e999", "-1e999", "1e308", "-1", "-999", "0", "-0", "99999999999", "abc",
        "1.5", "+", "-", ".", "e5", "1e-320", " ", "é", "\t", "\u00A0", "Ω", "1,5", "0x10", "2147483648", "-2147483648",
        "9999", "3", "5", "1.0e+2", "∞", "\u0000",
    ];

    /// <summary>Lines put into the file: section headers and ends in the wrong place.</summary>
    private static readonly string[] Lines =
    [
        "BUS DATA FOLLOWS", "BRANCH DATA FOLLOWS", "-999", "END OF DATA", "LOSS ZONES FOLLOWS", "-99", "", " ",
        "   1 Bus 1     HV  1  1  3 1.060    0.0      0.0      0.0    232.4   -16.9     0.0  1.060     0.0     0.0   0.0    0.0        0",
        "   1    2  1  1 1 0  0.01938   0.05917     0.0528     0     0     0    0 0  0.0       0.0 0.0    0.0     0.0    0.0   0.0",
        "   7    7  1  1 1 0  0.0       0.0         0.0        0     0     0    0 0  0.0       0.0 0.0    0.0     0.0    0.0   0.0",
        "9999    1  1  1 1 0  0.0       0.1         0.0        0     0     0    0 0  0.0       0.0 0.0    0.0     0.0    0.0   0.0",
    ];

    /// <summary>The 1-based first and last columns of the bus and branch card fields (IEEE Working Group, 1973).</summary>
    private static readonly (int First, int Last)[] Fields =
    [
        (1, 4), (6, 17), (19, 20), (21, 23), (25, 26), (28, 33), (34, 40), (41, 49), (50, 59), (60, 67), (68, 75),
        (77, 83), (85, 90), (91, 98), (99, 106), (107, 114), (115, 122), (124, 127),
        (6, 9), (11, 12), (13, 15), (17, 17), (19, 19), (20, 29), (30, 39), (41, 50), (51, 55), (77, 82), (84, 90),
        (113, 126), (32, 37), (39, 42),
    ];

    private static readonly char[] Palette = [' ', '0', '9', '-', '.', 'E', 'x', '\t', '\r', '\n', 'é', '\uFFFD', '+', '\u0000'];

    public static Gen<MutationStep> Step { get; } =
        Gen.Select(Gen.Int[0, 9], Gen.Int[0, int.MaxValue], Gen.Int[0, 1000], Gen.Int[0, 1000],
            (kind, where, what, extra) => new MutationStep(kind, where, what, extra));

    public static Gen<(int Seed, MutationStep[] Steps)> Mutations(int seedCount) =>
        Gen.Select(Gen.Int[0, seedCount - 1], Step.Array[1, 4], (seed, steps) => (seed, steps));

    public static string Apply(string text, IEnumerable<MutationStep> steps)
    {
        foreach (MutationStep step in steps) text = Apply(text, step);
        return text;
    }

    public static string Apply(string text, MutationStep s)
    {
        switch (s.Kind)
        {
            case 0:
                return text[..(s.Where % (text.Length + 1))];
            case 1:
                return ShiftColumns(text, s);
            case 2:
                return OverwriteField(text, s);
            case 3:
                return ReplaceChar(text, s);
            case 4:
                return EditLines(text, s);
            case 5:
                return LineEndings(text, s);
            case 6:
                return "\uFEFF" + text;
            case 7:
                return EditLines(text, s with { What = 3 }, Lines[s.Extra % Lines.Length]);
            case 8:
                return FlipByte(text, s);
            default:
                return OverwriteField(text, s with { Extra = s.Extra | 1 });
        }
    }

    private static List<string> SplitKeepingEnds(string text)
    {
        var lines = new List<string>();
        int start = 0;
        for (int i = 0; i < text.Length; i++)
        {
            if (text[i] != '\n') continue;
            lines.Add(text[start..(i + 1)]);
            start = i + 1;
        }
        if (start < text.Length) lines.Add(text[start..]);
        return lines;
    }

    /// <summary>Spaces inserted into, or characters deleted from, one card: every later field moves.</summary>
    private static string ShiftColumns(string text, MutationStep s)
    {
        List<string> lines = SplitKeepingEnds(text);
        if (lines.Count == 0) return text;
        int li = s.Where % lines.Count;
        string line = lines[li];
        int at = s.What % (line.Length + 1);
        int count = 1 + s.Extra % 3;
        lines[li] = s.Extra % 2 == 0
            ? line.Insert(at, new string(' ', count))
            : line.Remove(Math.Min(at, line.Length), Math.Min(count, line.Length - Math.Min(at, line.Length)));
        return string.Concat(lines);
    }

    /// <summary>A token written over a card field, right-aligned in its columns (odd Extra) or at its first column.</summary>
    private static string OverwriteField(string text, MutationStep s)
    {
        List<string> lines = SplitKeepingEnds(text);
        if (lines.Count == 0) return text;
        int li = s.Where % lines.Count;
        string line = lines[li];
        string end = line.EndsWith("\r\n", StringComparison.Ordinal) ? "\r\n" : line.EndsWith('\n') ? "\n" : "";
        var body = new StringBuilder(line[..^end.Length]);
        (int first, int last) = Fields[(s.Where / 7) % Fields.Length];
        while (body.Length < last) body.Append(' ');
        string token = Tokens[s.What % Tokens.Length];
        int width = last - first + 1;
        string cell = token.Length >= width ? token[..width]
            : s.Extra % 2 == 1 ? token.PadLeft(width) : token.PadRight(width);
        body.Remove(first - 1, width).Insert(first - 1, cell);
        lines[li] = body + end;
        return string.Concat(lines);
    }

    private static string ReplaceChar(string text, MutationStep s)
    {
        if (text.Length == 0) return text;
        int at = s.Where % text.Length;
        return string.Concat(text.AsSpan(0, at), Palette[s.What % Palette.Length].ToString(), text.AsSpan(at + 1));
    }

    /// <summary>0 duplicate a line (a bus defined twice), 1 delete it, 2 swap it with the next, 3 insert <paramref name="insert"/>.</summary>
    private static string EditLines(string text, MutationStep s, string? insert = null)
    {
        List<string> lines = SplitKeepingEnds(text);
        if (lines.Count == 0) return insert ?? text;
        int li = s.Where % lines.Count;
        switch (s.What % 4)
        {
            case 0:
                lines.Insert(li, lines[li].EndsWith('\n') ? lines[li] : lines[li] + "\n");
                break;
            case 1:
                lines.RemoveAt(li);
                break;
            case 2 when li + 1 < lines.Count:
                (lines[li], lines[li + 1]) = (lines[li + 1], lines[li]);
                break;
            default:
                lines.Insert(li, (insert ?? Lines[s.Extra % Lines.Length]) + "\n");
                break;
        }
        return string.Concat(lines);
    }

    private static string LineEndings(string text, MutationStep s)
    {
        string lf = text.Replace("\r\n", "\n");
        var sb = new StringBuilder(lf.Length + 64);
        int k = 0;
        foreach (char c in lf)
        {
            if (c != '\n')
            {
                sb.Append(c);
                continue;
            }
            sb.Append((s.What % 4) switch
            {
                0 => "\r\n",
                1 => "\r",
                2 => ((s.Extra >> (k % 10)) & 1) == 1 ? "\r\n" : "\n",
                _ => ((s.Extra >> (k % 10)) & 1) == 1 ? "\r" : "\n",
            });
            k++;
        }
        return sb.ToString();
    }

    private static string FlipByte(string text, MutationStep s)
    {
        byte[] bytes = Encoding.UTF8.GetBytes(text);
        if (bytes.Length == 0) return text;
        int at = s.Where % bytes.Length;
        bytes[at] = (byte)(s.Extra % 2 == 0 ? bytes[at] ^ (1 << (s.What % 8)) : s.What % 256);
        return Encoding.UTF8.GetString(bytes);
    }
}
