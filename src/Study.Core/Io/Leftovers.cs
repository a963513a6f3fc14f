// Temporary files and folders of the atomic writers: named after the process that made them, so those of a
// killed run can be told from those of a run still writing, and removed.
using System.Diagnostics;
using System.Globalization;

namespace Study.Core.Io;

internal static class Leftovers
{
    /// <summary>"PREFIX{pid}.{guid}SUFFIX": the process id first, so <see cref="Remove"/> can ask whether it still runs.</summary>
    public static string Name(string prefix, string suffix) =>
        $"{prefix}{Environment.ProcessId.ToString(CultureInfo.InvariantCulture)}.{Guid.NewGuid():N}{suffix}";

    /// <summary>
    /// Deletes the entries of <paramref name="dir"/> named by <see cref="Name"/> with this prefix and suffix
    /// whose process no longer runs (a run killed between writing and renaming). Entries of live processes,
    /// this one included, are left alone; failures are ignored (the next write tries again).
    /// </summary>
    public static void Remove(string dir, string prefix, string suffix)
    {
        try
        {
            foreach (string entry in Directory.EnumerateFileSystemEntries(dir, prefix + "*" + suffix))
            {
                string name = Path.GetFileName(entry);
                if (Owner(name, prefix) is not int pid || pid == Environment.ProcessId || Running(pid)) continue;
                Delete(entry);
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A folder that cannot be listed holds nothing this program can clean.
        }
    }

    /// <summary>The process id in a name made by <see cref="Name"/>, or null when the name is not one of ours.</summary>
    public static int? Owner(string name, string prefix)
    {
        if (!name.StartsWith(prefix, StringComparison.Ordinal)) return null;
        ReadOnlySpan<char> rest = name.AsSpan(prefix.Length);
        int dot = rest.IndexOf('.');
        return dot > 0 && int.TryParse(rest[..dot], NumberStyles.None, CultureInfo.InvariantCulture, out int pid) ? pid : null;
    }

    public static bool Running(int pid)
    {
        if (OperatingSystem.IsLinux()) return Directory.Exists($"/proc/{pid.ToString(CultureInfo.InvariantCulture)}");
        try
        {
            using Process p = Process.GetProcessById(pid);
            return !p.HasExited;
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException)
        {
            return false;
        }
    }

    /// <summary>Deletes a temporary file or folder if it is there; never throws.</summary>
    public static void Delete(string path)
    {
        try
        {
            if (Directory.Exists(path) && FileKind.Of(path) == PathKind.Folder) Directory.Delete(path, recursive: true);
            else if (File.Exists(path)) File.Delete(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Left for the next run to remove.
        }
    }
}
