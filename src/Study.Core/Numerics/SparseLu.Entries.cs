// Selected entries of one column of A⁻¹ without forming the column: with P·A·Q = L·U,
// (A⁻¹)(r, c) = (U⁻ᵀ·e_qinv[r]) · (L⁻¹·e_pinv[c]), two sparse triangular solves with a one-entry
// right-hand side whose patterns are reaches in the graphs of L and Uᵀ (Davis 2006, §3.2,
// cs_reach and cs_spsolve). A fault scan needs only Z(k, k) and a few neighbours per bus.
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

public sealed partial class SparseLu<T>
{
    private int[] utp = [];       // Uᵀ by columns (U by rows), diagonal first in each column
    private int[] uti = [];
    private T[] utx = [];
    private int entriesBuiltFor = -1;  // factorisation count the Uᵀ copy belongs to

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
        int[] lpl = lp, lil = li, utpl = utp, util = uti;
        T[] lxl = lx, utxl = utx, y = ws.X, w = ws.W;
        int[] reachL = ws.Nodes, reachU = ws.SecondNodes, stack = ws.Stack, marks = ws.Marks;

        // y = L⁻¹·e_pinv[column] over its reach, in topological order (unit diagonal).
        int start = pinv[column];
        int topL = Reach.Of(new ColumnGraph(lpl, lil), new ReadOnlySpan<int>(in start), default, reachL, stack, marks, ws.NewStamp());
        y[start] = T.One;
        for (int px = topL; px < n; px++)
        {
            int j = reachL[px];
            T yj = y[j];
            if (T.IsZero(yj)) continue;
            for (int p = lpl[j]; p < lpl[j + 1]; p++) y[lil[p]] -= lxl[p] * yj;
        }

        // For each row r: w = U⁻ᵀ·e_qinv[r] over its reach in Uᵀ, then the dot product w·y.
        var graphOfUt = new ColumnGraph(utpl, util);
        for (int t = 0; t < rows.Length; t++)
        {
            int node = qinv[rows[t]];
            int topU = Reach.Of(graphOfUt, new ReadOnlySpan<int>(in node), default, reachU, stack, marks, ws.NewStamp());
            w[node] = T.One;
            T sum = T.Zero;
            for (int px = topU; px < n; px++)
            {
                int j = reachU[px];
                int pd = utpl[j];
                T wj = w[j] / utxl[pd];
                w[j] = T.Zero;
                if (T.IsZero(wj)) continue;
                sum += wj * y[j];
                for (int p = pd + 1; p < utpl[j + 1]; p++) w[util[p]] -= utxl[p] * wj;
            }
            values[t] = sum;
        }
        for (int px = topL; px < n; px++) y[reachL[px]] = T.Zero;
    }

    // Uᵀ (U by rows), built once per factorisation. U is upper triangular, so the diagonal lands
    // first in each column of Uᵀ (Davis 2006, §2.5, cs_transpose).
    private void PrepareEntries()
    {
        if (entriesBuiltFor == factorCount) return;
        int unz = up[n];
        if (utp.Length != n + 1) utp = new int[n + 1];
        if (uti.Length < unz)
        {
            uti = new int[unz];
            utx = new T[unz];
        }
        CompressedColumn.Transpose<T>(up, ui.AsSpan(0, unz), ux.AsSpan(0, unz), utp, uti, utx, ws.Stack);
        entriesBuiltFor = factorCount;
    }
}
