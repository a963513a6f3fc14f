// Which buses hang together through in-service branches (the load flow and every sequence network ask).
using Study.Core.Units;

namespace Study.Core.Admittance;

internal static class Islands
{
    /// <summary>Island number of each bus (union-find over branches, path halving).</summary>
    public static int[] Label(PerUnitModel model)
    {
        int n = model.Buses.Count;
        int[] label = new int[n];
        Label(model, null, new int[n], label);
        return label;
    }

    /// <summary>
    /// <see cref="Label(PerUnitModel)"/> into <paramref name="label"/>, with the branches marked in
    /// <paramref name="open"/> taken out; <paramref name="parent"/> is work space of one entry per bus.
    /// </summary>
    public static void Label(PerUnitModel model, bool[]? open, int[] parent, int[] label)
    {
        int n = model.Buses.Count;
        for (int i = 0; i < n; i++) parent[i] = i;
        int Find(int i)
        {
            while (parent[i] != i) i = parent[i] = parent[parent[i]];
            return i;
        }
        for (int k = 0; k < model.Branches.Count; k++)
        {
            if (open?[k] == true) continue;
            PuBranch b = model.Branches[k];
            int a = Find(b.From), c = Find(b.To);
            if (a != c) parent[a] = c;
        }
        for (int i = 0; i < n; i++) label[i] = Find(i);
    }

    /// <summary>
    /// For each branch, true when it is a bridge: taking it out alone splits its island (Tarjan's
    /// bridge-finding by depth-first search and low links, R. E. Tarjan, "A note on finding the
    /// bridges of a graph", Inf. Process. Lett. 2(6), 1974). Parallel branches are never bridges.
    /// Iterative, so a long radial feeder cannot overflow the stack.
    /// </summary>
    public static bool[] Bridges(PerUnitModel model)
    {
        int n = model.Buses.Count, b = model.Branches.Count;
        // Adjacency in compressed form: for each bus, the branches at it.
        var start = new int[n + 1];
        foreach (PuBranch br in model.Branches)
        {
            start[br.From + 1]++;
            start[br.To + 1]++;
        }
        for (int i = 0; i < n; i++) start[i + 1] += start[i];
        var edges = new int[2 * b];
        var fill = start[..n];
        for (int k = 0; k < b; k++)
        {
            edges[fill[model.Branches[k].From]++] = k;
            edges[fill[model.Branches[k].To]++] = k;
        }
        var bridge = new bool[b];
        var order = new int[n];
        var low = new int[n];
        var via = new int[n];      // the branch the search came in by, -1 for a root
        var next = new int[n];     // the next adjacency position to look at
        var stack = new int[n];
        Array.Fill(order, -1);
        int counter = 0;
        for (int root = 0; root < n; root++)
        {
            if (order[root] >= 0) continue;
            int top = 0;
            stack[top++] = root;
            order[root] = low[root] = counter++;
            via[root] = -1;
            next[root] = start[root];
            while (top > 0)
            {
                int u = stack[top - 1];
                if (next[u] < start[u + 1])
                {
                    int k = edges[next[u]++];
                    if (k == via[u]) continue;
                    PuBranch br = model.Branches[k];
                    int w = br.From == u ? br.To : br.From;
                    if (order[w] < 0)
                    {
                        order[w] = low[w] = counter++;
                        via[w] = k;
                        next[w] = start[w];
                        stack[top++] = w;
                    }
                    else
                    {
                        low[u] = Math.Min(low[u], order[w]);
                    }
                    continue;
                }
                top--;
                if (via[u] < 0) continue;
                PuBranch came = model.Branches[via[u]];
                int parent = came.From == u ? came.To : came.From;
                low[parent] = Math.Min(low[parent], low[u]);
                if (low[u] > order[parent]) bridge[via[u]] = true;
            }
        }
        return bridge;
    }
}
