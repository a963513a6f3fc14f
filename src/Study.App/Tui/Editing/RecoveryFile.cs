// Where the recovery copy of a network lives, and whether one is waiting to be offered.
namespace Study.App.Tui.Editing;

/// <summary>
/// The recovery copy is written after every edit so that a crash loses nothing: next to the file as
/// <c>FILE.recovery.json</c>, or in a per-user folder for the demo network and untitled networks.
/// </summary>
public static class RecoveryFile
{
    public const string Suffix = ".recovery.json";

    /// <summary>The per-user folder for recovery copies of networks that have no file of their own.</summary>
    public static string DefaultUserFolder =>
        Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData, Environment.SpecialFolderOption.DoNotVerify), "study");

    /// <summary>
    /// Recovery path for <paramref name="file"/>; in <paramref name="userFolder"/> when there is no file
    /// or the file is the bundled demo (which may sit in a read-only install folder).
    /// </summary>
    public static string PathFor(string? file, bool inUserFolder, string userFolder)
    {
        if (file is null) return Path.Combine(userFolder, "untitled" + Suffix);
        if (inUserFolder) return Path.Combine(userFolder, Path.GetFileName(file) + Suffix);
        return file + Suffix;
    }

    /// <summary>True when a recovery copy exists and is newer than the file (or the file is gone).</summary>
    public static bool IsWaiting(string? file, string recoveryPath)
    {
        if (!File.Exists(recoveryPath)) return false;
        if (file is null || !File.Exists(file)) return true;
        return File.GetLastWriteTimeUtc(recoveryPath) > File.GetLastWriteTimeUtc(file);
    }

    public static void Delete(string recoveryPath)
    {
        try
        {
            if (File.Exists(recoveryPath)) File.Delete(recoveryPath);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A stale recovery copy is offered again next time; nothing is lost.
        }
    }
}
