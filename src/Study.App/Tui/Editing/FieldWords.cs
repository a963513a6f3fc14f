// File keys in running text put into the form's words: each key becomes the label, with unit, of its field.
using System.Text.RegularExpressions;

namespace Study.App.Tui.Editing;

/// <summary>
/// Replaces the file keys named in a text ("zPercent", "lockedRotor.currentRatio") by the labels of the
/// fields that edit them ("Impedance %", "LR current × rated"). One pass, longest key first, so a label
/// put in is never read again as a key. A key counts only standing alone: not inside a word or a dotted
/// key, not in quotes (a spelling such as "km" stays one) and not as a unit: a lower-case key after "/"
/// is one ("Ω/km" keeps its km), a camel-case key never is ("rPu/xPu" names two fields).
/// </summary>
public sealed class FieldWords
{
    private readonly Dictionary<string, string> labels;
    private readonly Regex? keys;

    private FieldWords(Dictionary<string, string> labels)
    {
        this.labels = labels;
        keys = labels.Count == 0 ? null : new Regex(
            @"(?<![\w.""'])(" + string.Join("|", labels.Keys.OrderByDescending(k => k.Length).Select(Regex.Escape)) + @")(?![\w""']|\.\w)",
            RegexOptions.CultureInvariant);
    }

    /// <summary>The label for exactly this key; null when no field here has it.</summary>
    public string? LabelOf(string key) => labels.GetValueOrDefault(key);

    public string Replace(string text) => keys is null ? text : keys.Replace(text, m =>
        m.Index > 0 && text[m.Index - 1] == '/' && m.Value.All(c => !char.IsUpper(c)) ? m.Value : labels[m.Value]);

    /// <summary>
    /// For the validator's messages about the form's element: every keyed field, by its whole key; a key
    /// edited by several fields reads as their labels joined ("Lowest position / Highest position").
    /// </summary>
    public static FieldWords ForMessages(IReadOnlyList<ElementField> fields) =>
        new(fields.Where(f => f.Key is not null).GroupBy(f => f.Key!)
            .ToDictionary(g => g.Key, g => string.Join(" / ", g.Select(f => f.Header))));

    /// <summary>
    /// For per-unit derivations, whose formulas name numbers by their keys ("zPercent / 100") and whose
    /// prose uses words that are also keys of text fields ("bus", "hv"): the numeric fields only, of the
    /// element and then of the scenario that scales it, each by its whole key and, where no other field
    /// shares it, by its last part ("position" for tap.position, as the formulas write it).
    /// </summary>
    public static FieldWords ForFormulas(IReadOnlyList<ElementField> fields, IReadOnlyList<ElementField> scenario)
    {
        var labels = new Dictionary<string, string>();
        foreach (IReadOnlyList<ElementField> list in new[] { fields, scenario })
        {
            // A key several fields edit (a tap range, a ZIP mix) has no one label: it is left as it is.
            var single = list.Where(f => f.Numeric && f.Key is not null).GroupBy(f => f.Key!)
                .Where(g => g.Count() == 1).Select(g => g.Single()).ToList();
            foreach (ElementField f in single) labels.TryAdd(f.Key!, f.Header);
            foreach (var part in single.Where(f => f.Key!.Contains('.', StringComparison.Ordinal))
                         .GroupBy(f => f.Key![(f.Key!.LastIndexOf('.') + 1)..]).Where(g => g.Count() == 1))
                labels.TryAdd(part.Key, part.Single().Header);
        }
        return new FieldWords(labels);
    }
}
