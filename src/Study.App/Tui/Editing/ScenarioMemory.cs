// The scenario last chosen for each network file, kept per user so that reopening a file studies it the same way.
using Study.Core.Io;

namespace Study.App.Tui.Editing;

/// <summary>
/// One line per file in <c>chosen-scenarios.txt</c> in the per-user folder: the scenario name, a tab,
/// the file's full path. The choice is the user's view of the file, not part of the network, so the
/// network file (which the command line reads too) stays as it was.
/// </summary>
public static class ScenarioMemory
{
    public const string FileName = "chosen-scenarios.txt";

    /// <summary>The scenario chosen for <paramref name="networkFile"/>, or null (as entered, or never chosen).</summary>
    public static string? Read(string userFolder, string networkFile)
    {
        string full = Path.GetFullPath(networkFile);
        return Entries(userFolder).TryGetValue(full, out string? name) ? name : null;
    }

    /// <summary>Records the choice (null forgets it). A folder that cannot be written loses only the memory.</summary>
    public static void Write(string userFolder, string networkFile, string? scenario)
    {
        string full = Path.GetFullPath(networkFile);
        Dictionary<string, string> entries = Entries(userFolder);
        if (scenario is null) entries.Remove(full);
        else entries[full] = scenario;
        try
        {
            AtomicFile.WriteAllText(Path.Combine(userFolder, FileName),
                string.Concat(entries.OrderBy(e => e.Key, StringComparer.Ordinal).Select(e => $"{e.Value}\t{e.Key}\n")));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Nothing of the network is lost: the next open starts as entered.
        }
    }

    private static Dictionary<string, string> Entries(string userFolder)
    {
        var entries = new Dictionary<string, string>(StringComparer.Ordinal);
        string path = Path.Combine(userFolder, FileName);
        try
        {
            if (!File.Exists(path)) return entries;
            foreach (string line in File.ReadAllLines(path))
            {
                int tab = line.IndexOf('\t');
                if (tab > 0 && tab < line.Length - 1) entries[line[(tab + 1)..]] = line[..tab];
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // An unreadable memory is an empty one.
        }
        return entries;
    }
}
