// The writer every command writes its text through: control characters from the data are escaped on the way out.
using System.Text;
using Study.App.Reports;

namespace Study.App.Cli;

/// <summary>
/// Wraps standard output and standard error (or any writer) so that no character read from a file can
/// act on the terminal (<see cref="ControlCharacters"/>). JSON goes to the byte stream beneath, where the
/// serializer escapes controls itself; the progress line writes to <see cref="Inner"/>.
/// </summary>
public sealed class TerminalText : TextWriter
{
    private TerminalText(TextWriter inner) => Inner = inner;

    public TextWriter Inner { get; }

    public override Encoding Encoding => Inner.Encoding;

    public override IFormatProvider FormatProvider => Inner.FormatProvider;

    public static TextWriter Wrap(TextWriter writer) => writer is TerminalText ? writer : new TerminalText(writer);

    /// <summary>The writer beneath a wrapped one (the writer itself otherwise).</summary>
    public static TextWriter Unwrap(TextWriter writer) => writer is TerminalText t ? t.Inner : writer;

    public override void Write(char value)
    {
        if (ControlCharacters.IsControl(value)) Inner.Write(ControlCharacters.Escape(value.ToString()));
        else Inner.Write(value);
    }

    public override void Write(string? value)
    {
        if (value is not null) Inner.Write(ControlCharacters.Escape(value));
    }

    public override void Write(char[] buffer, int index, int count) => Write(new string(buffer, index, count));

    public override void WriteLine(string? value)
    {
        Write(value);
        Inner.WriteLine();
    }

    public override void Flush() => Inner.Flush();
}
