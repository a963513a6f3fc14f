// A set of files (the tables of one result) written as a set: all new or all old, never a mix.
using Study.Core.Model;

namespace Study.Core.Io;

/// <summary>
/// Writes the set into a temporary folder beside the target, then swaps it in (one atomic exchange on
/// Linux, else two renames), so a kill or a failure leaves the previous set whole. Tables of other
/// results already in the folder (files with the same extensions) are carried into the new set; any
/// other content is refused rather than replaced. Temporary folders of killed runs are removed, and a
/// swap cut between its two renames is put back, on the next write.
/// </summary>
public static class AtomicFolder
{
    private const string TemporarySuffix = ".tables", OldSuffix = ".old";

    [ThreadStatic] private static Action<string>? beforeSwap;

    /// <summary>Hook for tests (this thread only): runs after the new set is complete in its temporary folder, before the swap.</summary>
    internal static Action<string>? BeforeSwap { get => beforeSwap; set => beforeSwap = value; }

    /// <exception cref="InputException">The folder cannot be written, holds files that are not tables, or a write fails.</exception>
    public static void Write(string path, IReadOnlyList<(string Name, byte[] Bytes)> files)
    {
        string target = OutputTarget.Folder(path);
        string parent = Path.GetDirectoryName(target) ?? ".";
        string prefix = $".{Path.GetFileName(target)}.";
        string? temp = null;
        try
        {
            PutBackInterruptedSwap(parent, prefix, target);
            Leftovers.Remove(parent, prefix, TemporarySuffix);
            Leftovers.Remove(parent, prefix, OldSuffix);
            IReadOnlyList<string> carried = Carried(path, target, files);
            temp = Path.Combine(parent, Leftovers.Name(prefix, TemporarySuffix));
            Directory.CreateDirectory(temp);
            foreach (string file in carried) File.Copy(file, Path.Combine(temp, Path.GetFileName(file)));
            foreach ((string name, byte[] bytes) in files)
            {
                using var stream = new FileStream(Path.Combine(temp, name), FileMode.CreateNew, FileAccess.Write, FileShare.None);
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }
            BeforeSwap?.Invoke(temp);
            Swap(temp, target, parent, prefix);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw OutputTarget.Cannot(path, e);
        }
        finally
        {
            // After an exchange the temporary name holds the previous set; after a failure, the partial new one.
            if (temp is not null) Leftovers.Delete(temp);
        }
    }

    /// <summary>
    /// The files of the existing folder that the new set keeps: tables of other results (the same
    /// extensions). Anything else would be lost in the swap, so it stops the write.
    /// </summary>
    private static IReadOnlyList<string> Carried(string path, string target, IReadOnlyList<(string Name, byte[] Bytes)> files)
    {
        if (!Directory.Exists(target)) return [];
        var names = files.Select(f => f.Name).ToHashSet(StringComparer.Ordinal);
        var extensions = files.Select(f => Path.GetExtension(f.Name)).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var carried = new List<string>();
        foreach (string entry in Directory.EnumerateFileSystemEntries(target))
        {
            string name = Path.GetFileName(entry);
            if (names.Contains(name)) continue;
            if (FileKind.Of(entry) is PathKind.Regular or PathKind.Unknown && extensions.Contains(Path.GetExtension(name)))
            {
                carried.Add(entry);
                continue;
            }
            throw OutputTarget.Cannot(path, $"it holds {name}, which is not a table; the tables are replaced as a set, " +
                "so give them a folder of their own");
        }
        return carried;
    }

    private static void Swap(string temp, string target, string parent, string prefix)
    {
        if (!Directory.Exists(target))
        {
            Directory.Move(temp, target);
            return;
        }
        if (FileKind.Exchange(temp, target)) return;
        string old = Path.Combine(parent, Leftovers.Name(prefix, OldSuffix));
        Directory.Move(target, old);
        Directory.Move(temp, target);
        Leftovers.Delete(old);
    }

    /// <summary>A run killed between the two renames of <see cref="Swap"/> left no target and the old set aside: put it back.</summary>
    private static void PutBackInterruptedSwap(string parent, string prefix, string target)
    {
        if (Directory.Exists(target)) return;
        foreach (string old in Directory.EnumerateDirectories(parent, prefix + "*" + OldSuffix))
        {
            if (Leftovers.Owner(Path.GetFileName(old), prefix) is int pid && pid != Environment.ProcessId && !Leftovers.Running(pid))
            {
                Directory.Move(old, target);
                return;
            }
        }
    }
}
