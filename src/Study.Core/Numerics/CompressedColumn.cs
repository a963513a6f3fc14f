// The two storage primitives every compressed-column routine builds on: column pointers from
// counts (Davis 2006, §2.2, cs_cumsum) and the transpose (§2.5, cs_transpose).
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

/// <summary>Cumulative sum and transpose on plain compressed-column arrays (colPtr, rowIdx, values).</summary>
internal static class CompressedColumn
{
    /// <summary>
    /// p[0..n] = running sums of c[0..n-1] (p[0] = 0, p[n] the total), n = p.Length - 1; c[0..n-1]
    /// is overwritten with p[0..n-1], the next free slot of each column, ready for a scatter
    /// (Davis 2006, §2.2, cs_cumsum). Returns the total.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static int CumulativeSum(Span<int> p, Span<int> c)
    {
        int n = p.Length - 1;
        c = c[..n];
        int nz = 0;
        for (int i = 0; i < n; i++)
        {
            p[i] = nz;
            nz += c[i];
            c[i] = p[i];
        }
        p[n] = nz;
        return nz;
    }

    /// <summary>
    /// C = Aᵀ (plain transpose, no conjugation) for A with columns (ap, ai, ax): A has ap.Length - 1
    /// columns and C has cp.Length - 1 columns, the row count of A. Within each column of C the rows
    /// come out in increasing order, so transposing twice sorts (Davis 2006, §2.5, cs_transpose).
    /// Values move only when ax is not empty. w needs one entry per column of C.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Transpose<T>(ReadOnlySpan<int> ap, ReadOnlySpan<int> ai, ReadOnlySpan<T> ax,
        Span<int> cp, Span<int> ci, Span<T> cx, Span<int> w)
    {
        int n = ap.Length - 1, m = cp.Length - 1;
        bool values = !ax.IsEmpty;
        w = w[..m];
        w.Clear();
        for (int p = 0; p < ap[n]; p++) w[ai[p]]++;
        CumulativeSum(cp, w);
        for (int j = 0; j < n; j++)
        {
            for (int p = ap[j]; p < ap[j + 1]; p++)
            {
                int q = w[ai[p]]++;
                ci[q] = j;
                if (values) cx[q] = ax[p];
            }
        }
    }

    /// <summary><see cref="Transpose{T}"/> of the pattern alone.</summary>
    public static void Transpose(ReadOnlySpan<int> ap, ReadOnlySpan<int> ai, Span<int> cp, Span<int> ci, Span<int> w) =>
        Transpose<int>(ap, ai, [], cp, ci, [], w);
}
