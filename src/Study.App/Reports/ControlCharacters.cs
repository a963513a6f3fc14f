// Control characters in text from a file (an id with an escape sequence, a name with a carriage return)
// are shown as escapes, so that no input can move the cursor, recolour or rewrite what a terminal shows.
using System.Globalization;
using System.Text;

namespace Study.App.Reports;

public static class ControlCharacters
{
    /// <summary>
    /// True for what a terminal acts on rather than shows: C0 controls other than line feed and tab,
    /// DEL, C1 controls, and the bidirectional overrides and isolates (which reorder what follows).
    /// </summary>
    public static bool IsControl(char c) =>
        (c < 0x20 && c is not ('\n' or '\t')) || (c >= 0x7F && c <= 0x9F)
        || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069') || c is '\u2028' or '\u2029';

    /// <summary>The text with every control character as \uXXXX (ESC reads \u001B).</summary>
    public static string Escape(string text)
    {
        int first = -1;
        for (int i = 0; i < text.Length; i++)
        {
            if (IsControl(text[i])) { first = i; break; }
        }
        if (first < 0) return text;
        var sb = new StringBuilder(text.Length + 8);
        sb.Append(text, 0, first);
        for (int i = first; i < text.Length; i++) Append(sb, text[i]);
        return sb.ToString();
    }

    public static void Append(StringBuilder sb, char c)
    {
        if (IsControl(c)) sb.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
        else sb.Append(c);
    }
}
