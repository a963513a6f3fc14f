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

    private Option? Option(string name) =>
        declaration.Find(name) ?? throw new InvalidOperationException($"option --{name} is read but not declared");
}
