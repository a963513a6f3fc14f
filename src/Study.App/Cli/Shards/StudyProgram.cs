// How to start this same program again from a job script.
namespace Study.App.Cli.Shards;

internal static class StudyProgram
{
    /// <summary>
    /// The command that runs this program: the native executable when it is one; else its launcher
    /// ("study", beside study.dll) when present; else the .NET host that runs this process with study.dll.
    /// </summary>
    public static IReadOnlyList<string> Invocation()
    {
        string? process = Environment.ProcessPath;
        string assembly = typeof(StudyProgram).Assembly.Location;
        if (string.IsNullOrEmpty(assembly)) return [process ?? "study"];
        string launcher = Path.Combine(Path.GetDirectoryName(assembly) ?? ".", "study");
        if (File.Exists(launcher) && !OperatingSystem.IsWindows()) return [launcher];
        string host = process is not null && Path.GetFileNameWithoutExtension(process) == "dotnet" ? process
            : Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") ?? "dotnet";
        return [host, assembly];
    }
}
