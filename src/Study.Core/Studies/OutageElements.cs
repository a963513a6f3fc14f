// Which elements an outage screening takes out, and the network with one of them out of service.
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>A line or transformer that can be taken out: its id, its branch kind and the buses it joins.</summary>
public sealed record OutageElement(string Id, BranchKind Kind, IReadOnlyList<string> Terminals);

/// <summary>The lines and transformers an N-1 screening takes out, picked from a network in a fixed order.</summary>
public static class OutageElements
{
    /// <summary>Every in-service line, transformer and three-winding transformer, in file order.</summary>
    public static IReadOnlyList<OutageElement> InService(Network network) =>
        network.Lines.Where(l => l.InService).Select(l => new OutageElement(l.Id, BranchKind.Line, [l.From, l.To]))
            .Concat(network.Transformers.Where(t => t.InService).Select(t => new OutageElement(t.Id, BranchKind.Transformer, [t.Hv, t.Lv])))
            .Concat(network.ThreeWindingTransformers.Where(t => t.InService).Select(t => new OutageElement(t.Id, BranchKind.ThreeWindingTransformer, [t.Hv, t.Mv, t.Lv])))
            .ToList();

    /// <summary>The named elements, checked: each must be an in-service line or transformer, named once.</summary>
    public static IReadOnlyList<OutageElement> Pick(Network network, IReadOnlyList<string> ids)
    {
        if (ids.Count == 0) return InService(network);
        var candidates = InService(network);
        var picked = new List<OutageElement>();
        foreach (string id in ids)
        {
            if (picked.Any(p => p.Id == id)) throw new InputException($"element {id} is named twice", elementId: id);
            OutageElement? e = candidates.FirstOrDefault(c => c.Id == id);
            if (e is not null)
            {
                picked.Add(e);
                continue;
            }
            bool known = network.Lines.Any(l => l.Id == id) || network.Transformers.Any(t => t.Id == id)
                || network.ThreeWindingTransformers.Any(t => t.Id == id);
            throw new InputException(known
                ? $"element {id} is already out of service: there is nothing to take out"
                : $"no line or transformer with id {id} (in service: {string.Join(", ", candidates.Select(c => c.Id))})", elementId: id);
        }
        return picked;
    }
}
