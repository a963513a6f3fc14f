// Which elements name a bus, and what deleting or renaming the bus does to them.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>An element that names a bus, and in which role ("from", "hv", "regulated bus" ...).</summary>
public sealed record ElementReference(ElementKind Kind, string Id, string Role)
{
    public override string ToString() => $"{ElementKinds.Label(Kind)} {Id} ({Role})";
}

/// <summary>Finds, removes and renames references to a bus.</summary>
public static class BusReferences
{
    public static IReadOnlyList<ElementReference> To(Network n, string bus)
    {
        var refs = new List<ElementReference>();
        void Check(ElementKind kind, string id, string role, string? named)
        {
            if (named == bus) refs.Add(new ElementReference(kind, id, role));
        }
        foreach (Supply e in n.Supplies) Check(ElementKind.Supply, e.Id, "bus", e.Bus);
        foreach (Generator e in n.Generators) Check(ElementKind.Generator, e.Id, "bus", e.Bus);
        foreach (Load e in n.Loads) Check(ElementKind.Load, e.Id, "bus", e.Bus);
        foreach (Shunt e in n.Shunts) Check(ElementKind.Shunt, e.Id, "bus", e.Bus);
        foreach (Line e in n.Lines)
        {
            Check(ElementKind.Line, e.Id, "from", e.From);
            Check(ElementKind.Line, e.Id, "to", e.To);
        }
        foreach (Transformer e in n.Transformers)
        {
            Check(ElementKind.Transformer, e.Id, "hv", e.Hv);
            Check(ElementKind.Transformer, e.Id, "lv", e.Lv);
            Check(ElementKind.Transformer, e.Id, "regulated bus", e.Tap?.Regulate?.Bus);
        }
        foreach (ThreeWindingTransformer e in n.ThreeWindingTransformers)
        {
            Check(ElementKind.ThreeWindingTransformer, e.Id, "hv", e.Hv);
            Check(ElementKind.ThreeWindingTransformer, e.Id, "mv", e.Mv);
            Check(ElementKind.ThreeWindingTransformer, e.Id, "lv", e.Lv);
            Check(ElementKind.ThreeWindingTransformer, e.Id, "regulated bus", e.Tap?.Regulate?.Bus);
        }
        foreach (Motor e in n.Motors) Check(ElementKind.Motor, e.Id, "bus", e.Bus);
        foreach (Breaker e in n.Breakers) Check(ElementKind.Breaker, e.Id, "bus", e.Bus);
        return refs;
    }

    /// <summary>
    /// Removes the bus and every element connected to it. A transformer that only regulates the bus
    /// (connected elsewhere) stays, as a fixed tap: losing its control is the smaller surprise.
    /// </summary>
    public static Network DeleteWithConnected(Network n, string bus)
    {
        IReadOnlyList<ElementReference> refs = To(n, bus);
        foreach (ElementReference r in refs.Where(r => r.Role != "regulated bus").DistinctBy(r => (r.Kind, r.Id)))
            n = ElementLists.Remove(n, r.Kind, r.Id);
        n = n with
        {
            Transformers = n.Transformers.Select(t => t.Tap?.Regulate?.Bus == bus ? t with { Tap = t.Tap with { Regulate = null } } : t).ToList(),
            ThreeWindingTransformers = n.ThreeWindingTransformers
                .Select(t => t.Tap?.Regulate?.Bus == bus ? t with { Tap = t.Tap with { Regulate = null } } : t).ToList(),
        };
        return ElementLists.Remove(n, ElementKind.Bus, bus);
    }

    /// <summary>Renames every reference to <paramref name="from"/> (the bus record itself is not touched).</summary>
    public static Network Rename(Network n, string from, string to)
    {
        string R(string b) => b == from ? to : b;
        TapChanger? Tap(TapChanger? t) =>
            t?.Regulate is { } reg && reg.Bus == from ? t with { Regulate = reg with { Bus = to } } : t;
        return n with
        {
            Supplies = n.Supplies.Select(e => e with { Bus = R(e.Bus) }).ToList(),
            Generators = n.Generators.Select(e => e with { Bus = R(e.Bus) }).ToList(),
            Loads = n.Loads.Select(e => e with { Bus = R(e.Bus) }).ToList(),
            Shunts = n.Shunts.Select(e => e with { Bus = R(e.Bus) }).ToList(),
            Lines = n.Lines.Select(e => e with { From = R(e.From), To = R(e.To) }).ToList(),
            Transformers = n.Transformers.Select(e => e with { Hv = R(e.Hv), Lv = R(e.Lv), Tap = Tap(e.Tap) }).ToList(),
            ThreeWindingTransformers = n.ThreeWindingTransformers
                .Select(e => e with { Hv = R(e.Hv), Mv = R(e.Mv), Lv = R(e.Lv), Tap = Tap(e.Tap) }).ToList(),
            Motors = n.Motors.Select(e => e with { Bus = R(e.Bus) }).ToList(),
            Breakers = n.Breakers.Select(e => e with { Bus = R(e.Bus) }).ToList(),
        };
    }
}
