// Every file the program writes goes through here: temporary file, flush to disk, rename.
namespace Study.Core.Io;

/// <summary>Writes a file so that a crash mid-write leaves the old file intact.</summary>
public static class AtomicFile
{
    [ThreadStatic] private static Action<string>? beforeRename;

    /// <summary>Hook for tests (this thread only): runs after the temporary file is written, before the rename.</summary>
    internal static Action<string>? BeforeRename { get => beforeRename; set => beforeRename = value; }

    public static void WriteAllText(string path, string text)
    {
        WriteAllBytes(path, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));
    }

    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes)
    {
        string full = Path.GetFullPath(path);
        string dir = Path.GetDirectoryName(full) ?? ".";
        Directory.CreateDirectory(dir);
        string temp = Path.Combine(dir, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            BeforeRename?.Invoke(temp);
            File.Move(temp, full, overwrite: true);
        }
        finally
        {
            if (File.Exists(temp)) File.Delete(temp);
        }
    }
}
