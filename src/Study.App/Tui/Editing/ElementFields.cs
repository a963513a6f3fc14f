// The field list of each element kind, and a sensible new element of each kind for Add.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>One field list per kind drives both the kind's table columns and its edit form.</summary>
public static class ElementFields
{
    public static IReadOnlyList<ElementField> For(ElementKind kind) => kind switch
    {
        ElementKind.Bus => NodeFields.Bus,
        ElementKind.Supply => SourceFields.Supply,
        ElementKind.Generator => SourceFields.Generator,
        ElementKind.Load => NodeFields.Load,
        ElementKind.Shunt => NodeFields.Shunt,
        ElementKind.Line => BranchFields.Line,
        ElementKind.Transformer => BranchFields.Transformer,
        ElementKind.ThreeWindingTransformer => BranchFields.ThreeWinding,
        ElementKind.Motor => NodeFields.Motor,
        ElementKind.Breaker => NodeFields.Breaker,
        _ => NodeFields.Scenario,
    };

    /// <summary>Plural heading for the element list ("Buses", "Three-winding").</summary>
    public static string Plural(ElementKind kind) => kind switch
    {
        ElementKind.Bus => "Buses",
        ElementKind.Supply => "Supplies",
        ElementKind.ThreeWindingTransformer => "3-winding",
        _ => kind + "s",
    };

    /// <summary>What the form's fields make, tidied once every field is written: a line's blank sequences and a blank no-load are "not given".</summary>
    public static object Finish(ElementKind kind, object element) => element switch
    {
        Line line => BranchFields.Normalise(line),
        Transformer t => t with { NoLoad = WindingFields.Normalise(t.NoLoad) },
        ThreeWindingTransformer t => t with { NoLoad = WindingFields.Normalise(t.NoLoad) },
        _ => element,
    };

    /// <summary>A new element with a free id, connected to the first bus(es), other values at their defaults.</summary>
    public static object New(Network n, ElementKind kind)
    {
        string Bus(int i) => n.Buses.Count == 0 ? "" : n.Buses[Math.Min(i, n.Buses.Count - 1)].Id;
        string Id(string prefix) => ElementLists.NumberedId(n, kind, prefix);
        return kind switch
        {
            ElementKind.Bus => new Bus { Id = Id("B"), Kv = n.Buses.Count > 0 ? n.Buses[^1].Kv : 11 },
            ElementKind.Supply => new Supply { Id = Id("SUPPLY"), Bus = Bus(0) },
            ElementKind.Generator => new Generator { Id = Id("G"), Bus = Bus(0) },
            ElementKind.Load => new Load { Id = Id("L"), Bus = Bus(0) },
            ElementKind.Shunt => new Shunt { Id = Id("C"), Bus = Bus(0) },
            ElementKind.Line => new Line { Id = Id("F"), From = Bus(0), To = Bus(1), Km = 1 },
            ElementKind.Transformer => new Transformer { Id = Id("T"), Hv = Bus(0), Lv = Bus(1) },
            ElementKind.ThreeWindingTransformer => new ThreeWindingTransformer { Id = Id("T"), Hv = Bus(0), Mv = Bus(1), Lv = Bus(2) },
            ElementKind.Motor => new Motor { Id = Id("M"), Bus = Bus(0) },
            ElementKind.Breaker => new Breaker { Id = Id("CB"), Bus = Bus(0) },
            _ => new Scenario { Name = Id("scenario-") },
        };
    }
}
