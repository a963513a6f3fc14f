// What the engine will use for an element, in per unit: the derivation steps shown live in edit forms.
using System.Globalization;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Tui.Editing;

/// <summary>
/// Turns an element of a network into readable per-unit derivation lines. The one place the TUI asks
/// the Units layer for an explanation, so forms and the detail pane show the same steps. The engine's
/// steps name the data by file key, as <c>study explain</c> prints them; here each key reads as the
/// label of the form field that edits it ("Impedance % / 100", not "zPercent / 100").
/// </summary>
public static class PerUnitPreview
{
    public static IReadOnlyList<string> Lines(Network network, ElementKind kind, string id)
    {
        FieldWords words = FieldWords.ForFormulas(ElementFields.For(kind), ElementFields.For(ElementKind.Scenario));
        try
        {
            return Steps(network, kind, id).Select(s => Describe(s, words)).ToList();
        }
        catch (InputException e)
        {
            return [$"cannot convert: {words.Replace(e.Message)}"];
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException or KeyNotFoundException)
        {
            return [$"cannot convert: {words.Replace(e.Message)}"];
        }
    }

    /// <summary>"label = formula = value unit (note)", the label, formula and note in the form's words.</summary>
    public static string Describe(DerivationStep s, FieldWords words)
    {
        string value = s.Value.ToString("G6", CultureInfo.InvariantCulture);
        string note = s.Note is null ? "" : $"  ({words.Replace(s.Note)})";
        return $"{words.Replace(s.Label)} = {words.Replace(s.Formula)} = {value} {s.Unit}{note}";
    }

    private static IReadOnlyList<DerivationStep> Steps(Network n, ElementKind kind, string id) =>
        kind == ElementKind.Scenario ? [] : Explainer.Explain(n, id).Steps;
}
