// Where an output really goes, checked before anything is written: never over something that is not ours.
using Study.Core.Model;

namespace Study.Core.Io;

/// <summary>
/// Resolves an output path: a link is written through (the file it names is replaced, the link stays);
/// a folder, a device, a pipe or a socket is refused, as are an empty path, "-" and a missing parent
/// folder (whole trees are never created). Every refusal reads "cannot write PATH: reason".
/// </summary>
public static class OutputTarget
{
    /// <summary>The regular file (existing or not) that writing <paramref name="path"/> replaces.</summary>
    /// <exception cref="InputException">The path cannot be written as a regular file.</exception>
    public static string File(string path)
    {
        string full = Checked(path);
        if (full.EndsWith(Path.DirectorySeparatorChar) || path.EndsWith('/'))
            throw Cannot(path, "the name ends in '/', so it names a folder; give a file name");
        string target = ThroughLinks(path, full);
        switch (FileKind.Of(target))
        {
            case PathKind.Folder: throw Cannot(path, "it is a folder; give a file name inside it");
            case PathKind.Device: throw Cannot(path, "it is a device, not a regular file; Study writes only regular files");
            case PathKind.Pipe: throw Cannot(path, "it is a named pipe, not a regular file; Study writes only regular files");
            case PathKind.Socket: throw Cannot(path, "it is a socket, not a regular file");
        }
        ParentMustExist(path, target);
        return target;
    }

    /// <summary>The folder (existing or not) that a set of tables replaces as a whole.</summary>
    /// <exception cref="InputException">The path cannot be written as a folder of tables.</exception>
    public static string Folder(string path)
    {
        string full = Checked(path).TrimEnd(Path.DirectorySeparatorChar);
        if (full.Length == 0 || full == Path.GetPathRoot(full)?.TrimEnd(Path.DirectorySeparatorChar))
            throw Cannot(path, "the root of the file system cannot be a folder of tables");
        string target = ThroughLinks(path, full);
        switch (FileKind.Of(target))
        {
            case PathKind.Regular or PathKind.Unknown: throw Cannot(path, "it is a file, not a folder; give the name of a folder for the tables");
            case PathKind.Device or PathKind.Pipe or PathKind.Socket: throw Cannot(path, "it is not a folder");
        }
        ParentMustExist(path, target);
        return target;
    }

    /// <summary>True when two paths name the same file (after links are followed).</summary>
    public static bool Same(string a, string b)
    {
        if (a.Length == 0 || b.Length == 0 || a == "-" || b == "-") return false;
        try
        {
            string fa = Path.GetFullPath(a), fb = Path.GetFullPath(b);
            return string.Equals(ThroughLinks(a, fa), ThroughLinks(b, fb), StringComparison.Ordinal);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or InputException)
        {
            return false;
        }
    }

    internal static InputException Cannot(string path, string reason) => new($"cannot write {Shown(path)}: {reason}");

    internal static InputException Cannot(string path, Exception e) => Cannot(path, FileErrors.Reason(e));

    private static string Shown(string path) => path.Length == 0 ? "\"\"" : path;

    private static string Checked(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (path.Length == 0) throw Cannot(path, "no file name given");
        if (path == "-")
            throw Cannot(path, "'-' stands for standard output, which is not a file here: give a file name (./- for a file that is really called '-')");
        try
        {
            return Path.GetFullPath(path);
        }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw Cannot(path, "the name is not a usable path");
        }
    }

    /// <summary>The final target of a chain of links (the path itself when it is no link).</summary>
    private static string ThroughLinks(string path, string full)
    {
        if (FileKind.Of(full) != PathKind.Link) return full;
        try
        {
            FileSystemInfo? target = System.IO.File.ResolveLinkTarget(full, returnFinalTarget: true);
            return target is null ? full : Path.GetFullPath(target.FullName);
        }
        catch (IOException e)
        {
            throw Cannot(path, $"its link cannot be followed ({FileErrors.Reason(e)})");
        }
    }

    private static void ParentMustExist(string path, string target)
    {
        string? parent = Path.GetDirectoryName(target);
        if (parent is null) return;
        PathKind kind = FileKind.Of(parent);
        if (kind == PathKind.Missing)
            throw Cannot(path, $"the folder {parent} does not exist (Study creates no folders for its output; make it first)");
        if (kind is not (PathKind.Folder or PathKind.Link or PathKind.Unknown) && !Directory.Exists(parent))
            throw Cannot(path, $"{parent} is not a folder");
    }
}
