// Union-find over bus indices, for finding islands in one pass over the branches.
namespace Study.Core.Model.Validation;

/// <summary>Disjoint sets with path halving and union by size (Cormen et al., Introduction to Algorithms, ch. 21).</summary>
internal sealed class DisjointSets
{
    private readonly int[] parent;
    private readonly int[] size;

    public DisjointSets(int count)
    {
        parent = new int[count];
        size = new int[count];
        for (int i = 0; i < count; i++)
        {
            parent[i] = i;
            size[i] = 1;
        }
    }

    public int Find(int i)
    {
        while (parent[i] != i)
        {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    public void Union(int a, int b)
    {
        int ra = Find(a), rb = Find(b);
        if (ra == rb) return;
        if (size[ra] < size[rb]) (ra, rb) = (rb, ra);
        parent[rb] = ra;
        size[ra] += size[rb];
    }
}
