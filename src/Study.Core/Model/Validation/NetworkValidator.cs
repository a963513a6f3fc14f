// Entry point of validation: runs every rule file over a network and returns all findings at once.
namespace Study.Core.Model.Validation;

/// <summary>
/// Checks a network for reference, topology and physical-data problems. Never stops at the first:
/// the report holds every error and warning, each naming the element, the file key and the values.
/// </summary>
public static class NetworkValidator
{
    public static ValidationReport Validate(Network network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var context = new ValidationContext(network);
        NetworkRules.Check(context);
        IdRules.CheckAll(context);
        Each(context, ElementKind.Bus, network.Buses, BusRules.Check);
        Each(context, ElementKind.Supply, network.Supplies, SupplyRules.Check);
        Each(context, ElementKind.Generator, network.Generators, GeneratorRules.Check);
        Each(context, ElementKind.Load, network.Loads, LoadRules.CheckLoad);
        Each(context, ElementKind.Shunt, network.Shunts, LoadRules.CheckShunt);
        Each(context, ElementKind.Line, network.Lines, LineRules.Check);
        Each(context, ElementKind.Transformer, network.Transformers, TransformerRules.Check);
        Each(context, ElementKind.ThreeWindingTransformer, network.ThreeWindingTransformers, ThreeWindingRules.Check);
        Each(context, ElementKind.Motor, network.Motors, MotorRules.Check);
        Each(context, ElementKind.Breaker, network.Breakers, BreakerRules.Check);
        Each(context, ElementKind.Scenario, network.Scenarios, ScenarioRules.Check);
        SetPointRules.Check(context);
        TopologyRules.Check(context);
        PhaseDisplacementRules.Check(context);
        return new ValidationReport(context.Problems);
    }

    /// <summary>
    /// The problems of one element (as an edit form shows them inline), by the same rules as
    /// <see cref="Validate"/>: its id, references and values. Island problems concern the whole
    /// network and come only from <see cref="Validate"/>.
    /// </summary>
    public static IReadOnlyList<Problem> ValidateElement(Network network, ElementKind kind, string id)
    {
        ArgumentNullException.ThrowIfNull(network);
        var context = new ValidationContext(network);
        IdRules.CheckOne(context, kind, id);
        switch (kind)
        {
            case ElementKind.Bus: Matching(context, network.Buses, b => b.Id, id, BusRules.Check); break;
            case ElementKind.Supply: Matching(context, network.Supplies, s => s.Id, id, SupplyRules.Check); break;
            case ElementKind.Generator: Matching(context, network.Generators, g => g.Id, id, GeneratorRules.Check); break;
            case ElementKind.Load: Matching(context, network.Loads, l => l.Id, id, LoadRules.CheckLoad); break;
            case ElementKind.Shunt: Matching(context, network.Shunts, s => s.Id, id, LoadRules.CheckShunt); break;
            case ElementKind.Line: Matching(context, network.Lines, l => l.Id, id, LineRules.Check); break;
            case ElementKind.Transformer: Matching(context, network.Transformers, t => t.Id, id, TransformerRules.Check); break;
            case ElementKind.ThreeWindingTransformer:
                Matching(context, network.ThreeWindingTransformers, t => t.Id, id, ThreeWindingRules.Check);
                break;
            case ElementKind.Motor: Matching(context, network.Motors, m => m.Id, id, MotorRules.Check); break;
            case ElementKind.Breaker: Matching(context, network.Breakers, b => b.Id, id, BreakerRules.Check); break;
            case ElementKind.Scenario: Matching(context, network.Scenarios, s => s.Name, id, ScenarioRules.Check); break;
        }
        return context.Problems;
    }

    private static void Each<T>(ValidationContext context, ElementKind kind, IReadOnlyList<T>? list, Action<ValidationContext, T> check)
        where T : class
    {
        IReadOnlyList<T?> items = ValidationContext.Items(list);
        for (int i = 0; i < items.Count; i++)
        {
            if (items[i] is T item)
                check(context, item);
            else
                context.Add(Severity.Error, kind, null, null,
                    $"entry {Numbers.Show(i + 1)} of {IdRules.ArrayName(kind)} is null: remove it or give the element");
        }
    }

    private static void Matching<T>(ValidationContext context, IReadOnlyList<T>? list, Func<T, string?> idOf, string id,
        Action<ValidationContext, T> check) where T : class
    {
        foreach (T? item in ValidationContext.Items(list))
        {
            if (item is not null && idOf(item) == id) check(context, item);
        }
    }
}
