// Which buses hang together through in-service branches, and which islands have a slack source.
using Study.Core.Units;

namespace Study.Core.LoadFlow;

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

    /// <summary>Marks every bus of an island without a slack bus as dead (de-energised).</summary>
    public static int MarkDead(BusType[] type, int[] label)
    {
        var live = new HashSet<int>();
        for (int i = 0; i < type.Length; i++) if (type[i] == BusType.Slack) live.Add(label[i]);
        int dead = 0;
        for (int i = 0; i < type.Length; i++)
        {
            if (live.Contains(label[i])) continue;
            type[i] = BusType.Dead;
            dead++;
        }
        return dead;
    }
}
