// Entry point of the command line: picks the subcommand, runs it, turns failures into exit codes.
using Study.App.Cli.Compare;
using Study.App.Cli.Faults;
using Study.App.Cli.Files;
using Study.App.Cli.Outages;
using Study.App.Cli.Scale;
using Study.App.Cli.Solve;
using Study.App.Cli.Taps;
using Study.Core.Model;

namespace Study.App.Cli;

/// <summary>
/// Dispatches `study SUBCOMMAND ...`. Input problems become one readable message and exit 2;
/// anything unexpected becomes exit 4 with a one-line message — never a stack trace
/// (set STUDY_DEBUG=1 to see one).
/// </summary>
public static class StudyCommand
{
    public static IReadOnlyList<Command> All { get; } =
    [
        new CheckCommand(),
        new ConvertCommand(),
        new SolveCommand(),
        new TapsCommand(),
        new OutagesCommand(),
        new CompareCommand(),
        new FaultCommand(),
        new ExplainCommand(),
        new GenerateCommand(),
        new BenchCommand(),
    ];

    public static int Run(IReadOnlyList<string> args, CommandContext context)
    {
        if (args.Count == 0 || args[0] is "help" or "--help" or "-h")
            return Help(args.Skip(1).FirstOrDefault(), context);
        Command? command = All.FirstOrDefault(c => c.Name == args[0]);
        if (command is null)
        {
            context.Err.WriteLine($"study: unknown command '{args[0]}'. Commands: {string.Join(", ", All.Select(c => c.Name))}.");
            context.Err.WriteLine("Run 'study help' for usage.");
            return ExitCode.InputError;
        }
        try
        {
            return command.Run(args.Skip(1).ToList(), context);
        }
        catch (UsageException e)
        {
            context.Err.WriteLine($"study {command.Name}: {e.Message}");
            context.Err.WriteLine($"usage: {command.Usage}");
            return ExitCode.InputError;
        }
        catch (InputException e)
        {
            context.Err.WriteLine($"error: {e.Describe()}");
            return ExitCode.InputError;
        }
        catch (Exception e) when (Environment.GetEnvironmentVariable("STUDY_DEBUG") != "1")
        {
            context.Err.WriteLine($"study {command.Name}: internal error ({e.GetType().Name}): {e.Message}");
            context.Err.WriteLine("This is a fault in Study, not in your data. Set STUDY_DEBUG=1 for details.");
            return ExitCode.Internal;
        }
    }

    public static bool IsCommand(string name) => name is "help" or "--help" or "-h" || All.Any(c => c.Name == name);

    private static int Help(string? name, CommandContext context)
    {
        Command? command = name is null ? null : All.FirstOrDefault(c => c.Name == name);
        if (command is not null)
        {
            context.Out.WriteLine($"usage: {command.Usage}");
            context.Out.WriteLine($"  {command.Summary}");
            foreach (string line in command.OptionHelp) context.Out.WriteLine("  " + line);
            return ExitCode.Done;
        }
        context.Out.WriteLine("study: load flow, tap choice and fault levels on single-line networks");
        context.Out.WriteLine();
        context.Out.WriteLine("  study                 open the terminal UI on the bundled demo network");
        context.Out.WriteLine("  study FILE            open the terminal UI on FILE");
        foreach (Command c in All) context.Out.WriteLine($"  {c.Usage}");
        context.Out.WriteLine();
        context.Out.WriteLine("Exit codes: 0 done, 2 input error, 3 no convergence, 4 internal error.");
        context.Out.WriteLine("'study help COMMAND' shows a command's options.");
        return name is null ? ExitCode.Done : ExitCode.InputError;
    }
}
