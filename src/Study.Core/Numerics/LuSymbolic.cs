// Symbolic analysis for sparse LU, done once per pattern: the fill-reducing column order, the
// elimination tree in that order, and the expected sizes of L and U (Davis 2006, §6.1 cs_sqr for
// LU, with the tree of §4.1 and the counts of §4.5).
using System.Numerics;

namespace Study.Core.Numerics;

/// <summary>Pattern-only analysis of a square matrix, shared by every numeric factorisation of that pattern.</summary>
public sealed class LuSymbolic
{
    private LuSymbolic(int size, ColumnOrdering ordering, int[] columnOrder, int[] parent, long lowerCount, long upperCount)
    {
        Size = size;
        Ordering = ordering;
        ColumnOrder = columnOrder;
        Parent = parent;
        EstimatedNonZerosL = lowerCount;
        EstimatedNonZerosU = upperCount;
    }

    /// <summary>Order n of the matrix.</summary>
    public int Size { get; }

    public ColumnOrdering Ordering { get; }

    /// <summary>q: column k of the factors is column q[k] of A; the row order starts as the same permutation.</summary>
    public int[] ColumnOrder { get; }

    /// <summary>
    /// Elimination tree of Q(A + Aᵀ)Qᵀ: parent[k] of node k (column k of the factors), -1 for a root.
    /// With diagonal pivots on a structurally symmetric matrix, row k of L is the union of the tree
    /// paths from the entries above the diagonal of column k up to k (Davis 2006, §4.1-4.2).
    /// </summary>
    internal int[] Parent { get; }

    /// <summary>
    /// nnz(L) with its unit diagonal, exact when every pivot stays on the diagonal of a structurally
    /// symmetric matrix; off-diagonal pivots may add to it.
    /// </summary>
    public long EstimatedNonZerosL { get; }

    /// <summary>nnz(U) with its diagonal, on the same terms as <see cref="EstimatedNonZerosL"/>.</summary>
    public long EstimatedNonZerosU { get; }

    public static LuSymbolic Analyse<T>(CscMatrix<T> a, ColumnOrdering ordering = ColumnOrdering.Amd) where T : INumberBase<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        if (a.Rows != a.Cols) throw new ArgumentException($"LU needs a square matrix, not {a.Rows}×{a.Cols}.", nameof(a));
        if (ordering == ColumnOrdering.Given) throw new ArgumentException("a given order comes with its permutation: use the overload that takes it.", nameof(ordering));
        int n = a.Cols;
        var pattern = SymmetricPattern.OfSum(n, a.ColPtr, a.RowIdx);
        int[] q;
        if (ordering == ColumnOrdering.Amd)
        {
            q = ApproximateMinimumDegree.Order(pattern);
        }
        else
        {
            q = new int[n];
            for (int k = 0; k < n; k++) q[k] = k;
        }
        return Counted(pattern, ordering, q);
    }

    /// <summary>Analysis with a column order chosen by the caller (a permutation of 0..n-1).</summary>
    public static LuSymbolic Analyse<T>(CscMatrix<T> a, int[] columnOrder) where T : INumberBase<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(columnOrder);
        if (a.Rows != a.Cols) throw new ArgumentException($"LU needs a square matrix, not {a.Rows}×{a.Cols}.", nameof(a));
        int n = a.Cols;
        if (columnOrder.Length != n) throw new ArgumentException($"the order has {columnOrder.Length} entries for {n} columns.", nameof(columnOrder));
        var seen = new bool[n];
        foreach (int j in columnOrder)
        {
            if ((uint)j >= (uint)n || seen[j]) throw new ArgumentException("the column order is not a permutation.", nameof(columnOrder));
            seen[j] = true;
        }
        return Counted(SymmetricPattern.OfSum(n, a.ColPtr, a.RowIdx), ColumnOrdering.Given, (int[])columnOrder.Clone());
    }

    private static LuSymbolic Counted(SymmetricPattern pattern, ColumnOrdering ordering, int[] q)
    {
        int n = pattern.N;

        // Fill of the symmetric pattern in the chosen order: Cholesky column counts of Q(A+Aᵀ)Qᵀ give
        // L's columns and, by symmetry, U's rows, under diagonal pivoting (Davis 2006, §4.5).
        var permuted = pattern.Permute(q);
        var parent = EliminationTree.Parents(permuted);
        var post = EliminationTree.PostOrder(parent);
        var counts = ColumnCounts.Of(permuted, parent, post);
        long total = 0;
        for (int k = 0; k < n; k++) total += counts[k];
        return new LuSymbolic(n, ordering, q, parent, total, total);
    }
}
