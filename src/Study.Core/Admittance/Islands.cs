// Which buses hang together through in-service branches (the load flow and every sequence network ask).
using Study.Core.Units;

namespace Study.Core.Admittance;

internal static class Islands
{
    /// <summary>Island number of each bus (union-find over branches, path halving).</summary>
    public static int[] Label(PerUnitModel model)
    {
        int n = model.Buses.Count;
        int[] parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;
        int Find(int i)
        {
            while (parent[i] != i) i = parent[i] = parent[parent[i]];
            return i;
        }
        foreach (PuBranch b in model.Branches)
        {
            int a = Find(b.From), c = Find(b.To);
            if (a != c) parent[a] = c;
        }
        int[] label = new int[n];
        for (int i = 0; i < n; i++) label[i] = Find(i);
        return label;
    }
}
