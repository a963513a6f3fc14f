// A small, strict reader of command-line arguments: positionals, --flags and --options with values.
using System.Globalization;

namespace Study.App.Cli;

/// <summary>
/// Parsed arguments of one subcommand. Each command declares the options it knows; anything else is
/// a usage error, so a typo never silently changes a study.
/// </summary>
public sealed class Arguments
{
    private readonly List<string> positionals = [];
    private readonly Dictionary<string, List<string>> options = new(StringComparer.Ordinal);
    private readonly HashSet<string> flags = new(StringComparer.Ordinal);

    /// <param name="args">The arguments after the subcommand name.</param>
    /// <param name="valueOptions">Options that take values (without "--"); a trailing "*" means "many values until the next option".</param>
    /// <param name="flagOptions">Options that take no value.</param>
    public Arguments(IReadOnlyList<string> args, IEnumerable<string> valueOptions, IEnumerable<string> flagOptions)
    {
        var single = new HashSet<string>();
        var many = new HashSet<string>();
        foreach (string o in valueOptions)
        {
            if (o.EndsWith('*')) many.Add(o.TrimEnd('*'));
            else single.Add(o);
        }
        var flagSet = flagOptions.ToHashSet();
        for (int i = 0; i < args.Count; i++)
        {
            string a = args[i];
            if (!a.StartsWith("--", StringComparison.Ordinal) || a == "--")
            {
                positionals.Add(a);
                continue;
            }
            string name = a[2..];
            string? inline = null;
            int eq = name.IndexOf('=');
            if (eq >= 0)
            {
                inline = name[(eq + 1)..];
                name = name[..eq];
            }
            if (flagSet.Contains(name))
            {
                if (inline is not null) throw new UsageException($"--{name} takes no value");
                flags.Add(name);
            }
            else if (single.Contains(name) || many.Contains(name))
            {
                var values = options.TryGetValue(name, out var existing) ? existing : options[name] = [];
                if (inline is not null) values.Add(inline);
                else if (many.Contains(name))
                {
                    while (i + 1 < args.Count && !args[i + 1].StartsWith("--", StringComparison.Ordinal)) values.Add(args[++i]);
                    if (values.Count == 0) throw new UsageException($"--{name} needs at least one value");
                }
                else
                {
                    if (i + 1 >= args.Count) throw new UsageException($"--{name} needs a value");
                    values.Add(args[++i]);
                }
                if (single.Contains(name) && values.Count > 1) throw new UsageException($"--{name} is given more than once");
            }
            else
            {
                var known = single.Concat(many).Concat(flagSet).Select(k => "--" + k).Order();
                throw new UsageException($"unknown option --{name} (this command knows: {string.Join(", ", known)})");
            }
        }
    }

    public IReadOnlyList<string> Positionals => positionals;

    public bool Has(string flag) => flags.Contains(flag);

    public string Positional(int index, string what) =>
        index < positionals.Count ? positionals[index] : throw new UsageException($"missing {what}");

    public void ExpectPositionals(int count)
    {
        if (positionals.Count > count)
            throw new UsageException($"unexpected argument '{positionals[count]}'");
    }

    public string? Value(string name) => options.TryGetValue(name, out var v) ? v[0] : null;

    public IReadOnlyList<string> Values(string name) =>
        options.TryGetValue(name, out var v) ? v.SelectMany(s => s.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)).ToList() : [];

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
}
