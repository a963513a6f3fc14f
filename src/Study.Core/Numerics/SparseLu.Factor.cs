// Left-looking LU with threshold partial pivoting (Gilbert and Peierls 1988; Davis 2006, §6.3,
// cs_lu): column k of L and U comes from one sparse triangular solve x = L \ A(:,q[k]) whose
// nonzero pattern is found first by depth-first search (Reach; Davis 2006, §3.2, cs_reach).
// The search runs on a symmetrically pruned graph of L (Eisenstat and Liu, SIAM J. Matrix Anal.
// Appl. 13(1), 1992), which finds the same reach while skipping edges another path already covers.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    // Factorises a from scratch in the symbolic column order, choosing pivots. During the loop rows
    // are numbered by the symbolic order too (row i of A is row qinv[i]), so with diagonal pivots
    // the accumulator is touched in nearly the order the factors are stored, which keeps it in
    // cache; L's rows are renumbered to the actual pivot order at the end.
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool FactorWithPivoting(CscMatrix<T> a, out int singularColumn)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx, q = Symbolic.ColumnOrder;
        T[] ax = a.Values;
        int[] lpl = lp, upl = up, qinvl = qinv;
        int[] lil = li, uil = ui;
        T[] lxl = lx, uxl = ux;
        int[] pinvl = ws.RowPivot, searchEnd = ws.SearchEnd, xi = ws.Nodes, stack = ws.Stack, marks = ws.Marks;
        T[] xl = ws.X;
        double tol = Options.PivotTolerance, singularTol = Options.SingularPivotTolerance;
        Array.Fill(pinvl, -1);
        int lnz = 0, unz = 0;
        for (int k = 0; k < n; k++)
        {
            lpl[k] = lnz;
            upl[k] = unz;
            int col = q[k];

            // The pattern of x = L \ A(:,col): rows reachable from A(:,col) in the graph of L, whose
            // node j (a row in symbolic order) leads to the rows of L's column pinvl[j] once j is
            // pivotal, up to where pruning stopped that column (cs_reach).
            var graphOfL = new ColumnGraph(lpl, searchEnd, lil, pinvl);
            int top = Reach.Of(graphOfL, ai.AsSpan(ap[col], ap[col + 1] - ap[col]), qinvl, xi, stack, marks, ws.NewStamp());

            // At most n - top entries go to L and U; grow (only here, never in Refactor) if needed.
            int count = n - top;
            if (lnz + count > lil.Length)
            {
                Grow(ref li, ref lx, lnz + count);
                lil = li;
                lxl = lx;
            }
            if (unz + count > uil.Length)
            {
                Grow(ref ui, ref ux, unz + count);
                uil = ui;
                uxl = ux;
            }

            // x = L \ A(:,col) over the reach, in topological order (Davis 2006, §3.2, cs_spsolve).
            double columnMax = 0;
            for (int p = ap[col]; p < ap[col + 1]; p++)
            {
                xl[qinvl[ai[p]]] += ax[p];
                double m = Scalar.Magnitude(ax[p]);
                if (m > columnMax) columnMax = m;
            }
            for (int px = top; px < n; px++)
            {
                int j = xi[px];
                int jnew = pinvl[j];
                if (jnew < 0) continue;
                T xj = xl[j];
                if (T.IsZero(xj)) continue;
                int start = lpl[jnew], length = lpl[jnew + 1] - start;
                SubtractScaled(xl, lil.AsSpan(start, length), lxl.AsSpan(start, length), xj);
            }

            // Pivot: the largest candidate, unless the diagonal is within tol of it (cs_lu).
            int ipiv = -1;
            double amax = -1;
            for (int px = top; px < n; px++)
            {
                int i = xi[px];
                if (pinvl[i] < 0)
                {
                    double t = Scalar.Magnitude(xl[i]);
                    if (t > amax)
                    {
                        amax = t;
                        ipiv = i;
                    }
                }
                else
                {
                    uil[unz] = pinvl[i];
                    uxl[unz++] = xl[i];
                }
            }
            if (ipiv == -1 || amax <= 0 || amax <= singularTol * columnMax)
            {
                for (int px = top; px < n; px++) xl[xi[px]] = T.Zero;
                singularColumn = col;
                return false;
            }
            // The diagonal entry of column q[k] sits in row k of this numbering.
            if (pinvl[k] < 0 && Scalar.Magnitude(xl[k]) >= amax * tol) ipiv = k;

            T pivot = xl[ipiv];
            uil[unz] = k;
            uxl[unz++] = pivot;
            pinvl[ipiv] = k;
            T inverse = T.One / pivot;
            for (int px = top; px < n; px++)
            {
                int i = xi[px];
                if (pinvl[i] < 0)
                {
                    lil[lnz] = i;
                    lxl[lnz++] = xl[i] * inverse;
                }
                xl[i] = T.Zero;
            }
            searchEnd[k] = lnz;
            Prune(ipiv, upl[k], unz - 1, lil, lxl);
        }
        lpl[n] = lnz;
        upl[n] = unz;
        for (int p = 0; p < lnz; p++) lil[p] = pinvl[lil[p]];
        for (int i = 0; i < n; i++) pinv[i] = pinvl[qinvl[i]];
        singularColumn = -1;
        return true;
    }

    // Symmetric pruning after step k: for each column j of L with U(j,k) != 0 that holds the new
    // pivot row, rows of L(:,j) not yet pivotal are reachable through that pivot row, so the search
    // may stop at the pivotal ones. They are moved to the front and the search end of j set after
    // them. A column is pruned once: its search end then stands before the column's end.
    private void Prune(int pivotRow, int uStart, int uEnd, int[] lil, T[] lxl)
    {
        int[] lpl = lp, searchEnd = ws.SearchEnd, pinvl = ws.RowPivot, uil = ui;
        for (int pu = uStart; pu < uEnd; pu++)
        {
            int j = uil[pu];
            int start = lpl[j], end = lpl[j + 1];
            if (searchEnd[j] != end) continue;
            if (Array.IndexOf(lil, pivotRow, start, end - start) < 0) continue;
            int head = start, tail = end;
            while (head < tail)
            {
                int i = lil[head];
                if (pinvl[i] >= 0)
                {
                    head++;
                }
                else
                {
                    tail--;
                    lil[head] = lil[tail];
                    lil[tail] = i;
                    (lxl[head], lxl[tail]) = (lxl[tail], lxl[head]);
                }
            }
            searchEnd[j] = tail;
        }
    }

    // x[rows] -= values·factor: the one update both the factorisation and the refactorisation spend
    // their time in (the column operation of Davis 2006, §3.2).
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void SubtractScaled(T[] x, ReadOnlySpan<int> rows, ReadOnlySpan<T> values, T factor)
    {
        values = values[..rows.Length];
        for (int t = 0; t < rows.Length; t++) x[rows[t]] -= values[t] * factor;
    }
}
