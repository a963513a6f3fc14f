// What the engine will use for an element, in per unit: the derivation steps shown live in edit forms.
using System.Globalization;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Tui.Editing;

/// <summary>
/// Turns an element of a network into readable per-unit derivation lines. The one place the TUI asks
/// the Units layer for an explanation, so forms and the detail pane show the same steps.
/// </summary>
public static class PerUnitPreview
{
    public static IReadOnlyList<string> Lines(Network network, ElementKind kind, string id)
    {
        try
        {
            return Steps(network, kind, id).Select(Describe).ToList();
        }
        catch (InputException e)
        {
            return [$"cannot convert: {e.Message}"];
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException or KeyNotFoundException)
        {
            return [$"cannot convert: {e.Message}"];
        }
    }

    public static string Describe(DerivationStep s)
    {
        string value = s.Value.ToString("G6", CultureInfo.InvariantCulture);
        string note = s.Note is null ? "" : $"  ({s.Note})";
        return $"{s.Label} = {s.Formula} = {value} {s.Unit}{note}";
    }

    private static IReadOnlyList<DerivationStep> Steps(Network n, ElementKind kind, string id) =>
        kind == ElementKind.Scenario ? [] : Explainer.Explain(n, id).Steps;
}
