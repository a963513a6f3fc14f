// A scratch folder per command test, deleted afterwards.
namespace Study.App.Tests.Cli;

internal sealed class TempDirectory : IDisposable
{
    public string Path { get; } = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "study-cli-" + Guid.NewGuid().ToString("N"));

    public TempDirectory() => Directory.CreateDirectory(Path);

    public string File(string name) => System.IO.Path.Combine(Path, name);

    /// <summary>Files left behind by an interrupted write (the atomic writer's temporary names).</summary>
    public IEnumerable<string> Leftovers() => Directory.EnumerateFiles(Path, "*.tmp", SearchOption.AllDirectories);

    public void Dispose()
    {
        try { Directory.Delete(Path, recursive: true); } catch (IOException) { }
    }
}
