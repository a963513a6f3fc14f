// Placeholder so the project builds while the IEEE Common Format reader is written.
using Study.Core.Model;

namespace Study.Core.Io;

public static class CommonFormatReader
{
    public static Network Parse(string text, string? fileName) =>
        throw new InputException("IEEE Common Format import is not available yet", fileName);
}
