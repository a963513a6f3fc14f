// Ids: every element has one, unique within its family (README, Network files).
namespace Study.Core.Model.Validation;

internal static class IdRules
{
    private readonly record struct Entry(ElementKind Kind, string? Id, int Position);

    public static void CheckAll(ValidationContext context)
    {
        Network n = context.Network;
        // Sized for every element at once, so a 10k-bus network is indexed without rehashing.
        int capacity = Count(n.Buses) + Count(n.Supplies) + Count(n.Generators) + Count(n.Loads) + Count(n.Shunts)
            + Count(n.Lines) + Count(n.Transformers) + Count(n.ThreeWindingTransformers) + Count(n.Motors) + Count(n.Breakers)
            + Count(n.Scenarios);
        var first = new Dictionary<(ElementFamily, string), Entry>(capacity);
        foreach (Entry entry in Entries(context.Network))
        {
            if (string.IsNullOrWhiteSpace(entry.Id))
            {
                ReportMissing(context, entry);
                continue;
            }
            ElementFamily family = ElementKinds.FamilyOf(entry.Kind);
            if (first.TryGetValue((family, entry.Id), out Entry earlier))
                ReportDuplicate(context, entry, earlier);
            else
                first.Add((family, entry.Id), entry);
        }
    }

    private static int Count<T>(IReadOnlyList<T>? list) => list?.Count ?? 0;

    /// <summary>The id rules for one element: its id is present and no other element of its family shares it.</summary>
    public static void CheckOne(ValidationContext context, ElementKind kind, string id)
    {
        ElementFamily family = ElementKinds.FamilyOf(kind);
        var same = Entries(context.Network)
            .Where(e => ElementKinds.FamilyOf(e.Kind) == family && e.Id == id)
            .ToList();
        int self = same.FindIndex(e => e.Kind == kind);
        if (self < 0) return;
        Entry element = same[self];
        if (string.IsNullOrWhiteSpace(id))
        {
            ReportMissing(context, element);
            return;
        }
        int other = same.FindIndex(e => e != element);
        if (other >= 0) ReportDuplicate(context, element, same[other]);
    }

    /// <summary>The network-file array an element kind is listed in.</summary>
    public static string ArrayName(ElementKind kind) => kind switch
    {
        ElementKind.Bus => "buses",
        ElementKind.Supply => "supplies",
        ElementKind.Generator => "generators",
        ElementKind.Load => "loads",
        ElementKind.Shunt => "shunts",
        ElementKind.Line => "lines",
        ElementKind.Transformer => "transformers",
        ElementKind.ThreeWindingTransformer => "threeWindingTransformers",
        ElementKind.Motor => "motors",
        ElementKind.Breaker => "breakers",
        _ => "scenarios",
    };

    private static string KeyOf(ElementKind kind) => kind == ElementKind.Scenario ? "name" : "id";

    private static string FamilyText(ElementFamily family) => family switch
    {
        ElementFamily.Bus => "buses",
        ElementFamily.Source => "supplies and generators",
        ElementFamily.Branch => "lines, transformers and three-winding transformers",
        ElementFamily.LoadOrShunt => "loads, shunts and motors",
        ElementFamily.Breaker => "breakers",
        _ => "scenarios",
    };

    private static void ReportMissing(ValidationContext context, Entry entry)
    {
        string key = KeyOf(entry.Kind);
        context.Add(Severity.Error, entry.Kind, null, key,
            $"entry {Numbers.Show(entry.Position)} of {ArrayName(entry.Kind)} has no {key}: give it one, " +
            $"unique among {FamilyText(ElementKinds.FamilyOf(entry.Kind))}");
    }

    private static void ReportDuplicate(ValidationContext context, Entry entry, Entry earlier)
    {
        string key = KeyOf(entry.Kind);
        context.Add(Severity.Error, entry.Kind, entry.Id, key,
            $"{key} '{entry.Id}' is already used by {ElementKinds.Label(earlier.Kind)} entry " +
            $"{Numbers.Show(earlier.Position)} of {ArrayName(earlier.Kind)}: {key}s must be unique among " +
            $"{FamilyText(ElementKinds.FamilyOf(entry.Kind))}");
    }

    private static IEnumerable<Entry> Entries(Network network)
    {
        foreach (Entry e in Of(ElementKind.Bus, network.Buses, b => b.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Supply, network.Supplies, s => s.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Generator, network.Generators, g => g.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Load, network.Loads, l => l.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Shunt, network.Shunts, s => s.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Line, network.Lines, l => l.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Transformer, network.Transformers, t => t.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.ThreeWindingTransformer, network.ThreeWindingTransformers, t => t.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Motor, network.Motors, m => m.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Breaker, network.Breakers, b => b.Id)) yield return e;
        foreach (Entry e in Of(ElementKind.Scenario, network.Scenarios, s => s.Name)) yield return e;
    }

    /// <summary>Entries with 1-based positions; null entries are reported by the validator, not here.</summary>
    private static IEnumerable<Entry> Of<T>(ElementKind kind, IReadOnlyList<T>? list, Func<T, string?> id) where T : class
    {
        IReadOnlyList<T?> items = ValidationContext.Items(list);
        for (int i = 0; i < items.Count; i++)
        {
            if (items[i] is T item) yield return new Entry(kind, id(item), i + 1);
        }
    }
}
