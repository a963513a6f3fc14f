// Uniform access to the element lists of a Network by kind: read, find, add, replace, remove by id.
using Study.App.Reports;
using Study.Core.Model;
using Study.App.Tui.Shell;

namespace Study.App.Tui.Editing;

/// <summary>One element list of a network, without knowing its record type.</summary>
public interface IElementList
{
    ElementKind Kind { get; }
    IReadOnlyList<object> Items(Network network);
    string IdOf(object element);
    object WithId(object element, string id);
    Network With(Network network, IReadOnlyList<object> items);
}

/// <summary>The lists of a network, one per element kind.</summary>
public static class ElementLists
{
    private static readonly Dictionary<ElementKind, IElementList> ByKind = new IElementList[]
    {
        new ElementList<Bus>(ElementKind.Bus, n => n.Buses, (n, l) => n with { Buses = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Supply>(ElementKind.Supply, n => n.Supplies, (n, l) => n with { Supplies = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Generator>(ElementKind.Generator, n => n.Generators, (n, l) => n with { Generators = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Load>(ElementKind.Load, n => n.Loads, (n, l) => n with { Loads = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Shunt>(ElementKind.Shunt, n => n.Shunts, (n, l) => n with { Shunts = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Line>(ElementKind.Line, n => n.Lines, (n, l) => n with { Lines = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Transformer>(ElementKind.Transformer, n => n.Transformers, (n, l) => n with { Transformers = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<ThreeWindingTransformer>(ElementKind.ThreeWindingTransformer, n => n.ThreeWindingTransformers,
            (n, l) => n with { ThreeWindingTransformers = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Motor>(ElementKind.Motor, n => n.Motors, (n, l) => n with { Motors = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Breaker>(ElementKind.Breaker, n => n.Breakers, (n, l) => n with { Breakers = l }, e => e.Id, (e, id) => e with { Id = id }),
        new ElementList<Scenario>(ElementKind.Scenario, n => n.Scenarios, (n, l) => n with { Scenarios = l }, e => e.Name, (e, id) => e with { Name = id }),
    }.ToDictionary(l => l.Kind);

    /// <summary>Kinds in the order the element list shows them.</summary>
    public static IReadOnlyList<ElementKind> Kinds { get; } = Enum.GetValues<ElementKind>();

    public static IElementList Of(ElementKind kind) => ByKind[kind];

    public static int Count(Network network, ElementKind kind) => Of(kind).Items(network).Count;

    public static IReadOnlyList<string> Ids(Network network, ElementKind kind)
    {
        IElementList list = Of(kind);
        return list.Items(network).Select(list.IdOf).ToList();
    }

    public static object? Find(Network network, ElementKind kind, string id)
    {
        IElementList list = Of(kind);
        return list.Items(network).FirstOrDefault(e => list.IdOf(e) == id);
    }

    /// <summary>True when no element of the same family (ids are unique per family: README, Network files) uses the id.</summary>
    public static bool IsIdFree(Network network, ElementKind kind, string id, string? except = null)
    {
        if (id == except) return true;
        ElementFamily family = ElementKinds.FamilyOf(kind);
        return Kinds.Where(k => ElementKinds.FamilyOf(k) == family).All(k => !Ids(network, k).Contains(id));
    }

    public static Network Add(Network network, ElementKind kind, object element)
    {
        IElementList list = Of(kind);
        return list.With(network, [.. list.Items(network), element]);
    }

    /// <summary>Puts <paramref name="element"/> in the place of the element with <paramref name="id"/>.</summary>
    public static Network Replace(Network network, ElementKind kind, string id, object element)
    {
        IElementList list = Of(kind);
        return list.With(network, list.Items(network).Select(e => list.IdOf(e) == id ? element : e).ToList());
    }

    public static Network Remove(Network network, ElementKind kind, string id)
    {
        IElementList list = Of(kind);
        return list.With(network, list.Items(network).Where(e => list.IdOf(e) != id).ToList());
    }

    /// <summary>The first of id-2, id-3, ... free in the kind's family.</summary>
    public static string NextFreeId(Network network, ElementKind kind, string stem)
    {
        for (int n = 2; ; n++)
        {
            string candidate = $"{stem}-{n}";
            if (IsIdFree(network, kind, candidate)) return candidate;
        }
    }

    /// <summary>The first of prefix1, prefix2, ... free in the kind's family.</summary>
    public static string NumberedId(Network network, ElementKind kind, string prefix)
    {
        for (int n = 1; ; n++)
        {
            string candidate = $"{prefix}{n}";
            if (IsIdFree(network, kind, candidate)) return candidate;
        }
    }

    private sealed class ElementList<T>(
        ElementKind kind,
        Func<Network, IReadOnlyList<T>> get,
        Func<Network, IReadOnlyList<T>, Network> set,
        Func<T, string> id,
        Func<T, string, T> withId) : IElementList where T : class
    {
        public ElementKind Kind => kind;
        public IReadOnlyList<object> Items(Network network) => get(network);
        public string IdOf(object element) => id((T)element);
        public object WithId(object element, string newId) => withId((T)element, newId);
        public Network With(Network network, IReadOnlyList<object> items) => set(network, items.Cast<T>().ToList());
    }
}

/// <summary>Builds the text table of a kind from its field list (the same list the edit form uses).</summary>
public static class ElementTable
{
    public static TextTableSource Build(Network network, ElementKind kind)
    {
        IReadOnlyList<ElementField> fields = ElementFields.For(kind);
        var rows = ElementLists.Of(kind).Items(network).Select(e => fields.Select(f => f.Read(e)).ToArray()).ToList();
        return new TextTableSource(fields.Select(f => f.Header).ToArray(), rows);
    }
}
