// The parsed command line of one subcommand, read through the names it declared.
using System.CommandLine;
using System.Globalization;

namespace Study.App.Cli;

/// <summary>
/// Values of the declared positionals and options. Anything the declaration does not know was already
/// refused by the parser; the readers here turn text into numbers, pairs and lists with messages that
/// say what was expected, so a typo never silently changes a study.
/// </summary>
public sealed class Arguments
{
    private readonly ParseResult parsed;
    private readonly Declaration declaration;

    internal Arguments(ParseResult parsed, Declaration declaration)
    {
        this.parsed = parsed;
        this.declaration = declaration;
    }

    public bool Has(string flag) => Option(flag) is Option<bool> o && parsed.GetValue(o);

    /// <summary>The positional at <paramref name="index"/>; a usage error naming <paramref name="what"/> when it was left out.</summary>
    public string Positional(int index, string what) => PositionalOrNull(index) ?? throw new UsageException($"missing {what}");

    public string? PositionalOrNull(int index) =>
        index < declaration.Positionals.Count ? parsed.GetValue(declaration.Positionals[index]) : null;

    /// <summary>The words of the positional declared with <see cref="Declaration.PositionalMany"/>.</summary>
    public IReadOnlyList<string> Remaining() =>
        declaration.Remaining is { } rest ? parsed.GetValue(rest) ?? [] : [];

    public string? Value(string name) => Option(name) switch
    {
        Option<string?> single => parsed.GetValue(single),
        Option<string[]> many => parsed.GetValue(many) is { Length: > 0 } v ? v[0] : null,
        _ => null,
    };

    /// <summary>Every value of a many-valued option, commas splitting values as spaces do.</summary>
    public IReadOnlyList<string> Values(string name)
    {
        string[] raw = Option(name) switch
        {
            Option<string[]> many => parsed.GetValue(many) ?? [],
            Option<string?> single => parsed.GetValue(single) is string s ? [s] : [],
            _ => [],
        };
        return raw.SelectMany(s => s.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)).ToList();
    }

    public double? Number(string name)
    {
        string? text = Value(name);
        if (text is null) return null;
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) && double.IsFinite(value))
            return value;
        throw new UsageException($"--{name} needs a number, got '{text}'");
    }

    public int? Integer(string name)
    {
        string? text = Value(name);
        if (text is null) return null;
        if (int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out int value)) return value;
        throw new UsageException($"--{name} needs a whole number, got '{text}'");
    }

    /// <summary>Two numbers separated by a comma, e.g. --band 0.97,1.03.</summary>
    public (double A, double B)? Pair(string name)
    {
        string? text = Value(name);
        if (text is null) return null;
        string[] parts = text.Split(',', StringSplitOptions.TrimEntries);
        if (parts.Length == 2
            && double.TryParse(parts[0], NumberStyles.Float, CultureInfo.InvariantCulture, out double a)
            && double.TryParse(parts[1], NumberStyles.Float, CultureInfo.InvariantCulture, out double b)
            && double.IsFinite(a) && double.IsFinite(b))
            return (a, b);
        throw new UsageException($"--{name} needs two numbers separated by a comma, got '{text}'");
    }

    /// <summary>
    /// Refuses, before any work, an output that is one of the inputs (a report written over the network
    /// file) or that two outputs share; the outputs' own paths are checked when written
    /// (<see cref="Study.Core.Io.OutputTarget"/>).
    /// </summary>
    /// <exception cref="Study.Core.Model.InputException">An output names an input or another output.</exception>
    internal void CheckOutputs()
    {
        var inputs = new List<string>();
        var outputs = new List<(string What, string Path)>();
        for (int i = 0; i < declaration.Positionals.Count; i++)
        {
            string name = declaration.Positionals[i].Name;
            if (PositionalOrNull(i) is not string value) continue;
            if (Declaration.InputNames.Contains(name)) inputs.Add(value);
            else if (Declaration.OutputFileNames.Contains(name)) outputs.Add((name, value));
        }
        foreach (string name in Declaration.OutputFileNames.Concat(Declaration.OutputFolderNames))
        {
            if (declaration.Find(name) is not null && Value(name) is string value) outputs.Add(("--" + name, value));
        }
        for (int o = 0; o < outputs.Count; o++)
        {
            (string what, string path) = outputs[o];
            foreach (string input in inputs)
            {
                if (Study.Core.Io.OutputTarget.Same(path, input))
                    throw new Study.Core.Model.InputException(
                        $"cannot write {path}: it is the input {input} ({what} names it); choose another name so the original is kept");
            }
            for (int other = 0; other < o; other++)
            {
                if (Study.Core.Io.OutputTarget.Same(path, outputs[other].Path))
                    throw new Study.Core.Model.InputException($"cannot write {path}: {outputs[other].What} and {what} both name it; give each its own file");
            }
        }
    }

    private Option? Option(string name) =>
        declaration.Find(name) ?? throw new InvalidOperationException($"option --{name} is read but not declared");
}
