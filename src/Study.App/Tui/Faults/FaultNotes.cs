// The fault study's notes and missing data in full, each pointing to the form field that would change it.
using System.Text.RegularExpressions;
using Study.App.Tui.Editing;
using Study.Core.Faults;
using Study.Core.Model;

namespace Study.App.Tui.Faults;

/// <summary>
/// Lays out <see cref="FaultResult.Notes"/> and <see cref="FaultResult.MissingZeroSequence"/> as whole
/// sentences. An assumption the engine made about an element ("lv neutral has no earthing data: taken
/// as solidly earthed") names the element and the label of the edit-form field that states it, so the
/// engineer knows where to change what decided an earth-fault result.
/// </summary>
public static partial class FaultNotes
{
    public static IReadOnlyList<string> Lines(FaultResult r, Network network)
    {
        var lines = new List<string>();
        if (r.LeftOut.Count > 0)
        {
            string kinds = string.Join(", ", r.LeftOut.Select(k => k.Code()));
            lines.Add($"Earth faults ({kinds}) not calculated: {r.MissingZeroSequence.Count} element(s) lack zero-sequence data; "
                + "the other fault levels and the breaker duty against them are given. Missing:");
            foreach (MissingData m in r.MissingZeroSequence)
                lines.Add($"  • {m.Message}{Where(network, m.ElementId, ZeroFieldKeys(network, m.ElementId))}");
        }
        foreach (string note in r.Notes)
        {
            Match earthing = Earthing().Match(note);
            string where = earthing.Success
                ? Where(network, earthing.Groups["id"].Value, [$"{earthing.Groups["winding"].Value}Neutral.grounded", $"{earthing.Groups["winding"].Value}Neutral.rOhm"])
                : "";
            lines.Add($"Note: {note}{where}");
        }
        return lines;
    }

    /// <summary>" — to change it: transformer CQ-T2, fields 'LV neutral earthed', 'LV neutral R' (F4 in the Transformers table)".</summary>
    public static string Where(Network network, string id, IReadOnlyList<string> keys)
    {
        ElementKind? kind = KindOf(network, id);
        if (kind is not ElementKind k) return "";
        var labels = ElementFields.For(k).Where(f => f.Key is not null && keys.Contains(f.Key)).Select(f => $"'{f.Name}'").Distinct().ToList();
        if (labels.Count == 0) return "";
        return $" — to change it: {ElementKinds.Label(k)} {id}, {(labels.Count == 1 ? "field" : "fields")} {string.Join(", ", labels)}"
            + $" (Enter on it in the {ElementFields.Plural(k)} table)";
    }

    private static IReadOnlyList<string> ZeroFieldKeys(Network network, string id) => KindOf(network, id) switch
    {
        ElementKind.Line => ["z0.per", "z0.r", "z0.x"],
        ElementKind.Transformer or ElementKind.ThreeWindingTransformer => ["vectorGroup"],
        _ => [],
    };

    private static ElementKind? KindOf(Network network, string id) =>
        network.Lines.Any(l => l.Id == id) ? ElementKind.Line
        : network.Transformers.Any(t => t.Id == id) ? ElementKind.Transformer
        : network.ThreeWindingTransformers.Any(t => t.Id == id) ? ElementKind.ThreeWindingTransformer
        : null;

    [GeneratedRegex(@"^(?<id>\S+): (?<winding>hv|mv|lv) neutral has no earthing data")]
    private static partial Regex Earthing();
}
