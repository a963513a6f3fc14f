// Phase displacement: a given phaseShiftDeg that contradicts the vector group, and loops closed through
// banks whose displacements differ (two paths that would put one bus at two angles).
namespace Study.Core.Model.Validation;

/// <summary>
/// A bank's displacement is its vector group's clock number × 30° unless phaseShiftDeg is given
/// (DEVELOPERS.md, Per-unit rules). Around any closed loop of lines and banks the clock numbers must add
/// up to a whole turn: otherwise the two paths hold the same bus at two angles and a circulating current
/// flows that the ratings never see (parallel operation needs equal displacement, IEC 60076-8, from
/// memory). Banks with a given phaseShiftDeg are phase shifters by intent and are left out of the loop test.
/// </summary>
internal static class PhaseDisplacementRules
{
    /// <summary>One branch of the displacement graph: lag of <see cref="To"/> behind <see cref="From"/> in clock hours.</summary>
    private sealed record Edge(int From, int To, int Clock, ElementKind Kind, string Id, string? Group);

    /// <summary>How many loops are reported; one bank in a large mesh closes many.</summary>
    private const int Reported = 5;

    public static void Check(ValidationContext context)
    {
        Network network = context.Network;
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (Bus? bus in ValidationContext.Items(network.Buses))
            if (bus is { InService: true } && !string.IsNullOrEmpty(bus.Id)) index.TryAdd(bus.Id, index.Count);

        var edges = new List<Edge>();
        void Add(string? from, string? to, int clock, ElementKind kind, string? id, string? group)
        {
            if (from is null || to is null || id is null || from == to) return;
            if (index.TryGetValue(from, out int a) && index.TryGetValue(to, out int b)) edges.Add(new Edge(a, b, clock, kind, id, group));
        }
        foreach (Line? l in ValidationContext.Items(network.Lines))
            if (l is { InService: true }) Add(l.From, l.To, 0, ElementKind.Line, l.Id, null);
        foreach (Transformer? t in ValidationContext.Items(network.Transformers))
        {
            if (t is not { InService: true }) continue;
            VectorGroup? group = Parsed(t.VectorGroup, threeWinding: false);
            if (t.PhaseShiftDeg is double given)
            {
                GivenShift(context, t, given, group);
                continue;
            }
            if (t.VectorGroup is not null && group is null) continue;
            Add(t.Hv, t.Lv, group?.LvClock ?? 0, ElementKind.Transformer, t.Id, t.VectorGroup);
        }
        foreach (ThreeWindingTransformer? t in ValidationContext.Items(network.ThreeWindingTransformers))
        {
            if (t is not { InService: true }) continue;
            VectorGroup? group = Parsed(t.VectorGroup, threeWinding: true);
            if (t.VectorGroup is not null && group is null) continue;
            Add(t.Hv, t.Mv, group?.MvClock ?? 0, ElementKind.ThreeWindingTransformer, t.Id, t.VectorGroup);
            Add(t.Hv, t.Lv, group?.LvClock ?? 0, ElementKind.ThreeWindingTransformer, t.Id, t.VectorGroup);
        }
        Loops(context, index, edges);
    }

    /// <summary>A given phaseShiftDeg replaces the vector group's displacement; say so when the two differ.</summary>
    private static void GivenShift(ValidationContext context, Transformer t, double given, VectorGroup? group)
    {
        if (group is null || !double.IsFinite(given)) return;
        double fromGroup = group.LvLagDeg;
        double apart = Math.Abs(Math.IEEERemainder(given - fromGroup, 360));
        if (apart < 1e-6) return;
        context.At(ElementKind.Transformer, t.Id).Warning("phaseShiftDeg",
            $"phaseShiftDeg {Numbers.Show(given)}° is given, so the load flow does not use the displacement of vector group " +
            $"{t.VectorGroup} ({Numbers.Show(fromGroup)}°: the lv side lags the hv side by clock × 30°); leave phaseShiftDeg out " +
            "to take it from the vector group");
    }

    /// <summary>
    /// A breadth-first spanning forest gives every bus its lag from the root in clock hours; a branch
    /// that closes a loop must agree with it (mod 12). Each disagreement names the banks on the loop.
    /// </summary>
    private static void Loops(ValidationContext context, Dictionary<string, int> index, List<Edge> edges)
    {
        int n = index.Count;
        var incident = new List<int>?[n];
        for (int e = 0; e < edges.Count; e++)
        {
            (incident[edges[e].From] ??= []).Add(e);
            (incident[edges[e].To] ??= []).Add(e);
        }
        var lag = new int[n];
        var parentEdge = new int[n];
        var depth = new int[n];
        var seen = new bool[n];
        var treeEdge = new bool[edges.Count];
        var reported = new HashSet<string>(StringComparer.Ordinal);
        var queue = new Queue<int>();
        for (int root = 0; root < n; root++)
        {
            if (seen[root]) continue;
            seen[root] = true;
            parentEdge[root] = -1;
            queue.Enqueue(root);
            while (queue.Count > 0)
            {
                int u = queue.Dequeue();
                foreach (int e in incident[u] ?? [])
                {
                    Edge edge = edges[e];
                    int v = edge.From == u ? edge.To : edge.From;
                    int step = edge.From == u ? edge.Clock : -edge.Clock;
                    if (seen[v]) continue;
                    seen[v] = true;
                    treeEdge[e] = true;
                    parentEdge[v] = e;
                    depth[v] = depth[u] + 1;
                    lag[v] = Mod12(lag[u] + step);
                    queue.Enqueue(v);
                }
            }
        }
        for (int e = 0; e < edges.Count && reported.Count < Reported; e++)
        {
            if (treeEdge[e]) continue;
            Edge edge = edges[e];
            int mismatch = Mod12(lag[edge.From] + edge.Clock - lag[edge.To]);
            if (mismatch == 0) continue;
            List<Edge> loop = Path(edges, parentEdge, depth, edge.From, edge.To);
            loop.Add(edge);
            Report(context, reported, edge, loop, mismatch);
        }
    }

    /// <summary>The tree branches between two buses (up from each to their common ancestor).</summary>
    private static List<Edge> Path(List<Edge> edges, int[] parentEdge, int[] depth, int a, int b)
    {
        var path = new List<Edge>();
        while (a != b)
        {
            ref int deeper = ref depth[a] >= depth[b] ? ref a : ref b;
            Edge up = edges[parentEdge[deeper]];
            path.Add(up);
            deeper = up.From == deeper ? up.To : up.From;
        }
        return path;
    }

    private static void Report(ValidationContext context, HashSet<string> reported, Edge closing, List<Edge> loop, int mismatch)
    {
        var banks = loop.Where(e => e.Kind != ElementKind.Line).DistinctBy(e => e.Id).ToList();
        string key = string.Join("\n", banks.Select(b => b.Id).Order(StringComparer.Ordinal));
        if (!reported.Add(key)) return;
        int degrees = (int)VectorGroup.LagDeg(mismatch);
        string named = string.Join(" and ", banks.Take(4).Select(b => $"{b.Id} ({b.Group ?? "no vector group, 0°"})"));
        if (banks.Count > 4) named += $" and {banks.Count - 4} more";
        ElementScope at = context.At(closing.Kind, closing.Id);
        at.Error(closing.Kind == ElementKind.Line ? "to" : "vectorGroup",
            $"parallel paths through transformers {named} differ in phase displacement by {Numbers.Show(Math.Abs(degrees))}°: " +
            "closing this loop would drive a circulating current limited only by the banks' impedance; banks in parallel need " +
            "the same clock number (or give phaseShiftDeg where a phase shift is meant)");
    }

    private static int Mod12(int value) => ((value % 12) + 12) % 12;

    private static VectorGroup? Parsed(string? text, bool threeWinding)
    {
        if (text is null) return null;
        try { return VectorGroup.Parse(text, "", threeWinding); }
        catch (InputException) { return null; }
    }
}
