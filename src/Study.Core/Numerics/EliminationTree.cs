// Elimination tree of a symmetric pattern, its postorder, and the row patterns of the Cholesky
// factor it gives: the skeleton that symbolic analysis counts fill on and the diagonal-pivot
// factorisation takes its pattern from (Davis 2006, §4.1 cs_etree, §4.2 cs_ereach, §4.3 cs_post
// and cs_tdfs).
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

/// <summary>Elimination tree routines on a symmetric pattern.</summary>
internal static class EliminationTree
{
    /// <summary>parent[k] of each node of the elimination tree of C, -1 for a root (Davis 2006, §4.1).</summary>
    public static int[] Parents(SymmetricPattern c)
    {
        int n = c.N;
        int[] cp = c.ColPtr, ci = c.RowIdx;
        var parent = new int[n];
        var ancestor = new int[n];
        for (int k = 0; k < n; k++)
        {
            parent[k] = -1;
            ancestor[k] = -1;
            for (int p = cp[k]; p < cp[k + 1]; p++)
            {
                // Walk from i up to k along the path-compressed ancestors (upper triangle only: i < k).
                int i = ci[p];
                while (i != -1 && i < k)
                {
                    int inext = ancestor[i];
                    ancestor[i] = k;
                    if (inext == -1) parent[i] = k;
                    i = inext;
                }
            }
        }
        return parent;
    }

    /// <summary>
    /// Pattern of row k of the Cholesky factor L, without the diagonal: the nodes on the tree paths
    /// from each source i &lt; k up to k, written to s[top..n-1] in topological order, n = s.Length
    /// (Davis 2006, §4.2, cs_ereach). The sources are the rows of column k (larger ones are
    /// skipped), each renamed to rename[source] unless rename is empty. Returns top, or -1 when a
    /// path ends at a root before reaching k: then parent is not the elimination tree of a pattern
    /// holding those entries. marks[v] == stamp marks visited nodes, so each row needs a fresh stamp.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int Reach(int k, ReadOnlySpan<int> sources, ReadOnlySpan<int> rename, int[] parent, int[] s, int[] marks, int stamp)
    {
        int top = s.Length;
        bool renamed = !rename.IsEmpty;
        marks[k] = stamp;
        foreach (int source in sources)
        {
            int i = renamed ? rename[source] : source;
            if (i > k) continue;
            int len = 0;
            while (marks[i] != stamp)
            {
                s[len++] = i;
                marks[i] = stamp;
                i = parent[i];
                if (i < 0) return -1;
            }
            while (len > 0) s[--top] = s[--len]; // push the path onto the output
        }
        return top;
    }

    /// <summary>Postorder of a forest given by parent[] (Davis 2006, §4.3, cs_post).</summary>
    public static int[] PostOrder(int[] parent)
    {
        int n = parent.Length;
        var post = new int[n];
        var head = new int[n];
        var next = new int[n];
        var stack = new int[n];
        Array.Fill(head, -1);
        // Children are linked in reverse so each list comes out in increasing order.
        for (int j = n - 1; j >= 0; j--)
        {
            if (parent[j] == -1) continue;
            next[j] = head[parent[j]];
            head[parent[j]] = j;
        }
        int k = 0;
        for (int j = 0; j < n; j++)
        {
            if (parent[j] == -1) k = DepthFirst(j, k, head, next, post, stack);
        }
        return post;
    }

    /// <summary>
    /// Non-recursive depth-first search of the tree rooted at j, writing its postorder to post[k..]
    /// and returning the next free k (Davis 2006, §4.3, cs_tdfs). Consumes the child lists in head.
    /// </summary>
    public static int DepthFirst(int j, int k, int[] head, int[] next, int[] post, int[] stack)
    {
        int top = 0;
        stack[0] = j;
        while (top >= 0)
        {
            int p = stack[top];
            int i = head[p];
            if (i == -1)
            {
                top--;
                post[k++] = p;
            }
            else
            {
                head[p] = next[i];
                stack[++top] = i;
            }
        }
        return k;
    }
}
