// Islands: every connected part of the in-service network needs a source, and one slack for its angle.
namespace Study.Core.Model.Validation;

internal static class TopologyRules
{
    /// <summary>How many bus ids an island message lists before "and N more".</summary>
    private const int ListedBuses = 6;

    public static void Check(ValidationContext context)
    {
        Network network = context.Network;
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        var buses = new List<Bus>();
        foreach (Bus? bus in ValidationContext.Items(network.Buses))
        {
            if (bus is { InService: true } && !string.IsNullOrEmpty(bus.Id) && index.TryAdd(bus.Id, buses.Count)) buses.Add(bus);
        }
        if (buses.Count == 0) return;

        var islands = new DisjointSets(buses.Count);
        foreach (Line? line in ValidationContext.Items(network.Lines))
        {
            if (line is { InService: true }) Join(islands, index, line.From, line.To);
        }
        foreach (Transformer? t in ValidationContext.Items(network.Transformers))
        {
            if (t is { InService: true }) Join(islands, index, t.Hv, t.Lv);
        }
        foreach (ThreeWindingTransformer? t in ValidationContext.Items(network.ThreeWindingTransformers))
        {
            if (t is { InService: true }) Join(islands, index, t.Hv, t.Mv, t.Lv);
        }

        var sources = new List<string>?[buses.Count];
        var hasSlack = new bool[buses.Count];
        foreach (Supply? s in ValidationContext.Items(network.Supplies))
        {
            // A supply point is a slack source (README, Network files).
            if (s is { InService: true }) AddSource(islands, index, sources, hasSlack, s.Bus, s.Id, slack: true);
        }
        foreach (Generator? g in ValidationContext.Items(network.Generators))
        {
            if (g is { InService: true })
                AddSource(islands, index, sources, hasSlack, g.Bus, g.Id, slack: g.Mode == GeneratorMode.Slack);
        }

        var members = new Dictionary<int, List<Bus>>();
        for (int i = 0; i < buses.Count; i++)
        {
            int root = islands.Find(i);
            if (!members.TryGetValue(root, out List<Bus>? list)) members.Add(root, list = []);
            list.Add(buses[i]);
        }
        foreach ((int root, List<Bus> island) in members)
        {
            if (sources[root] is not List<string> found)
                context.Add(Severity.Error, ElementKind.Bus, island[0].Id, null,
                    $"no source in the island containing {BusList(island)}: connect it to a supplied bus, " +
                    "add a supply or generator, or take its buses out of service");
            else if (!hasSlack[root])
                context.Add(Severity.Error, ElementKind.Bus, island[0].Id, null,
                    $"no slack source in the island containing {BusList(island)}, which is fed only by " +
                    $"{string.Join(", ", found)}: the load flow needs one angle reference per island; " +
                    "add a supply or set one generator's mode to slack");
        }
    }

    private static void Join(DisjointSets islands, Dictionary<string, int> index, params ReadOnlySpan<string?> ends)
    {
        int first = -1;
        foreach (string? end in ends)
        {
            // A branch to a missing or out-of-service bus carries nothing; the reference rules report the missing ones.
            if (end is null || !index.TryGetValue(end, out int bus)) return;
            if (first < 0) first = bus;
            else islands.Union(first, bus);
        }
    }

    private static void AddSource(DisjointSets islands, Dictionary<string, int> index, List<string>?[] sources,
        bool[] hasSlack, string? bus, string? id, bool slack)
    {
        if (bus is null || !index.TryGetValue(bus, out int i)) return;
        int root = islands.Find(i);
        (sources[root] ??= []).Add(id ?? "(no id)");
        hasSlack[root] |= slack;
    }

    private static string BusList(List<Bus> island)
    {
        string count = island.Count == 1 ? "1 bus" : $"{Numbers.Show(island.Count)} buses";
        string listed = string.Join(", ", island.Take(ListedBuses).Select(b => b.Id));
        string more = island.Count > ListedBuses ? $" and {Numbers.Show(island.Count - ListedBuses)} more" : "";
        return $"{(island.Count == 1 ? "bus" : "buses")} {listed}{more} ({count})";
    }
}
