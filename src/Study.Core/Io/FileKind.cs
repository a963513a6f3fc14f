// What a path is on disk (regular file, folder, link, device, pipe, socket), and the one atomic swap of two
// folders: the two things the runtime does not offer, asked of Linux directly, with a safe answer elsewhere.
using System.Runtime.InteropServices;

namespace Study.Core.Io;

internal enum PathKind
{
    Missing,
    Regular,
    Folder,
    Link,
    Device,
    Pipe,
    Socket,
    /// <summary>The system could not say (not Linux): treated as a regular file when it exists.</summary>
    Unknown,
}

internal static class FileKind
{
    private const int AtCurrentFolder = -100;
    private const int NoFollow = 0x100;
    private const uint TypeOnly = 0x1;
    private const uint RenameExchange = 2;

    /// <summary>The kind of the entry at <paramref name="path"/> itself (a link is not followed).</summary>
    public static PathKind Of(string path)
    {
        if (!File.Exists(path) && !Directory.Exists(path) && new FileInfo(path).LinkTarget is null) return PathKind.Missing;
        if (!OperatingSystem.IsLinux()) return Directory.Exists(path) ? PathKind.Folder : new FileInfo(path).LinkTarget is null ? PathKind.Unknown : PathKind.Link;
        var buffer = new byte[256];
        try
        {
            if (StatX(AtCurrentFolder, path, NoFollow, TypeOnly, buffer) != 0) return PathKind.Missing;
        }
        catch (Exception e) when (e is EntryPointNotFoundException or DllNotFoundException)
        {
            return Directory.Exists(path) ? PathKind.Folder : PathKind.Unknown;
        }
        // struct statx: stx_mode is the 16-bit field at byte 28 on every architecture (statx(2)).
        int mode = BitConverter.ToUInt16(buffer, 28) & 0xF000;
        return mode switch
        {
            0x8000 => PathKind.Regular,
            0x4000 => PathKind.Folder,
            0xA000 => PathKind.Link,
            0x2000 or 0x6000 => PathKind.Device,
            0x1000 => PathKind.Pipe,
            0xC000 => PathKind.Socket,
            _ => PathKind.Unknown,
        };
    }

    /// <summary>
    /// Exchanges two folders in one step (renameat2 with RENAME_EXCHANGE, Linux 3.15 on): false when the
    /// system cannot, and the caller then moves them one after the other.
    /// </summary>
    public static bool Exchange(string a, string b)
    {
        if (!OperatingSystem.IsLinux()) return false;
        try
        {
            return RenameAt2(AtCurrentFolder, a, AtCurrentFolder, b, RenameExchange) == 0;
        }
        catch (Exception e) when (e is EntryPointNotFoundException or DllNotFoundException)
        {
            return false;
        }
    }

    // Plain DllImport: the source-generated form needs unsafe code, which this library does not allow.
    // Strings marshal as UTF-8 on Linux (CharSet.Ansi there is UTF-8).
    [DllImport("libc", EntryPoint = "statx", SetLastError = true, CharSet = CharSet.Ansi)]
    private static extern int StatX(int folder, string path, int flags, uint mask, [Out] byte[] buffer);

    [DllImport("libc", EntryPoint = "renameat2", SetLastError = true, CharSet = CharSet.Ansi)]
    private static extern int RenameAt2(int fromFolder, string from, int toFolder, string to, uint flags);
}
