// The nonzero pattern of a sparse triangular solve x = L \ b: every node reachable from the
// pattern of b in the graph of L, found by depth-first search and listed in topological order
// (Davis 2006, §3.2, cs_reach and cs_dfs; Gilbert and Peierls 1988).
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

/// <summary>
/// The graph a reach walks: node j has the out-edges index[start[c] .. end[c]-1] of column
/// c = columnOf[j], and none when c is negative; without columnOf, c = j.
/// </summary>
internal readonly ref struct ColumnGraph
{
    public readonly ReadOnlySpan<int> Start, End, Index, ColumnOf;

    public ColumnGraph(ReadOnlySpan<int> start, ReadOnlySpan<int> end, ReadOnlySpan<int> index, ReadOnlySpan<int> columnOf)
    {
        Start = start;
        End = end;
        Index = index;
        ColumnOf = columnOf;
    }

    /// <summary>The graph of a compressed-column matrix: column j's rows are the edges out of node j.</summary>
    public ColumnGraph(int[] colPtr, int[] rowIdx)
        : this(colPtr, colPtr.AsSpan(1), rowIdx, default)
    {
    }
}

/// <summary>Reach by depth-first search (cs_reach, cs_dfs).</summary>
internal static class Reach
{
    /// <summary>
    /// xi[top..n-1] = the nodes reachable in g from the sources, in topological order (a node before
    /// every node it has an edge to), where n = xi.Length; returns top. Each source s is node
    /// rename[s], or s itself when rename is empty (the rows of a column of A, say, in the factors'
    /// numbering). A node counts as visited when marks[node] == stamp, so a fresh stamp starts a
    /// fresh search. The front of xi serves as the search stack, pstack (n entries) as each
    /// level's resume position.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int Of(in ColumnGraph g, ReadOnlySpan<int> sources, ReadOnlySpan<int> rename,
        int[] xi, int[] pstack, int[] marks, int stamp)
    {
        int top = xi.Length;
        bool renamed = !rename.IsEmpty;
        foreach (int s in sources)
        {
            int j = renamed ? rename[s] : s;
            if (marks[j] != stamp) top = DepthFirst(j, top, g, xi, pstack, marks, stamp);
        }
        return top;
    }

    // Non-recursive DFS from node j (Davis 2006, §3.2, cs_dfs): the recursion stack grows from the
    // front of xi while finished nodes are pushed onto its back; the two never overlap.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int DepthFirst(int j, int top, in ColumnGraph g, int[] xi, int[] pstack, int[] marks, int stamp)
    {
        ReadOnlySpan<int> start = g.Start, end = g.End, index = g.Index, columnOf = g.ColumnOf;
        bool renamed = !columnOf.IsEmpty;
        int head = 0;
        xi[0] = j;
        while (head >= 0)
        {
            j = xi[head];
            int c = renamed ? columnOf[j] : j;
            if (marks[j] != stamp)
            {
                marks[j] = stamp;
                pstack[head] = c < 0 ? 0 : start[c];
            }
            bool done = true;
            int p2 = c < 0 ? 0 : end[c];
            for (int p = pstack[head]; p < p2; p++)
            {
                int i = index[p];
                if (marks[i] == stamp) continue;
                pstack[head] = p + 1;
                xi[++head] = i;
                done = false;
                break;
            }
            if (done)
            {
                head--;
                xi[--top] = j;
            }
        }
        return top;
    }
}
