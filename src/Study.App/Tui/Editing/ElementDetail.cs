// The text of the Detail tab: an element's fields, its validation findings and its per-unit derivation.
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.App.Tui.Editing;

/// <summary>Describes one element in plain lines, from the same field list, validator and explainer as the form.</summary>
public static class ElementDetail
{
    public static string Describe(Network network, ElementKind kind, string id)
    {
        object? element = ElementLists.Find(network, kind, id);
        if (element is null) return "";
        var lines = new List<string> { $"{char.ToUpperInvariant(ElementKinds.Label(kind)[0])}{ElementKinds.Label(kind)[1..]} {id}" };
        IEnumerable<string> given = ElementFields.For(kind).Select(f => (f, v: f.Read(element)))
            .Where(x => x.v.Length > 0).Select(x => $"{x.f.Header} {x.v}");
        lines.Add("  " + string.Join(" · ", given));
        // Findings in the form's words: each file key a field edits reads as that field's label.
        FieldWords words = FieldWords.ForMessages(ElementFields.For(kind));
        foreach (Problem p in NetworkValidator.ValidateElement(network, kind, id))
            lines.Add($"  {(p.IsError ? "error" : "warning")}: {(p.Field is null ? "" : (words.LabelOf(p.Field) ?? p.Field) + ": ")}{words.Replace(p.Message)}");
        IReadOnlyList<string> preview = PerUnitPreview.Lines(network, kind, id);
        if (preview.Count > 0)
        {
            lines.Add("Per-unit values:");
            lines.AddRange(preview.Select(p => "  " + p));
        }
        return string.Join("\n", lines);
    }
}
