// Every command explains itself: `study COMMAND --help` and `study help COMMAND` show every option it declares.
using Study.App.Cli;

namespace Study.App.Tests.Cli;

public sealed class HelpTests
{
    public static TheoryData<string> Commands => [.. StudyCommand.All.Select(c => c.Name)];

    [Theory]
    [MemberData(nameof(Commands))]
    public void Help_exits_0_and_lists_every_declared_argument_and_option(string name)
    {
        CliOutcome help = CliRun.Run(name, "--help");
        Assert.Equal(0, help.ExitCode);
        Assert.Empty(help.Err);
        Assert.Contains($"study {name}", help.Out);
        var command = StudyCommand.All.Single(c => c.Name == name).Build(out _);
        foreach (var option in command.Options) Assert.Contains(option.Name, help.Out);
        foreach (var argument in command.Arguments) Assert.Contains(argument.Name, help.Out);
        Assert.Equal(help.Out, CliRun.Run("help", name).Out);
    }

    [Fact]
    public void An_unknown_option_or_a_missing_file_is_a_usage_error_that_points_to_the_help()
    {
        CliOutcome unknown = CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"), "--tolerence", "1e-6");
        Assert.Equal(2, unknown.ExitCode);
        Assert.Contains("unknown argument or option '--tolerence'", unknown.Err);
        Assert.Contains("'study solve --help'", unknown.Err);
        CliOutcome missing = CliRun.Run("taps");
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("missing FILE", missing.Err);
        CliOutcome number = CliRun.Run("solve", CliRun.Network("ieee14cdf.txt"), "--tolerance", "tight");
        Assert.Equal(2, number.ExitCode);
        Assert.Contains("--tolerance needs a number, got 'tight'", number.Err);
    }

    [Fact]
    public void The_overview_lists_every_command_and_the_exit_codes()
    {
        CliOutcome overview = CliRun.Run("help");
        Assert.Equal(0, overview.ExitCode);
        foreach (CliCommand c in StudyCommand.All) Assert.Contains($"study {c.Name} ", overview.Out);
        Assert.Contains("Exit codes: 0 done, 2 input error, 3 no convergence, 4 internal error.", overview.Out);
    }
}
