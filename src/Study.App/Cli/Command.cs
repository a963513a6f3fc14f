// What every subcommand of `study` provides: its name, usage text, the options it knows, and Run.
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

/// <summary>A subcommand. The CLI layer only parses, calls the engine and renders the result record.</summary>
public abstract class Command
{
    public abstract string Name { get; }
    public abstract string Summary { get; }
    /// <summary>One usage line, e.g. "study check FILE [--json]".</summary>
    public abstract string Usage { get; }
    /// <summary>Lines describing each option, shown by `study help NAME`.</summary>
    public virtual IReadOnlyList<string> OptionHelp => [];
    protected virtual IEnumerable<string> ValueOptions => [];
    protected virtual IEnumerable<string> Flags => ["json"];

    /// <summary>Single-dash short forms of this command's options, e.g. "-o" for "--output".</summary>
    protected virtual IReadOnlyDictionary<string, string> ShortForms { get; } = new Dictionary<string, string>();

    public int Run(IReadOnlyList<string> args, CommandContext context) =>
        Execute(new Arguments(args.Select(a => ShortForms.TryGetValue(a, out string? full) ? full : a).ToList(), ValueOptions, Flags), context);

    protected abstract int Execute(Arguments args, CommandContext context);
}
