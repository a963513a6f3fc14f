// The pattern of A + Aᵀ without its diagonal: the graph that minimum-degree ordering and the
// elimination tree work on (Davis 2006, §7.1: cs_amd forms C = A + A' and drops the diagonal).
namespace Study.Core.Numerics;

/// <summary>Adjacency of the undirected graph of A + Aᵀ: both triangles stored, no diagonal, no duplicates.</summary>
internal sealed class SymmetricPattern
{
    private SymmetricPattern(int n, int[] colPtr, int[] rowIdx)
    {
        N = n;
        ColPtr = colPtr;
        RowIdx = rowIdx;
    }

    public int N { get; }
    public int[] ColPtr { get; }
    public int[] RowIdx { get; }
    public int NonZeros => ColPtr[N];

    /// <summary>Pattern of A + Aᵀ for a square pattern (colPtr, rowIdx) of order n.</summary>
    public static SymmetricPattern OfSum(int n, int[] colPtr, int[] rowIdx)
    {
        int[] ap = colPtr, ai = rowIdx;
        // Every off-diagonal a(i,j) contributes i to column j and j to column i.
        var next = new int[n];
        for (int j = 0; j < n; j++)
        {
            for (int p = ap[j]; p < ap[j + 1]; p++)
            {
                int i = ai[p];
                if (i == j) continue;
                next[i]++;
                next[j]++;
            }
        }
        var cp = new int[n + 1];
        var ci = new int[CompressedColumn.CumulativeSum(cp, next)];
        for (int j = 0; j < n; j++)
        {
            for (int p = ap[j]; p < ap[j + 1]; p++)
            {
                int i = ai[p];
                if (i == j) continue;
                ci[next[j]++] = i;
                ci[next[i]++] = j;
            }
        }

        // Drop duplicates column by column, compacting in place (Davis 2006, §2.8, cs_dupl).
        var seen = next;
        Array.Fill(seen, -1);
        int nz = 0;
        for (int j = 0; j < n; j++)
        {
            int start = cp[j], end = cp[j + 1];
            cp[j] = nz;
            for (int p = start; p < end; p++)
            {
                int i = ci[p];
                if (seen[i] == j) continue;
                seen[i] = j;
                ci[nz++] = i;
            }
        }
        cp[n] = nz;
        Array.Resize(ref ci, nz);
        return new SymmetricPattern(n, cp, ci);
    }

    /// <summary>The pattern of P·C·Pᵀ where new node k is old node order[k] (Davis 2006, §2.6, cs_symperm).</summary>
    public SymmetricPattern Permute(int[] order)
    {
        int n = N;
        int[] cp = ColPtr, ci = RowIdx;
        var inverse = new int[n];
        for (int k = 0; k < n; k++) inverse[order[k]] = k;
        var pp = new int[n + 1];
        var pi = new int[NonZeros];
        int nz = 0;
        for (int k = 0; k < n; k++)
        {
            pp[k] = nz;
            int j = order[k];
            for (int p = cp[j]; p < cp[j + 1]; p++) pi[nz++] = inverse[ci[p]];
        }
        pp[n] = nz;
        return new SymmetricPattern(n, pp, pi);
    }
}
