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
        var slacks = new List<Slack>?[buses.Count];
        foreach (Supply? s in ValidationContext.Items(network.Supplies))
        {
            // A supply point is a slack source (README, Network files).
            if (s is not { InService: true }) continue;
            AddSource(islands, index, sources, hasSlack, s.Bus, s.Id, slack: true);
            AddSlack(islands, index, slacks, new Slack(ElementKind.Supply, s.Id, s.Bus, s.AngleDeg));
        }
        foreach (Generator? g in ValidationContext.Items(network.Generators))
        {
            if (g is not { InService: true }) continue;
            AddSource(islands, index, sources, hasSlack, g.Bus, g.Id, slack: g.Mode == GeneratorMode.Slack);
            if (g.Mode == GeneratorMode.Slack) AddSlack(islands, index, slacks, new Slack(ElementKind.Generator, g.Id, g.Bus, g.AngleDeg ?? 0));
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
            else if (slacks[root] is { } held && held.Select(h => h.Bus).Distinct().Count() > 1)
                SeveralSlackBuses(context, held);
        }
    }

    private sealed record Slack(ElementKind Kind, string? Id, string? Bus, double AngleDeg);

    private static void AddSlack(DisjointSets islands, Dictionary<string, int> index, List<Slack>?[] slacks, Slack slack)
    {
        if (slack.Bus is null || !index.TryGetValue(slack.Bus, out int i)) return;
        (slacks[islands.Find(i)] ??= []).Add(slack);
    }

    /// <summary>
    /// Two slack buses in one island both hold their voltage and angle, so the power exchanged between
    /// them is fixed by those set points, not by the network's needs (and not shared as one infeed
    /// would be). Solvable, hence a warning; it names the reference and the other slack.
    /// </summary>
    private static void SeveralSlackBuses(ValidationContext context, List<Slack> held)
    {
        Slack reference = held[0];
        Slack other = held.First(h => h.Bus != reference.Bus);
        int buses = held.Select(h => h.Bus).Distinct().Count();
        string angles = Math.Abs(other.AngleDeg - reference.AngleDeg) > 1e-9
            ? $"; their angles differ by {Numbers.Show(Math.Abs(other.AngleDeg - reference.AngleDeg))}°"
            : "";
        context.At(other.Kind, other.Id).Warning(other.Kind == ElementKind.Supply ? "bus" : "mode",
            $"{Numbers.Show(buses)} slack buses in one island: {ElementKinds.Label(reference.Kind)} {reference.Id} at bus {reference.Bus} " +
            $"and {ElementKinds.Label(other.Kind)} {other.Id} at bus {other.Bus}{angles}. Each holds its voltage and angle, so the power " +
            $"between them is set by those set points rather than by the network; {reference.Id} is the angle reference. " +
            "If one infeed is meant, keep one slack and make the other a pv generator");
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
