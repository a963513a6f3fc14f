// Values-only refactorisation: same pattern, same pivot sequence, same L and U patterns, new
// numbers. Each column replays the left-looking solve over U's stored pattern, which cs_lu wrote in
// topological order, so no search is needed (Davis 2006, §6.3; the refactor step of Davis and
// Palamadai Natarajan, ACM TOMS 37(3), 2010). Nothing is allocated.
// A partial refactorisation redoes only the columns that depend on the columns of A that changed:
// with diagonal pivots on a symmetric pattern, column k of the factors reads the columns of L of
// its descendants in the elimination tree, so a change in column c reaches exactly c and its
// ancestors (the partial refactorisation of Chan and Brandwajn, IEEE Trans. PWRS 1(4), 1986).
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
        for (int k = 0; k < n; k++)
        {
            if (!RefactorColumn(a, k, tol)) return false;
        }
        allChangedSinceAdoption = true;
        return true;
    }

    /// <summary>
    /// The columns of the factors whose numbers depend on the listed columns of A: those columns and
    /// their ancestors in the elimination tree, in increasing order (a topological order: a parent
    /// comes after its children). Valid for factors with diagonal pivots (<see cref="HasDiagonalPivots"/>).
    /// </summary>
    /// <param name="changedColumns">Columns of A (not of the factors).</param>
    /// <param name="factorColumns">Receives the columns of the factors; room for n.</param>
    /// <returns>How many were written.</returns>
    public int ColumnsDependingOn(ReadOnlySpan<int> changedColumns, Span<int> factorColumns)
    {
        int[] parent = Symbolic.Parent, marks = ws.Marks;
        int stamp = ws.NewStamp(), count = 0;
        foreach (int c in changedColumns)
        {
            for (int k = qinv[c]; k >= 0 && marks[k] != stamp; k = parent[k])
            {
                marks[k] = stamp;
                factorColumns[count++] = k;
            }
        }
        factorColumns[..count].Sort();
        return count;
    }

    /// <summary>Column of A that column <paramref name="factorColumn"/> of the factors eliminates.</summary>
    public int ColumnOfA(int factorColumn) => Symbolic.ColumnOrder[factorColumn];

    /// <summary>True when the factors keep every pivot on the diagonal of the analysis's order (partial refactorisation needs it).</summary>
    public bool HasDiagonalPivots => factorised && onDiagonal;

    /// <summary>
    /// Refactorises only the listed columns of the factors (from <see cref="ColumnsDependingOn"/>), reading
    /// only their columns of <paramref name="a"/>. The other columns keep their numbers, so the factors
    /// become exactly those of the matrix whose listed columns come from <paramref name="a"/> and whose
    /// other columns are those of the matrix factorised before. Returns false when it cannot (no
    /// factorisation with diagonal pivots of this pattern, or a pivot fails the test); the factors are
    /// then unusable until a full <see cref="TryRefactor"/> or <see cref="TryFactor"/>.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public bool TryRefactorColumns(CscMatrix<T> a, ReadOnlySpan<int> factorColumns)
    {
        ArgumentNullException.ThrowIfNull(a);
        if (!HasDiagonalPivots || !SamePatternAsFactored(a)) return false;
        foreach (int k in factorColumns)
        {
            if (!FiniteColumn(a, Symbolic.ColumnOrder[k]) || !RefactorColumn(a, k, Options.RefactorPivotTolerance))
            {
                factorised = false;
                return false;
            }
        }
        factorCount++;
        ValueRefactorisations++;
        if (!allChangedSinceAdoption)
        {
            foreach (int k in factorColumns) changedSinceAdoption.Add(k);
            if (changedSinceAdoption.Count > n) allChangedSinceAdoption = true;
        }
        return true;
    }

    private static bool FiniteColumn(CscMatrix<T> a, int col)
    {
        for (int p = a.ColPtr[col]; p < a.ColPtr[col + 1]; p++)
        {
            if (!T.IsFinite(a.Values[p])) return false;
        }
        return true;
    }

    // Column k of L and U from column q[k] of a and the columns of L before it; false (accumulator
    // cleared) when its pivot fails the test.
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private bool RefactorColumn(CscMatrix<T> a, int k, double tol)
    {
        int[] ap = a.ColPtr, ai = a.RowIdx;
        T[] ax = a.Values;
        int[] lpl = lp, lil = li, upl = up, uil = ui, pinvl = pinv;
        T[] lxl = lx, uxl = ux, xl = ws.X;

        // Scatter A(:,q[k]) in pivot-row numbering.
        int col = Symbolic.ColumnOrder[k];
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
        if (!(pivotMagnitude > 0) || pivotMagnitude < tol * amax || amax <= Options.SingularPivotTolerance * columnMax)
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
        return true;
    }
}
