// Triangular solves with the factors: A·x = b as P·b, L·y, U·z, Q·z, and the transposed system
// (Davis 2006, §3.1 cs_lsolve, cs_usolve, cs_ltsolve, cs_utsolve; §8.1 cs_lusol). In place, no allocation.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    /// <summary>Solves A·x = b in place: b holds x on return.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Solve(Span<T> b)
    {
        CheckSolve(b.Length);
        int[] lpl = lp, lil = li, upl = up, uil = ui, q = Symbolic.ColumnOrder, pinvl = pinv;
        T[] lxl = lx, uxl = ux, w = ws.Dense;
        for (int i = 0; i < n; i++) w[pinvl[i]] = b[i];
        // L·y = P·b, column by column (Davis 2006, §3.1, cs_lsolve; unit diagonal implicit).
        for (int j = 0; j < n; j++)
        {
            T wj = w[j];
            if (T.IsZero(wj)) continue;
            for (int p = lpl[j]; p < lpl[j + 1]; p++) w[lil[p]] -= lxl[p] * wj;
        }
        // U·z = y (Davis 2006, §3.1, cs_usolve; diagonal last in each column).
        for (int j = n - 1; j >= 0; j--)
        {
            int pd = upl[j + 1] - 1;
            T wj = w[j] / uxl[pd];
            w[j] = wj;
            if (T.IsZero(wj)) continue;
            for (int p = upl[j]; p < pd; p++) w[uil[p]] -= uxl[p] * wj;
        }
        for (int k = 0; k < n; k++) b[q[k]] = w[k];
    }

    /// <summary>Solves A·X = B in place for a column-major block of right-hand sides, n entries each.</summary>
    public void Solve(Span<T> block, int rightHandSides)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(rightHandSides);
        if (block.Length != (long)n * rightHandSides)
            throw new ArgumentException($"the block must hold {rightHandSides} columns of {n} entries.", nameof(block));
        for (int r = 0; r < rightHandSides; r++) Solve(block.Slice(r * n, n));
    }

    /// <summary>Solves Aᵀ·x = b in place (plain transpose, no conjugation).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void SolveTransposed(Span<T> b)
    {
        CheckSolve(b.Length);
        int[] lpl = lp, lil = li, upl = up, uil = ui, q = Symbolic.ColumnOrder, pinvl = pinv;
        T[] lxl = lx, uxl = ux, w = ws.Dense;
        // Aᵀ = Q·Uᵀ·Lᵀ·P, so solve Uᵀ then Lᵀ on Qᵀ·b (Davis 2006, §3.1, cs_utsolve and cs_ltsolve).
        for (int k = 0; k < n; k++) w[k] = b[q[k]];
        for (int j = 0; j < n; j++)
        {
            int pd = upl[j + 1] - 1;
            T s = w[j];
            for (int p = upl[j]; p < pd; p++) s -= uxl[p] * w[uil[p]];
            w[j] = s / uxl[pd];
        }
        for (int j = n - 1; j >= 0; j--)
        {
            T s = w[j];
            for (int p = lpl[j]; p < lpl[j + 1]; p++) s -= lxl[p] * w[lil[p]];
            w[j] = s;
        }
        for (int i = 0; i < n; i++) b[i] = w[pinvl[i]];
    }


    private void CheckSolve(int length)
    {
        if (!factorised) throw new InvalidOperationException("Solve needs a successful Factor or Refactor first.");
        if (length != n) throw new ArgumentException($"the right-hand side has {length} entries, the system {n}.");
    }
}
