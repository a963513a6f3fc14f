// What every subcommand of `study` provides: its name, summary, the arguments and options it declares once, and Run.
using System.CommandLine;
using SclCommand = System.CommandLine.Command;

namespace Study.App.Cli;

/// <summary>Where a command writes: standard output for results, standard error for messages.</summary>
public sealed record CommandContext(TextWriter Out, TextWriter Err)
{
    /// <summary>
    /// The byte stream beneath <see cref="Out"/>, when there is one (standard output): large results
    /// are written to it directly, as UTF-8, instead of through one big string.
    /// </summary>
    public Stream? OutStream { get; init; }
}

/// <summary>A command-line mistake: unknown option, missing argument, bad value. Exit code 2, with the command's usage.</summary>
public sealed class UsageException(string message) : Exception(message);

/// <summary>Process exit codes of the study command (README, Commands).</summary>
public static class ExitCode
{
    /// <summary>The work was done; violations are reported, not failures.</summary>
    public const int Done = 0;
    /// <summary>Bad input: file, syntax, reference, physical data or command-line usage.</summary>
    public const int InputError = 2;
    /// <summary>The load flow did not converge.</summary>
    public const int NoConvergence = 3;
    /// <summary>A fault in the program itself.</summary>
    public const int Internal = 4;
}

/// <summary>
/// A subcommand. It declares its arguments and options once (<see cref="Declare"/>); usage, help and
/// parsing all come from that declaration (System.CommandLine). The command then only reads the
/// parsed values, calls the engine and renders the result record.
/// </summary>
public abstract class CliCommand
{
    public abstract string Name { get; }
    public abstract string Summary { get; }

    /// <summary>The positional arguments and options, each with the words its help shows.</summary>
    protected abstract void Declare(Declaration declare);

    protected abstract int Execute(Arguments args, CommandContext context);

    /// <summary>The System.CommandLine command built from the declaration (once per run).</summary>
    internal SclCommand Build(out Declaration declaration)
    {
        var command = new SclCommand(Name, Summary);
        declaration = new Declaration(command);
        Declare(declaration);
        return command;
    }

    internal int Run(ParseResult parsed, Declaration declaration, CommandContext context)
    {
        var args = new Arguments(parsed, declaration);
        args.CheckOutputs();
        return Execute(args, context);
    }
}

/// <summary>
/// Declares a command's positionals and options on its System.CommandLine command. Values are taken as
/// text and read by <see cref="Arguments"/>, whose messages say what was expected in plain words.
/// </summary>
public sealed class Declaration(SclCommand command)
{
    private readonly List<Argument<string?>> positionals = [];
    private readonly Dictionary<string, Option> options = new(StringComparer.Ordinal);

    internal IReadOnlyList<Argument<string?>> Positionals => positionals;

    /// <summary>The positional that takes every remaining word (PART...), when declared.</summary>
    internal Argument<string[]>? Remaining { get; private set; }

    internal Option? Find(string name) => options.GetValueOrDefault(name);

    /// <summary>
    /// The arguments that name files to read, and the options and positionals that name files or a folder
    /// to write: every command spells them alike, so one check (<see cref="Arguments.CheckOutputs"/>)
    /// keeps any output off any input and off another output.
    /// </summary>
    internal static readonly IReadOnlySet<string> InputNames = new HashSet<string>(StringComparer.Ordinal) { "FILE", "BEFORE", "AFTER", "IN" };

    internal static readonly IReadOnlySet<string> OutputFileNames = new HashSet<string>(StringComparer.Ordinal) { "OUT", "markdown", "export-jacobian", "output" };

    internal static readonly IReadOnlySet<string> OutputFolderNames = new HashSet<string>(StringComparer.Ordinal) { "csv" };

    /// <summary>A positional argument; <paramref name="required"/> false lets it be left out.</summary>
    public Declaration Positional(string name, string description, bool required = true)
    {
        var argument = new Argument<string?>(name) { Description = description, Arity = required ? ArgumentArity.ExactlyOne : ArgumentArity.ZeroOrOne };
        positionals.Add(argument);
        command.Arguments.Add(argument);
        return this;
    }

    /// <summary>A last positional that takes one or more words (study merge PART...).</summary>
    public Declaration PositionalMany(string name, string description)
    {
        Remaining = new Argument<string[]>(name) { Description = description, Arity = ArgumentArity.OneOrMore };
        command.Arguments.Add(Remaining);
        return this;
    }

    /// <summary>An option with one value, named <paramref name="valueName"/> in the help (--scenario NAME).</summary>
    public Declaration Value(string name, string valueName, string description, params string[] aliases) =>
        Add(name, new Option<string?>("--" + name, aliases) { Description = description, HelpName = valueName, Arity = ArgumentArity.ExactlyOne });

    /// <summary>An option with one or more values, separated by spaces or commas (--bus A B, --type 3ph,slg).</summary>
    public Declaration Many(string name, string valueName, string description) =>
        Add(name, new Option<string[]>("--" + name)
        {
            Description = description, HelpName = valueName, Arity = ArgumentArity.OneOrMore, AllowMultipleArgumentsPerToken = true,
        });

    /// <summary>An option without a value.</summary>
    public Declaration Flag(string name, string description) =>
        Add(name, new Option<bool>("--" + name) { Description = description, Arity = ArgumentArity.Zero });

    private Declaration Add(string name, Option option)
    {
        options.Add(name, option);
        command.Options.Add(option);
        return this;
    }
}
