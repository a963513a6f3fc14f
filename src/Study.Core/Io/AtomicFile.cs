// Every file the program writes goes through here: temporary file, flush to disk, rename.
namespace Study.Core.Io;

/// <summary>
/// Writes a file so that a crash mid-write leaves the old file intact. The path is checked first
/// (<see cref="OutputTarget.File"/>); every failure is an <see cref="Model.InputException"/>
/// "cannot write PATH: reason". Temporary files left by a killed run are removed on the next write
/// into the same folder.
/// </summary>
public static class AtomicFile
{
    [ThreadStatic] private static Action<string>? beforeRename;

    /// <summary>Hook for tests (this thread only): runs after the temporary file is written, before the rename.</summary>
    internal static Action<string>? BeforeRename { get => beforeRename; set => beforeRename = value; }

    /// <exception cref="Model.InputException">The path cannot be written, or the write fails.</exception>
    public static void WriteAllText(string path, string text)
    {
        WriteAllBytes(path, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text));
    }

    /// <exception cref="Model.InputException">The path cannot be written, or the write fails.</exception>
    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes)
    {
        string target = OutputTarget.File(path);
        string dir = Path.GetDirectoryName(target) ?? ".";
        string name = Path.GetFileName(target);
        Leftovers.Remove(dir, $".{name}.", ".tmp");
        string temp = Path.Combine(dir, Leftovers.Name($".{name}.", ".tmp"));
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            BeforeRename?.Invoke(temp);
            File.Move(temp, target, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw OutputTarget.Cannot(path, e);
        }
        finally
        {
            Leftovers.Delete(temp);
        }
    }
}
