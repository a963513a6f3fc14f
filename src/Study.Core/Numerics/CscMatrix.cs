// Compressed-column sparse storage, the one matrix form every Numerics routine reads directly
// (Davis 2006, §2.2). Plain arrays so hot loops can copy them into locals.
using System.Numerics;

namespace Study.Core.Numerics;

/// <summary>A sparse matrix in compressed-column form over a real or complex scalar.</summary>
/// <remarks>
/// Column j holds entries RowIdx[ColPtr[j] .. ColPtr[j+1]-1] with values at the same positions in
/// Values. Row indices need not be sorted; duplicates are allowed and mean their sum. Explicit zeros
/// are kept, so a pattern built once stays fixed while values change (Newton iterations).
/// </remarks>
public sealed class CscMatrix<T> where T : INumberBase<T>
{
    public CscMatrix(int rows, int cols, int[] colPtr, int[] rowIdx, T[] values)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(rows);
        ArgumentOutOfRangeException.ThrowIfNegative(cols);
        ArgumentNullException.ThrowIfNull(colPtr);
        ArgumentNullException.ThrowIfNull(rowIdx);
        ArgumentNullException.ThrowIfNull(values);
        if (colPtr.Length != cols + 1 || colPtr[0] != 0)
            throw new ArgumentException("colPtr must have cols + 1 entries starting at 0.", nameof(colPtr));
        for (int j = 0; j < cols; j++)
        {
            if (colPtr[j + 1] < colPtr[j])
                throw new ArgumentException($"colPtr decreases at column {j}.", nameof(colPtr));
        }
        int nnz = colPtr[cols];
        if (rowIdx.Length < nnz) throw new ArgumentException("rowIdx is shorter than colPtr[cols].", nameof(rowIdx));
        if (values.Length < nnz) throw new ArgumentException("values is shorter than colPtr[cols].", nameof(values));
        for (int p = 0; p < nnz; p++)
        {
            if ((uint)rowIdx[p] >= (uint)rows)
                throw new ArgumentException($"row index {rowIdx[p]} at position {p} is outside 0..{rows - 1}.", nameof(rowIdx));
        }
        Rows = rows;
        Cols = cols;
        ColPtr = colPtr;
        RowIdx = rowIdx;
        Values = values;
    }

    public int Rows { get; }
    public int Cols { get; }
    public int[] ColPtr { get; }
    public int[] RowIdx { get; }
    public T[] Values { get; }

    /// <summary>Number of stored entries (explicit zeros and duplicates included).</summary>
    public int NonZeros => ColPtr[Cols];

    /// <summary>y = A·x (Davis 2006, §2.3, cs_gaxpy with y cleared first).</summary>
    public void Multiply(ReadOnlySpan<T> x, Span<T> y)
    {
        if (x.Length != Cols) throw new ArgumentException($"x has {x.Length} entries, the matrix {Cols} columns.", nameof(x));
        if (y.Length != Rows) throw new ArgumentException($"y has {y.Length} entries, the matrix {Rows} rows.", nameof(y));
        int[] ap = ColPtr, ai = RowIdx;
        T[] ax = Values;
        y.Clear();
        for (int j = 0; j < Cols; j++)
        {
            T xj = x[j];
            for (int p = ap[j]; p < ap[j + 1]; p++) y[ai[p]] += ax[p] * xj;
        }
    }

    /// <summary>Aᵀ (plain transpose, no conjugation), rows sorted in each column (Davis 2006, §2.5, cs_transpose).</summary>
    public CscMatrix<T> Transpose()
    {
        int nnz = NonZeros;
        var cp = new int[Rows + 1];
        var ci = new int[nnz];
        var cx = new T[nnz];
        CompressedColumn.Transpose<T>(ColPtr, RowIdx.AsSpan(0, nnz), Values.AsSpan(0, nnz), cp, ci, cx, new int[Rows]);
        return new CscMatrix<T>(Cols, Rows, cp, ci, cx);
    }

    /// <summary>
    /// Overwrites Values from per-slot values through a map made by <see cref="TripletBuilder{T}.ToCsc(out int[])"/>:
    /// Values is cleared, then slotValues[s] is added at valuePositions[s]. No allocation, so a Jacobian
    /// can be re-filled into its fixed pattern every iteration.
    /// </summary>
    public void Refill(ReadOnlySpan<int> valuePositions, ReadOnlySpan<T> slotValues)
    {
        if (valuePositions.Length != slotValues.Length)
            throw new ArgumentException("one value is needed per slot.", nameof(slotValues));
        T[] ax = Values;
        Array.Clear(ax, 0, NonZeros);
        for (int s = 0; s < valuePositions.Length; s++) ax[valuePositions[s]] += slotValues[s];
    }

    /// <summary>True when both matrices have the same size and the same stored pattern, entry for entry.</summary>
    public bool HasSamePattern(CscMatrix<T> other)
    {
        ArgumentNullException.ThrowIfNull(other);
        if (Rows != other.Rows || Cols != other.Cols || NonZeros != other.NonZeros) return false;
        return ColPtr.AsSpan().SequenceEqual(other.ColPtr)
            && RowIdx.AsSpan(0, NonZeros).SequenceEqual(other.RowIdx.AsSpan(0, NonZeros));
    }
}
