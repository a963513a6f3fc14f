// Values-only refactorisation: same pattern, same pivot sequence, same L and U patterns, new
// numbers. Each column replays the left-looking solve over U's stored pattern, which cs_lu wrote in
// topological order, so no search is needed (Davis 2006, §6.3; the refactor step of Davis and
// Palamadai Natarajan, ACM TOMS 37(3), 2010). Nothing is allocated.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    // Returns false, with the accumulator cleared, as soon as a pivot falls below tol
    // (RefactorPivotTolerance, or PivotTolerance for a first factorisation on the diagonal) of the
    // largest candidate in its column, or every candidate looks like rounding noise, so the caller
    // can re-pivot (or report the column singular).
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool RefactorValues(CscMatrix<T> a, double tol)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx, q = Symbolic.ColumnOrder;
        T[] ax = a.Values;
        int[] lpl = lp, lil = li, upl = up, uil = ui, pinvl = pinv;
        T[] lxl = lx, uxl = ux, xl = ws.X;
        double singularTol = Options.SingularPivotTolerance;
        for (int k = 0; k < n; k++)
        {
            // Scatter A(:,q[k]) in pivot-row numbering.
            int col = q[k];
            double columnMax = 0;
            for (int p = ap[col]; p < ap[col + 1]; p++)
            {
                xl[pinvl[ai[p]]] += ax[p];
                double m = Scalar.Magnitude(ax[p]);
                if (m > columnMax) columnMax = m;
            }

            // U(:,k) entries in stored (topological) order, each updating x by its column of L.
            int pd = upl[k + 1] - 1;
            for (int p = upl[k]; p < pd; p++)
            {
                int j = uil[p];
                T ujk = xl[j];
                xl[j] = T.Zero;
                uxl[p] = ujk;
                if (T.IsZero(ujk)) continue;
                int start = lpl[j], length = lpl[j + 1] - start;
                SubtractScaled(xl, lil.AsSpan(start, length), lxl.AsSpan(start, length), ujk);
            }

            T pivot = xl[k];
            xl[k] = T.Zero;
            double pivotMagnitude = Scalar.Magnitude(pivot);
            double amax = pivotMagnitude;
            int l1 = lpl[k], l2 = lpl[k + 1];
            for (int pl = l1; pl < l2; pl++)
            {
                double t = Scalar.Magnitude(xl[lil[pl]]);
                if (t > amax) amax = t;
            }
            if (!(pivotMagnitude > 0) || pivotMagnitude < tol * amax || amax <= singularTol * columnMax)
            {
                for (int pl = l1; pl < l2; pl++) xl[lil[pl]] = T.Zero;
                return false;
            }

            uxl[pd] = pivot;
            T inverse = T.One / pivot;
            for (int pl = l1; pl < l2; pl++)
            {
                int i = lil[pl];
                lxl[pl] = xl[i] * inverse;
                xl[i] = T.Zero;
            }
        }
        return true;
    }
}
