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

    public static string TempFile(string name, string text)
    {
        string dir = Directory.CreateTempSubdirectory("study-cli").FullName;
        string path = Path.Combine(dir, name);
        File.WriteAllText(path, text);
        return path;
    }
}
