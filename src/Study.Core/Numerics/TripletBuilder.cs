// Assembles a sparse matrix entry by entry (coordinate form) and compresses it to columns
// (Davis 2006, §2.1-2.2, cs_entry / cs_compress / cs_dupl).
using System.Numerics;

namespace Study.Core.Numerics;

/// <summary>Collects (row, column, value) entries, duplicates summed, and compresses them to a <see cref="CscMatrix{T}"/>.</summary>
public sealed class TripletBuilder<T> where T : INumberBase<T>
{
    private int[] rows;
    private int[] cols;
    private T[] values;

    public TripletBuilder(int rowCount, int colCount, int capacity = 16)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(rowCount);
        ArgumentOutOfRangeException.ThrowIfNegative(colCount);
        capacity = Math.Max(capacity, 1);
        RowCount = rowCount;
        ColCount = colCount;
        rows = new int[capacity];
        cols = new int[capacity];
        values = new T[capacity];
    }

    public int RowCount { get; }
    public int ColCount { get; }

    /// <summary>Number of entries (slots) added so far.</summary>
    public int Count { get; private set; }

    /// <summary>Adds A(row, col) += value and returns the slot number of this entry.</summary>
    public int Add(int row, int col, T value)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row must be in 0..{RowCount - 1}.");
        if ((uint)col >= (uint)ColCount) throw new ArgumentOutOfRangeException(nameof(col), col, $"column must be in 0..{ColCount - 1}.");
        if (Count == rows.Length)
        {
            int grown = (int)Math.Min(Array.MaxLength, 2L * rows.Length);
            Array.Resize(ref rows, grown);
            Array.Resize(ref cols, grown);
            Array.Resize(ref values, grown);
        }
        rows[Count] = row;
        cols[Count] = col;
        values[Count] = value;
        return Count++;
    }

    /// <summary>Compresses the entries; duplicates are summed and rows sorted within each column.</summary>
    public CscMatrix<T> ToCsc() => ToCsc(out _);

    /// <summary>
    /// Compresses the entries and returns, for each slot, the index in the result's Values where that
    /// entry landed. With it <see cref="CscMatrix{T}.Refill"/> re-fills new values into the same pattern.
    /// </summary>
    public CscMatrix<T> ToCsc(out int[] valuePositions)
    {
        int nz = Count, m = RowCount, n = ColCount;
        int[] ti = rows, tj = cols;
        T[] tx = values;

        // Two stable counting sorts (by row, then by column) leave each column's slots in row order,
        // so duplicates sit side by side (the two-transpose trick of Davis 2006, §2.5).
        var byRow = CountingSort(ti, m, nz, null);
        var order = CountingSort(tj, n, nz, byRow);

        var colPtr = new int[n + 1];
        var rowIdx = new int[nz];
        var x = new T[nz];
        valuePositions = new int[nz];
        int unique = 0, s = 0;
        for (int j = 0; j < n; j++)
        {
            colPtr[j] = unique;
            int columnStart = unique;
            for (; s < nz && tj[order[s]] == j; s++)
            {
                int slot = order[s];
                int i = ti[slot];
                if (unique > columnStart && rowIdx[unique - 1] == i)
                {
                    x[unique - 1] += tx[slot];
                }
                else
                {
                    rowIdx[unique] = i;
                    x[unique] = tx[slot];
                    unique++;
                }
                valuePositions[slot] = unique - 1;
            }
        }
        colPtr[n] = unique;
        Array.Resize(ref rowIdx, unique);
        Array.Resize(ref x, unique);
        return new CscMatrix<T>(m, n, colPtr, rowIdx, x);
    }

    // Stable counting sort of slots by key[slot] in 0..range-1; input order is `within` (or 0..nz-1).
    private static int[] CountingSort(int[] key, int range, int nz, int[]? within)
    {
        var next = new int[range];
        for (int s = 0; s < nz; s++) next[key[s]]++;
        CompressedColumn.CumulativeSum(new int[range + 1], next);
        var sorted = new int[nz];
        for (int s = 0; s < nz; s++)
        {
            int slot = within is null ? s : within[s];
            sorted[next[key[slot]]++] = slot;
        }
        return sorted;
    }
}
