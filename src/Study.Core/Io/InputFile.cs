// Reads the bytes of a network file with the checks that keep a wrong path or a wrong file from costing
// memory or time: what the path is, how large the file is, and whether it holds text at all.
using Study.Core.Model;

namespace Study.Core.Io;

/// <summary>
/// A network file's bytes, read in chunks so that a device, a pipe or a file of binary data is refused
/// after its first chunk instead of after filling memory. Every problem is an <see cref="InputException"/>
/// naming the path.
/// </summary>
public static class InputFile
{
    /// <summary>
    /// Largest network file read: 1.5 GiB holds well over two million buses (about 540 bytes a bus in
    /// a generated file), so a real network is never refused, and the memory a read can take is bounded.
    /// </summary>
    public const long MaxBytes = 1536L * 1024 * 1024;

    private const int ChunkBytes = 64 * 1024;

    /// <exception cref="InputException">The path is empty, "-", a folder, missing, unreadable, too large, or the content is not text.</exception>
    public static byte[] ReadAllBytes(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (path.Length == 0) throw new InputException("no file name given (the path is empty)");
        if (path == "-")
            throw new InputException("'-' stands for standard input, which this program does not read: give the file's name "
                + "(./- for a file that is really called '-')", path);
        if (Directory.Exists(path))
            throw new InputException("this is a folder, not a network file: give the path of a *.study.json file or a Common Format case", path);
        try
        {
            var info = new FileInfo(path);
            if (info.Exists && info.Length > MaxBytes)
                throw TooLarge(path, info.Length);
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 1, FileOptions.SequentialScan);
            return ReadChecked(stream, path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            throw new InputException($"cannot read the file: {FileErrors.Reason(e)}", path);
        }
    }

    /// <summary>
    /// Reads the whole stream (regular files by their length, pipes and devices up to <see cref="MaxBytes"/>),
    /// refusing NUL bytes in any chunk and other control characters in the first, where a text file has none.
    /// </summary>
    private static byte[] ReadChecked(Stream stream, string path)
    {
        var buffer = new MemoryStream();
        var chunk = new byte[ChunkBytes];
        bool first = true, wide = false;
        int lines = 1;
        long lineStart = 0;
        int read;
        while ((read = stream.Read(chunk, 0, chunk.Length)) > 0)
        {
            ReadOnlySpan<byte> data = chunk.AsSpan(0, read);
            if (first)
            {
                // UTF-16 and UTF-32 text carries NUL bytes in every ASCII character; its byte-order mark says so.
                wide = data.StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || data.StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF])
                    || data.StartsWith((ReadOnlySpan<byte>)[0x00, 0x00, 0xFE, 0xFF]);
                if (!wide && FirstControlByte(data) is int at)
                    throw Binary(path, data, at, buffer.Length, lines, lineStart, $"a control character (0x{data[at]:X2})");
                first = false;
            }
            else if (!wide && data.IndexOf((byte)0) is int nul && nul >= 0)
                throw Binary(path, data, nul, buffer.Length, lines, lineStart, "a NUL byte");
            if (buffer.Length + read > MaxBytes) throw TooLarge(path, buffer.Length + read);
            int newline = data.LastIndexOf((byte)'\n');
            if (newline >= 0)
            {
                lines += data.Count((byte)'\n');
                lineStart = buffer.Length + newline + 1;
            }
            buffer.Write(data);
        }
        return buffer.ToArray();
    }

    /// <summary>Refuses the file at the line and column of the byte no text holds.</summary>
    private static InputException Binary(string path, ReadOnlySpan<byte> data, int at, long offset, int lines, long lineStart, string what)
    {
        ReadOnlySpan<byte> before = data[..at];
        int line = lines + before.Count((byte)'\n');
        int lastNewline = before.LastIndexOf((byte)'\n');
        long column = (lastNewline >= 0 ? at - lastNewline - 1 : offset + at - lineStart) + 1;
        return new InputException($"not a network file: {what} at byte {offset + at + 1}, which no text file holds (binary data?)",
            path, line, (int)Math.Min(column, int.MaxValue));
    }

    /// <summary>The first byte that no text file holds: controls other than tab, line feed, form feed, carriage return and the old end-of-file mark.</summary>
    private static int? FirstControlByte(ReadOnlySpan<byte> data)
    {
        for (int i = 0; i < data.Length; i++)
        {
            byte b = data[i];
            if (b < 0x20 && b is not (0x09 or 0x0A or 0x0C or 0x0D or 0x1A)) return i;
            if (b == 0x7F) return i;
        }
        return null;
    }

    private static InputException TooLarge(string path, long bytes) =>
        new($"the file is larger than {MaxBytes / (1024 * 1024)} MiB (at least {bytes / (1024 * 1024)} MiB): "
            + "not a network this program reads; check the path", path);
}
