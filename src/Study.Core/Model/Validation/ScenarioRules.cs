// Scenario checks: the load and generation scales.
namespace Study.Core.Model.Validation;

internal static class ScenarioRules
{
    public static void Check(ValidationContext context, Scenario scenario)
    {
        ElementScope at = context.At(ElementKind.Scenario, scenario.Name);
        at.AllFinite(("loadScale", scenario.LoadScale), ("generationScale", scenario.GenerationScale));
        at.NotNegative("loadScale", scenario.LoadScale, "a load scale (1 = loads as entered)");
        at.NotNegative("generationScale", scenario.GenerationScale, "a generation scale (1 = set points as entered)");
    }
}
