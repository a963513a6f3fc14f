// Entry point of the command line: picks the subcommand, parses what it declared, runs it, turns failures into exit codes.
using System.CommandLine;
using System.CommandLine.Help;
using Study.App.Cli.Choose;
using Study.App.Cli.Compare;
using Study.App.Cli.Faults;
using Study.App.Cli.Files;
using Study.App.Cli.Outages;
using Study.App.Cli.Profile;
using Study.App.Cli.Scale;
using Study.App.Cli.Shards;
using Study.App.Cli.Solve;
using Study.App.Cli.Start;
using Study.App.Cli.Taps;
using Study.Core.Model;

namespace Study.App.Cli;

/// <summary>
/// Dispatches `study SUBCOMMAND ...`. Usage mistakes and input problems become one readable message and
/// exit 2; anything unexpected becomes exit 4 with a one-line message — never a stack trace (set
/// STUDY_DEBUG=1 to see one). `study COMMAND --help` and `study help COMMAND` show the same help, exit 0.
/// </summary>
public static class StudyCommand
{
    public static IReadOnlyList<CliCommand> All { get; } =
    [
        new CheckCommand(),
        new ConvertCommand(),
        new SolveCommand(),
        new TapsCommand(),
        new OutagesCommand(),
        new MergeCommand(),
        new CompareCommand(),
        new FaultCommand(),
        new StartCommand(),
        new ProfileCommand(),
        new ChooseCommand(),
        new ExplainCommand(),
        new GenerateCommand(),
        new BenchCommand(),
    ];

    public static int Run(IReadOnlyList<string> args, CommandContext context)
    {
        context = context with { Out = TerminalText.Wrap(context.Out), Err = TerminalText.Wrap(context.Err) };
        if (args.Count == 0 || args[0] is "help" or "--help" or "-h" or "-?")
        {
            string? topic = args.Skip(1).FirstOrDefault();
            if (topic is null) return Overview(context);
            if (Find(topic) is null) return Unknown(topic, context);
            return Run([topic, "--help"], context);
        }
        if (Find(args[0]) is not CliCommand command) return Unknown(args[0], context);

        // A plain command named "study" as the root, so the usage line says "study" whatever the process is called.
        var root = new System.CommandLine.Command("study");
        System.CommandLine.Command built = command.Build(out Declaration declaration);
        built.Options.Add(new HelpOption());
        root.Subcommands.Add(built);
        ParseResult parsed = root.Parse(args.ToArray());
        if (parsed.Action is HelpAction)
        {
            parsed.Invoke(new InvocationConfiguration { Output = context.Out, Error = context.Err });
            return ExitCode.Done;
        }
        if (parsed.Errors.Count > 0)
        {
            foreach (var error in parsed.Errors) context.Err.WriteLine($"study {command.Name}: {Plain(error.Message, declaration)}");
            context.Err.WriteLine($"'study {command.Name} --help' lists its arguments and options.");
            return ExitCode.InputError;
        }
        try
        {
            return command.Run(parsed, declaration, context);
        }
        catch (UsageException e)
        {
            context.Err.WriteLine($"study {command.Name}: {e.Message}");
            context.Err.WriteLine($"'study {command.Name} --help' lists its arguments and options.");
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

    /// <summary>
    /// `study` or `study FILE` with standard input or output not a terminal (a script, a pipe, CI): the
    /// terminal UI would wait for keys that never come, so say what to run instead. Exit code 2.
    /// </summary>
    public static int NoTerminal(TextWriter err)
    {
        err.WriteLine("study: the terminal UI needs a terminal, and standard input or output is not one (a script, a pipe or CI?).");
        err.WriteLine("From a script run a command instead, e.g. 'study check FILE' or 'study solve FILE'; 'study help' lists them.");
        return ExitCode.InputError;
    }

    public static bool IsCommand(string name) => name is "help" or "--help" or "-h" or "-?" || Find(name) is not null;

    private static CliCommand? Find(string name) => All.FirstOrDefault(c => c.Name == name);

    private static int Unknown(string name, CommandContext context)
    {
        context.Err.WriteLine($"study: unknown command '{name}'. Commands: {string.Join(", ", All.Select(c => c.Name))}.");
        context.Err.WriteLine("Run 'study help' for usage.");
        return ExitCode.InputError;
    }

    /// <summary>The parser's messages in the words of the rest of the program; a missing positional is named with what it is.</summary>
    private static string Plain(string message, Declaration declaration)
    {
        if (message.StartsWith("Required argument missing", StringComparison.Ordinal)
            && declaration.Positionals.Where(p => p.Arity.MinimumNumberOfValues > 0).Cast<System.CommandLine.Argument>()
                .Append(declaration.Remaining).FirstOrDefault(p => p is not null) is { } first)
            return $"missing {first.Name} ({first.Description})";
        return message.Replace("Unrecognized command or argument", "unknown argument or option");
    }

    private static int Overview(CommandContext context)
    {
        TextWriter o = context.Out;
        o.WriteLine("study: load flow, tap choice, fault levels and motor starting on single-line networks");
        o.WriteLine();
        o.WriteLine("  study                 open the terminal UI on the bundled demo network");
        o.WriteLine("  study FILE            open the terminal UI on FILE");
        foreach (CliCommand c in All) o.WriteLine($"  study {c.Name,-15} {c.Summary}");
        o.WriteLine();
        o.WriteLine("Exit codes: 0 done, 2 input error, 3 no convergence, 4 internal error.");
        o.WriteLine("'study COMMAND --help' (or 'study help COMMAND') shows a command's arguments and options.");
        return ExitCode.Done;
    }
}
