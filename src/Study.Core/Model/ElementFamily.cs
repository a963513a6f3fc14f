// The families within which element ids must be unique (README, Network files).
namespace Study.Core.Model;

/// <summary>Id namespaces: ids are unique within a family (motors share the family of loads and shunts).</summary>
public enum ElementFamily
{
    Bus,
    Source,
    Branch,
    LoadOrShunt,
    Breaker,
    Scenario,
}

/// <summary>The kind of an element, as users see it in lists and messages.</summary>
public enum ElementKind
{
    Bus,
    Supply,
    Generator,
    Load,
    Shunt,
    Line,
    Transformer,
    ThreeWindingTransformer,
    Motor,
    Breaker,
    Scenario,
}

public static class ElementKinds
{
    public static ElementFamily FamilyOf(ElementKind kind) => kind switch
    {
        ElementKind.Bus => ElementFamily.Bus,
        ElementKind.Supply or ElementKind.Generator => ElementFamily.Source,
        ElementKind.Line or ElementKind.Transformer or ElementKind.ThreeWindingTransformer => ElementFamily.Branch,
        ElementKind.Load or ElementKind.Shunt or ElementKind.Motor => ElementFamily.LoadOrShunt,
        ElementKind.Breaker => ElementFamily.Breaker,
        _ => ElementFamily.Scenario,
    };

    /// <summary>Lower-case name used in messages and JSON ("line", "transformer", ...).</summary>
    public static string Label(ElementKind kind) => kind switch
    {
        ElementKind.ThreeWindingTransformer => "three-winding transformer",
        _ => kind.ToString().ToLowerInvariant(),
    };
}
