// Runs the study command in-process and captures what it prints.
using Study.App.Cli;

namespace Study.App.Tests.Cli;

internal sealed record CliOutcome(int ExitCode, string Out, string Err);

internal static class CliRun
{
    public static CliOutcome Run(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = StudyCommand.Run(args, new CommandContext(output, error));
        return new CliOutcome(code, output.ToString(), error.ToString());
    }

    public static string Network(string file) => Path.Combine(AppContext.BaseDirectory, "networks", file);

    private const string RunPrefix = "study-cli-run-";

    /// <summary>
    /// One folder per test run, named by its process id. The test host may end without running exit
    /// handlers, so each run also removes the folders of runs whose process has gone.
    /// </summary>
    private static readonly Lazy<string> Root = new(() =>
    {
        foreach (string old in Directory.EnumerateDirectories(Path.GetTempPath(), RunPrefix + "*"))
            if (int.TryParse(Path.GetFileName(old)[RunPrefix.Length..], out int pid) && !Running(pid))
                try { Directory.Delete(old, recursive: true); }
                catch (IOException) { }
                catch (UnauthorizedAccessException) { }
        return Directory.CreateDirectory(Path.Combine(Path.GetTempPath(), RunPrefix + Environment.ProcessId)).FullName;
    });

    private static bool Running(int pid)
    {
        try
        {
            using var process = System.Diagnostics.Process.GetProcessById(pid);
            return !process.HasExited;
        }
        catch (ArgumentException)
        {
            return false;
        }
        catch (InvalidOperationException)
        {
            return false;
        }
    }

    /// <summary>A file of the given name and text in a folder of its own (tests may give the same name).</summary>
    public static string TempFile(string name, string text)
    {
        string dir = Directory.CreateDirectory(Path.Combine(Root.Value, Guid.NewGuid().ToString("N"))).FullName;
        string path = Path.Combine(dir, name);
        File.WriteAllText(path, text);
        return path;
    }
}
