// First factorisation of a structurally symmetric matrix when every pivot can stay on the diagonal.
// Then L is the Cholesky pattern of C = Q·A·Qᵀ and U is its transpose plus the diagonal, both found
// from the analysis's elimination tree with no depth-first search over L (Davis 2006, §4.2
// cs_ereach); the numbers are computed by the values-only loop with cs_lu's pivot test. If a
// diagonal pivot fails that test, the caller falls back to the pivoting factorisation.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    // Factorises a with diagonal pivots when a is structurally symmetric with a full diagonal and
    // each diagonal is within PivotTolerance of the largest candidate in its column.
    private bool TryFactorOnDiagonal(CscMatrix<T> a)
    {
        if (!StructurallySymmetric(a) || !DiagonalPattern(a)) return false;
        for (int i = 0; i < n; i++) pinv[i] = qinv[i];
        return RefactorValues(a, Options.PivotTolerance);
    }

    // True when the pattern of a equals that of Aᵀ and every diagonal entry is stored.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool StructurallySymmetric(CscMatrix<T> a)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx, marks = ws.Marks;
        int nnz = ap[n];
        int[] tp = ws.Pointers, ti = ws.PatternOfSize(nnz);
        CompressedColumn.Transpose(ap, ai.AsSpan(0, nnz), tp, ti, ws.Stack);
        for (int j = 0; j < n; j++)
        {
            if (tp[j + 1] - tp[j] != ap[j + 1] - ap[j]) return false;
        }
        for (int j = 0; j < n; j++)
        {
            int stamp = ws.NewStamp();
            for (int p = ap[j]; p < ap[j + 1]; p++) marks[ai[p]] = stamp;
            if (marks[j] != stamp) return false;
            for (int p = tp[j]; p < tp[j + 1]; p++)
            {
                if (marks[ti[p]] != stamp) return false;
            }
        }
        return true;
    }

    // lp/li and up/ui for diagonal pivots in the symbolic order. Row k of L (= column k of U above
    // the diagonal) is the row subtree of k in the elimination tree; transposing that pattern gives
    // L and transposing L back sorts U's columns, which the solves and refactorisations then read in
    // increasing order. False when the analysis's tree does not hold a's pattern (a matrix other
    // than the one analysed): the pivoting factorisation then finds the pattern by itself.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool DiagonalPattern(CscMatrix<T> a)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx, q = Symbolic.ColumnOrder, parent = Symbolic.Parent;
        int[] strictPtr = ws.Pointers, s = ws.Nodes, marks = ws.Marks;

        // U without its diagonal: column k is row k of L, in topological order (cs_ereach).
        int unz = 0;
        for (int k = 0; k < n; k++)
        {
            strictPtr[k] = unz;
            int col = q[k];
            int top = EliminationTree.Reach(k, ai.AsSpan(ap[col], ap[col + 1] - ap[col]), qinv, parent, s, marks, ws.NewStamp());
            if (top < 0) return false;
            int count = n - top;
            if (unz + count > ui.Length) Grow(ref ui, ref ux, unz + count);
            Array.Copy(s, top, ui, unz, count);
            unz += count;
        }
        strictPtr[n] = unz;

        if (unz > li.Length) Grow(ref li, ref lx, unz);
        CompressedColumn.Transpose(strictPtr, ui, lp, li, ws.Stack);
        CompressedColumn.Transpose(lp, li, strictPtr, ui, ws.Stack);
        if (unz + n > ui.Length) Grow(ref ui, ref ux, unz + n);
        DiagonalLast(strictPtr, ui, up);
        return true;
    }

    // U's columns from its strictly upper part (column pointers strictPtr, rows in ui) by adding
    // the diagonal last in each column, moving the columns up in place from the last one down.
    private void DiagonalLast(int[] strictPtr, int[] uil, int[] upl)
    {
        upl[n] = strictPtr[n] + n;
        for (int k = n - 1; k >= 0; k--)
        {
            int start = strictPtr[k], count = strictPtr[k + 1] - start;
            upl[k] = start + k;
            uil[upl[k] + count] = k;
            Array.Copy(uil, start, uil, upl[k], count);
        }
    }
}
