// First factorisation of a structurally symmetric matrix when every pivot can stay on the diagonal.
// Then L is the Cholesky pattern of C = Q·A·Qᵀ and U is its transpose plus the diagonal, both found
// from the elimination tree with no depth-first search over L (Davis 2006, §4.1 cs_etree, §4.2
// cs_ereach); the numbers are computed by the values-only loop with cs_lu's pivot test. If a
// diagonal pivot fails that test, the caller falls back to the pivoting factorisation.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    private int[] parent = [];     // elimination tree of C, -1 for a root
    private int[] transposeColPtr = [];
    private int[] transposeRowIdx = [];

    // Factorises a with diagonal pivots when a is structurally symmetric with a full diagonal and
    // each diagonal is within PivotTolerance of the largest candidate in its column.
    private bool TryFactorOnDiagonal(CscMatrix<T> a)
    {
        if (!StructurallySymmetric(a)) return false;
        DiagonalPattern(a);
        for (int i = 0; i < n; i++) pinv[i] = qinv[i];
        return RefactorValues(a, Options.PivotTolerance);
    }

    // True when the pattern of a equals that of Aᵀ and every diagonal entry is stored.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool StructurallySymmetric(CscMatrix<T> a)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx, markl = mark;
        int nnz = ap[n];
        if (transposeColPtr.Length != n + 1) transposeColPtr = new int[n + 1];
        if (transposeRowIdx.Length < nnz) transposeRowIdx = new int[nnz];
        int[] tp = transposeColPtr, ti = transposeRowIdx, next = pstack;
        Array.Clear(tp);
        for (int p = 0; p < nnz; p++) tp[ai[p] + 1]++;
        for (int j = 0; j < n; j++)
        {
            tp[j + 1] += tp[j];
            if (tp[j + 1] - tp[j] != ap[j + 1] - ap[j]) return false;
        }
        Array.Copy(tp, next, n);
        for (int j = 0; j < n; j++)
        {
            for (int p = ap[j]; p < ap[j + 1]; p++) ti[next[ai[p]]++] = j;
        }
        Array.Clear(markl);
        for (int j = 0; j < n; j++)
        {
            int stamp = j + 1;
            for (int p = ap[j]; p < ap[j + 1]; p++) markl[ai[p]] = stamp;
            if (markl[j] != stamp) return false;
            for (int p = tp[j]; p < tp[j + 1]; p++)
            {
                if (markl[ti[p]] != stamp) return false;
            }
        }
        return true;
    }

    // lp/li and up/ui for diagonal pivots in the symbolic order: row k of L (= column k of U) is the
    // reach of C(0:k-1, k) in the elimination tree; L's columns are U's rows, both sorted ascending.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void DiagonalPattern(CscMatrix<T> a)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx, q = Symbolic.ColumnOrder, qinvl = qinv;
        if (parent.Length != n) parent = new int[n];
        int[] parentl = parent, ancestor = pstack, s = xi, markl = mark;
        int[] lpl = lp, upl = up;

        // Elimination tree of C with path compression (Davis 2006, §4.1, cs_etree).
        for (int k = 0; k < n; k++)
        {
            parentl[k] = -1;
            ancestor[k] = -1;
            int col = q[k];
            for (int p = ap[col]; p < ap[col + 1]; p++)
            {
                int i = qinvl[ai[p]];
                while (i != -1 && i < k)
                {
                    int inext = ancestor[i];
                    ancestor[i] = k;
                    if (inext == -1) parentl[i] = k;
                    i = inext;
                }
            }
        }

        // U(:,k) = the row subtree of k (Davis 2006, §4.2, cs_ereach), diagonal last.
        Array.Fill(markl, -1);
        int unz = 0;
        for (int k = 0; k < n; k++)
        {
            upl[k] = unz;
            markl[k] = k;
            int top = n, col = q[k];
            for (int p = ap[col]; p < ap[col + 1]; p++)
            {
                int i = qinvl[ai[p]];
                if (i > k) continue;
                int len = 0;
                for (; markl[i] != k; i = parentl[i])
                {
                    s[len++] = i;
                    markl[i] = k;
                }
                while (len > 0) s[--top] = s[--len];
            }
            int count = n - top;
            if (unz + count + 1 > ui.Length) Grow(ref ui, ref ux, unz + count + 1);
            int[] uil = ui;
            Array.Copy(s, top, uil, unz, count);
            unz += count;
            uil[unz++] = k;
        }
        upl[n] = unz;

        // L by rows of U: column j of L lists the k > j with U(j,k) != 0, in increasing k.
        int[] next = ancestor, uiu = ui;
        Array.Clear(next);
        for (int k = 0; k < n; k++)
        {
            for (int p = upl[k]; p < upl[k + 1] - 1; p++) next[uiu[p]]++;
        }
        int lnz = 0;
        for (int j = 0; j < n; j++)
        {
            lpl[j] = lnz;
            lnz += next[j];
            next[j] = lpl[j];
        }
        lpl[n] = lnz;
        if (lnz > li.Length) Grow(ref li, ref lx, lnz);
        int[] lil = li;
        for (int k = 0; k < n; k++)
        {
            for (int p = upl[k]; p < upl[k + 1] - 1; p++) lil[next[uiu[p]]++] = k;
        }

        // U again as the transpose of L, now with each column's rows in increasing order.
        for (int k = 0; k < n; k++) next[k] = upl[k];
        for (int j = 0; j < n; j++)
        {
            for (int p = lpl[j]; p < lpl[j + 1]; p++) uiu[next[lil[p]]++] = j;
        }
    }
}
