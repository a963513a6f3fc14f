// Column counts of the Cholesky factor of a symmetric pattern without forming the factor, in nearly
// O(nnz) time via row subtrees and least common ancestors (Davis 2006, §4.5, cs_counts and cs_leaf).
// For LU with diagonal pivots on a structurally symmetric matrix these are exactly the column counts
// of L (and the row counts of U), so they size the factors before the numeric phase.
namespace Study.Core.Numerics;

/// <summary>Cholesky column counts of a symmetric pattern, diagonal included.</summary>
internal static class ColumnCounts
{
    public static int[] Of(SymmetricPattern c, int[] parent, int[] post)
    {
        int n = c.N;
        int[] cp = c.ColPtr, ci = c.RowIdx;
        var delta = new int[n]; // becomes the column counts
        var ancestor = new int[n];
        var maxFirst = new int[n];
        var prevLeaf = new int[n];
        var first = new int[n];
        Array.Fill(maxFirst, -1);
        Array.Fill(prevLeaf, -1);
        Array.Fill(first, -1);

        // first[j] = postorder index of the first descendant of j; leaves start at delta 1.
        for (int k = 0; k < n; k++)
        {
            int j = post[k];
            delta[j] = first[j] == -1 ? 1 : 0;
            for (; j != -1 && first[j] == -1; j = parent[j]) first[j] = k;
        }
        for (int i = 0; i < n; i++) ancestor[i] = i;

        for (int k = 0; k < n; k++)
        {
            int j = post[k];
            if (parent[j] != -1) delta[parent[j]]--;
            // C is symmetric, so column j of C is row j: the entries c(i,j) with i > j.
            for (int p = cp[j]; p < cp[j + 1]; p++)
            {
                int i = ci[p];
                int q = Leaf(i, j, first, maxFirst, prevLeaf, ancestor, out int jleaf);
                if (jleaf >= 1) delta[j]++;   // c(i,j) is in the skeleton
                if (jleaf == 2) delta[q]--;   // remove the overlap at the common ancestor
            }
            if (parent[j] != -1) ancestor[j] = parent[j];
        }
        for (int j = 0; j < n; j++)
        {
            if (parent[j] != -1) delta[parent[j]] += delta[j];
        }
        return delta;
    }

    // Is j a leaf of the i-th row subtree? jleaf: 0 no, 1 first leaf, 2 a later leaf, whose least
    // common ancestor with the previous leaf is returned (Davis 2006, §4.4, cs_leaf).
    private static int Leaf(int i, int j, int[] first, int[] maxFirst, int[] prevLeaf, int[] ancestor, out int jleaf)
    {
        jleaf = 0;
        if (i <= j || first[j] <= maxFirst[i]) return -1;
        maxFirst[i] = first[j];
        int jprev = prevLeaf[i];
        prevLeaf[i] = j;
        jleaf = jprev == -1 ? 1 : 2;
        if (jleaf == 1) return i;
        int q = jprev;
        while (q != ancestor[q]) q = ancestor[q];
        for (int s = jprev; s != q;)
        {
            int sparent = ancestor[s];
            ancestor[s] = q; // path compression
            s = sparent;
        }
        return q;
    }
}
