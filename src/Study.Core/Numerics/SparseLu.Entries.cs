// Selected entries of one column of A⁻¹ without forming the column: with P·A·Q = L·U,
// (A⁻¹)(r, c) = (U⁻ᵀ·e_qinv[r]) · (L⁻¹·e_pinv[c]), two sparse triangular solves with a one-entry
// right-hand side whose patterns are reaches in the graphs of L and Uᵀ (Davis 2006, §3.2,
// cs_reach and cs_spsolve). A fault scan needs only Z(k, k) and a few neighbours per bus.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    private int[] utp = [];       // Uᵀ by columns (U by rows), strictly above the diagonal
    private int[] uti = [];
    private T[] utx = [];
    private T[] udiag = [];
    private int entriesBuiltFor = -1;  // factorisation count the Uᵀ copy belongs to
    private int factorCount;
    private int[] reachMark = [];
    private int reachStamp;
    private int[] reachL = [], reachU = [], reachStack = [];
    private T[] dense = [];
    private T[] rowDense = [];    // U⁻ᵀ·e accumulator, all zero between calls (Solve's work vector is not)

    /// <summary>
    /// values[t] = (A⁻¹)(rows[t], column) for the current factorisation. Costs the reaches of column
    /// in L and of each row in Uᵀ, never a full solve; allocates only on the first call after a factorisation.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void InverseEntries(int column, ReadOnlySpan<int> rows, Span<T> values)
    {
        if (!factorised) throw new InvalidOperationException("InverseEntries needs a successful Factor or Refactor first.");
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual((uint)column, (uint)n, nameof(column));
        if (values.Length < rows.Length) throw new ArgumentException("values must hold one entry per row.", nameof(values));
        // Checked before any work: the accumulators must be left all zero.
        foreach (int r in rows)
        {
            if ((uint)r >= (uint)n) throw new ArgumentOutOfRangeException(nameof(rows), r, $"a row must lie in [0, {n}).");
        }
        PrepareEntries();
        int[] lpl = lp, lil = li;
        T[] lxl = lx, y = dense;

        // y = L⁻¹·e_pinv[column] over its reach, in topological order (unit diagonal).
        int topL = ReachFrom(pinv[column], lpl, lil, reachL);
        y[reachL[topL]] = T.One;
        for (int px = topL; px < n; px++)
        {
            int j = reachL[px];
            T yj = y[j];
            if (T.IsZero(yj)) continue;
            for (int p = lpl[j]; p < lpl[j + 1]; p++) y[lil[p]] -= lxl[p] * yj;
        }

        // For each row r: w = U⁻ᵀ·e_qinv[r] over its reach in Uᵀ, then the dot product w·y.
        int[] utpl = utp, util = uti;
        T[] utxl = utx, diag = udiag, w = rowDense;
        for (int t = 0; t < rows.Length; t++)
        {
            int r = rows[t];
            int topU = ReachFrom(qinv[r], utpl, util, reachU);
            w[reachU[topU]] = T.One;
            T sum = T.Zero;
            for (int px = topU; px < n; px++)
            {
                int j = reachU[px];
                T wj = w[j] / diag[j];
                w[j] = T.Zero;
                if (T.IsZero(wj)) continue;
                sum += wj * y[j];
                for (int p = utpl[j]; p < utpl[j + 1]; p++) w[util[p]] -= utxl[p] * wj;
            }
            values[t] = sum;
        }
        for (int px = topL; px < n; px++) y[reachL[px]] = T.Zero;
    }

    // Uᵀ (U by rows) without the diagonal, kept apart, built once per factorisation (Davis 2006, §2.5, cs_transpose).
    private void PrepareEntries()
    {
        if (entriesBuiltFor == factorCount) return;
        int[] upl = up, uil = ui;
        T[] uxl = ux;
        int strict = upl[n] - n;
        if (utp.Length != n + 1) utp = new int[n + 1];
        if (uti.Length < strict) { uti = new int[strict]; utx = new T[strict]; }
        if (udiag.Length != n)
        {
            udiag = new T[n];
            dense = new T[n];
            rowDense = new T[n];
            reachMark = new int[n];
            reachL = new int[n];
            reachU = new int[n];
            reachStack = new int[n];
        }
        int[] count = utp;
        Array.Clear(count);
        for (int j = 0; j < n; j++)
            for (int p = upl[j]; p < upl[j + 1] - 1; p++) count[uil[p] + 1]++;
        for (int i = 0; i < n; i++) count[i + 1] += count[i];
        int[] next = reachStack;
        Array.Copy(count, next, n);
        for (int j = 0; j < n; j++)
        {
            int pd = upl[j + 1] - 1;
            for (int p = upl[j]; p < pd; p++)
            {
                int q = next[uil[p]]++;
                uti[q] = j;
                utx[q] = uxl[p];
            }
            udiag[j] = uxl[pd];
        }
        entriesBuiltFor = factorCount;
    }

    // xi[top..n-1] = nodes reachable from start in the graph (gp, gi), in topological order
    // (Davis 2006, §3.2, cs_dfs, non-recursive; the stack grows from the front of reachStack).
    private int ReachFrom(int start, int[] gp, int[] gi, int[] xi)
    {
        if (++reachStamp == int.MaxValue)
        {
            Array.Clear(reachMark);
            reachStamp = 1;
        }
        int stamp = reachStamp;
        int[] markl = reachMark, stack = reachStack, pos = pstack;
        int top = n, head = 0;
        stack[0] = start;
        while (head >= 0)
        {
            int j = stack[head];
            if (markl[j] != stamp)
            {
                markl[j] = stamp;
                pos[head] = gp[j];
            }
            bool done = true;
            for (int p = pos[head]; p < gp[j + 1]; p++)
            {
                int i = gi[p];
                if (markl[i] == stamp) continue;
                pos[head] = p + 1;
                stack[++head] = i;
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
