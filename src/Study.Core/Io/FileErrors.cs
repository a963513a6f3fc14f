// The reason a file operation failed, in words a user acts on rather than the runtime's phrasing.
namespace Study.Core.Io;

internal static class FileErrors
{
    /// <summary>
    /// "no such file or folder", "permission denied", "no space left on the device", or the system's own
    /// message without the path it repeats (the caller names the path once).
    /// </summary>
    public static string Reason(Exception e) => e switch
    {
        FileNotFoundException or DirectoryNotFoundException => "no such file or folder",
        UnauthorizedAccessException => "permission denied",
        PathTooLongException => "the path is too long",
        IOException io when io.HResult == 28 => "no space left on the device",
        IOException io when io.HResult == 30 => "the file system is read-only",
        _ => WithoutPath(e.Message),
    };

    /// <summary>The system messages end in " : 'PATH'" or quote the path inside; a reason reads better without it.</summary>
    private static string WithoutPath(string message)
    {
        string m = message.Trim();
        int quoted = m.IndexOf(" : '", StringComparison.Ordinal);
        if (quoted > 0) m = m[..quoted];
        m = m.TrimEnd('.');
        return m.Length == 0 ? "the system refused it" : char.ToLowerInvariant(m[0]) + m[1..];
    }
}
