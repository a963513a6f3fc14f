// One editable field of an element: label, unit, default, and how to read and write it as text.
using System.Globalization;
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>
/// A field of an element record as the forms and tables show it. <see cref="Write"/> returns a new
/// record with the field set from text, or throws <see cref="FormatException"/> with a message for the user.
/// </summary>
public sealed record ElementField(
    string Name,
    string Unit,
    string DefaultText,
    Func<object, string> Read,
    Func<object, string, object> Write)
{
    /// <summary>"Name unit", as used for labels and table headers.</summary>
    public string Header => Unit.Length > 0 ? $"{Name} {Unit}" : Name;

    /// <summary>The network-file key the field edits ("kv", "tap.position"), so validation messages can name the field by its label.</summary>
    public string? Key { get; init; }

    /// <summary>This field, editing the file key <paramref name="key"/>.</summary>
    public ElementField Keyed(string key) => this with { Key = key };

    /// <summary>The values the field may take, to pick from a list (F4 in the form): bus ids, choices, yes/no; null for free text.</summary>
    public Func<Network, IReadOnlyList<FieldOption>>? Options { get; init; }

    /// <summary>True when blank is not allowed: the hint says "required" rather than a default.</summary>
    public bool Required { get; init; }

    /// <summary>True for a number: its key may stand in a per-unit formula, where the form names it by its label.</summary>
    public bool Numeric { get; init; }
}

/// <summary>One value a field may take, with words that help choose it ("CQ11", "11 kV · Cold Quay 11 kV board").</summary>
public sealed record FieldOption(string Value, string Description = "");

/// <summary>Builders for typed fields; empty text means "not given" for optional values.</summary>
public static class Field
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>
    /// A value as the form shows it and writes it back: twelve significant digits, so a value from an
    /// imported or generated file (r = 0.0003691602 pu) keeps its digits when another field of the form is
    /// edited; six decimals rounded it to 0.000369, and a 1e-7 pu value to 0.
    /// </summary>
    public static string Format(double value) => value.ToString("G12", Inv);

    public static ElementField Id<T>(string name, Func<T, string> get, Func<T, string, T> set) =>
        new(name, "", "", e => get((T)e), (e, text) =>
        {
            string id = text.Trim();
            if (id.Length == 0) throw new FormatException($"{name} is required");
            return set((T)e, id)!;
        });

    /// <summary>A reference to a bus, picked from the network's buses (F4) or typed; the validator names a bus that does not exist.</summary>
    public static ElementField BusRef<T>(string name, Func<T, string> get, Func<T, string, T> set) =>
        Id(name, get, set) with { Options = BusOptions };

    /// <summary>The buses of a network as choices: id, then base kV and name.</summary>
    public static IReadOnlyList<FieldOption> BusOptions(Network n) =>
        n.Buses.Select(b => new FieldOption(b.Id, $"{(b.Kv > 0 ? Format(b.Kv) + " kV" : "kV not stated")}{(b.Name is { } name ? " · " + name : "")}")).ToList();

    /// <summary>A number that has no default: blank is an error naming the field.</summary>
    public static ElementField RequiredNumber<T>(string name, string unit, Func<T, double> get, Func<T, double, T> set)
    {
        string header = unit.Length > 0 ? $"{name} {unit}" : name;
        return new ElementField(name, unit, "", e => Format(get((T)e)), (e, text) =>
        {
            if (text.Trim().Length == 0) throw new FormatException($"{header} is required");
            return set((T)e, Parse(header, text))!;
        }) { Required = true, Numeric = true };
    }

    public static ElementField Text<T>(string name, Func<T, string?> get, Func<T, string?, T> set) =>
        new(name, "", "", e => get((T)e) ?? "", (e, text) => set((T)e, text.Trim().Length == 0 ? null : text.Trim())!);

    public static ElementField Number<T>(string name, string unit, double defaultValue, Func<T, double> get, Func<T, double, T> set) =>
        new(name, unit, Format(defaultValue), e => Format(get((T)e)), (e, text) =>
            set((T)e, text.Trim().Length == 0 ? defaultValue : Parse(HeaderOf(name, unit), text))!) { Numeric = true };

    public static ElementField Optional<T>(string name, string unit, string defaultText, Func<T, double?> get, Func<T, double?, T> set) =>
        new(name, unit, defaultText, e => get((T)e) is double v ? Format(v) : "", (e, text) =>
            set((T)e, text.Trim().Length == 0 ? null : Parse(HeaderOf(name, unit), text))!) { Numeric = true };

    public static ElementField Integer<T>(string name, string unit, int defaultValue, Func<T, int> get, Func<T, int, T> set) =>
        new(name, unit, defaultValue.ToString(Inv), e => get((T)e).ToString(Inv), (e, text) =>
        {
            if (text.Trim().Length == 0) return set((T)e, defaultValue)!;
            if (!int.TryParse(text.Trim(), NumberStyles.Integer, Inv, out int v))
                throw new FormatException($"{HeaderOf(name, unit)}: '{text.Trim()}' is not a whole number");
            return set((T)e, v)!;
        }) { Numeric = true };

    public static IReadOnlyList<FieldOption> YesNo { get; } = [new("yes"), new("no")];

    public static ElementField Flag<T>(string name, bool defaultValue, Func<T, bool> get, Func<T, bool, T> set) =>
        new ElementField(name, "", defaultValue ? "yes" : "no", e => get((T)e) ? "yes" : "no", (e, text) =>
            set((T)e, YesOrNo(name, text) ?? defaultValue)!) { Options = _ => YesNo };

    /// <summary>yes / no in the spellings people type; null for blank.</summary>
    public static bool? YesOrNo(string name, string text) => text.Trim().ToLowerInvariant() switch
    {
        "" => null,
        "yes" or "y" or "true" or "1" => true,
        "no" or "n" or "false" or "0" => false,
        _ => throw new FormatException($"{name}: answer yes or no"),
    };

    private static string HeaderOf(string name, string unit) => unit.Length > 0 ? $"{name} {unit}" : name;

    /// <summary>
    /// A choice among enum values, written in the file's lower-case spelling. The label is the name alone:
    /// F4 lists the spellings and a wrong one is answered with them, so they need not fill the label.
    /// </summary>
    public static ElementField Choice<T, TEnum>(string name, TEnum defaultValue, Func<T, TEnum> get, Func<T, TEnum, T> set)
        where TEnum : struct, Enum =>
        new ElementField(name, "", defaultValue.ToString().ToLowerInvariant(),
            e => get((T)e).ToString().ToLowerInvariant(), (e, text) =>
            {
                if (text.Trim().Length == 0) return set((T)e, defaultValue)!;
                if (!Enum.TryParse(text.Trim(), ignoreCase: true, out TEnum v) || !Enum.IsDefined(v))
                    throw new FormatException($"{name}: one of {string.Join(", ", Enum.GetNames<TEnum>().Select(s => s.ToLowerInvariant()))}");
                return set((T)e, v)!;
            })
        { Options = _ => Enum.GetNames<TEnum>().Select(s => new FieldOption(s.ToLowerInvariant())).ToList() };

    /// <summary>A choice among enum values with the spellings given (the file's own), e.g. km / line / pu; labelled like <see cref="Choice"/>.</summary>
    public static ElementField Named<T, TEnum>(string name, IReadOnlyList<(TEnum Value, string Text)> spellings, TEnum defaultValue,
        Func<T, TEnum> get, Func<T, TEnum, T> set)
        where TEnum : struct, Enum
    {
        string Spell(TEnum v) => spellings.First(s => EqualityComparer<TEnum>.Default.Equals(s.Value, v)).Text;
        return new ElementField(name, "", Spell(defaultValue), e => Spell(get((T)e)), (e, text) =>
        {
            string t = text.Trim().ToLowerInvariant();
            if (t.Length == 0) return set((T)e, defaultValue)!;
            foreach (var (value, spelled) in spellings)
                if (spelled.ToLowerInvariant() == t) return set((T)e, value)!;
            throw new FormatException($"{name}: one of {string.Join(", ", spellings.Select(s => s.Text))}");
        })
        { Options = _ => spellings.Select(s => new FieldOption(s.Text)).ToList() };
    }

    /// <summary>A choice with the file's spellings that may be left blank: blank is "not given" (null), as the file leaves the key out.</summary>
    public static ElementField NamedOptional<T, TEnum>(string name, IReadOnlyList<(TEnum Value, string Text)> spellings, string blankText,
        Func<T, TEnum?> get, Func<T, TEnum?, T> set)
        where TEnum : struct, Enum
    {
        string Spell(TEnum? v) => v is TEnum known ? spellings.First(s => EqualityComparer<TEnum>.Default.Equals(s.Value, known)).Text : "";
        return new ElementField(name, "", blankText, e => Spell(get((T)e)), (e, text) =>
        {
            string t = text.Trim().ToLowerInvariant();
            if (t.Length == 0) return set((T)e, null)!;
            foreach (var (value, spelled) in spellings)
                if (spelled.ToLowerInvariant() == t) return set((T)e, value)!;
            throw new FormatException($"{name}: one of {string.Join(", ", spellings.Select(s => s.Text))}, or blank for not given");
        })
        { Options = _ => spellings.Select(s => new FieldOption(s.Text)).ToList() };
    }

    private static double Parse(string name, string text)
    {
        if (!double.TryParse(text.Trim(), NumberStyles.Float, Inv, out double v) || !double.IsFinite(v))
            throw new FormatException($"{name}: '{text.Trim()}' is not a number");
        return v;
    }
}
