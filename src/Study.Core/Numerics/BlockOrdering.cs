// Fill-reducing order for a matrix made of small dense blocks, such as the 2×2 (angle, magnitude)
// block per bus of a load-flow Jacobian: minimum degree on the quotient graph of the blocks, then
// the members of each block kept next to each other (Davis 2006, §7.1 on the quotient graph; the
// block form of Tinney's ordering for Newton load flow, Tinney and Hart 1967).
namespace Study.Core.Numerics;

/// <summary>Orders the block graph by approximate minimum degree and expands it to the rows of each block.</summary>
public static class BlockOrdering
{
    /// <summary>
    /// Column order q for <paramref name="a"/> where row and column r belong to block
    /// <paramref name="blockOf"/>[r] (0 ≤ block &lt; <paramref name="blocks"/>). Blocks come in
    /// minimum-degree order; within a block, rows keep their given order.
    /// </summary>
    public static int[] Order<T>(CscMatrix<T> a, int blocks, int[] blockOf) where T : System.Numerics.INumberBase<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(blockOf);
        int n = a.Cols;
        if (a.Rows != n) throw new ArgumentException($"a block ordering needs a square matrix, not {a.Rows}×{n}.", nameof(a));
        if (blockOf.Length != n) throw new ArgumentException($"blockOf has {blockOf.Length} entries for {n} rows.", nameof(blockOf));
        ArgumentOutOfRangeException.ThrowIfNegative(blocks);
        foreach (int b in blockOf)
            if ((uint)b >= (uint)blocks) throw new ArgumentOutOfRangeException(nameof(blockOf), b, $"a block number must lie in [0, {blocks}).");

        int[] blockOrder = ApproximateMinimumDegree.Order(Quotient(a, blocks, blockOf));
        return Expand(blockOrder, blocks, blockOf);
    }

    // The pattern of the block matrix: entry (I, J) when any a(i, j) has blockOf[i] = I, blockOf[j] = J.
    private static SymmetricPattern Quotient<T>(CscMatrix<T> a, int blocks, int[] blockOf) where T : System.Numerics.INumberBase<T>
    {
        int n = a.Cols;
        int[] ap = a.ColPtr, ai = a.RowIdx;
        var next = new int[blocks];
        for (int j = 0; j < n; j++) next[blockOf[j]] += ap[j + 1] - ap[j];
        var cp = new int[blocks + 1];
        var ci = new int[CompressedColumn.CumulativeSum(cp, next)];
        for (int j = 0; j < n; j++)
        {
            int bj = blockOf[j];
            for (int p = ap[j]; p < ap[j + 1]; p++) ci[next[bj]++] = blockOf[ai[p]];
        }
        return SymmetricPattern.OfSum(blocks, cp, ci);
    }

    // q lists the rows of block blockOrder[0], then of blockOrder[1], ... (a counting sort by block position).
    private static int[] Expand(int[] blockOrder, int blocks, int[] blockOf)
    {
        int n = blockOf.Length;
        var rank = new int[blocks];
        for (int k = 0; k < blocks; k++) rank[blockOrder[k]] = k;
        var next = new int[blocks];
        for (int r = 0; r < n; r++) next[rank[blockOf[r]]]++;
        CompressedColumn.CumulativeSum(new int[blocks + 1], next);
        var q = new int[n];
        for (int r = 0; r < n; r++) q[next[rank[blockOf[r]]]++] = r;
        return q;
    }
}
