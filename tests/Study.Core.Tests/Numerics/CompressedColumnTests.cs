// The storage primitives: column pointers from counts, and the transpose against a dense transpose.
using System.Numerics;
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class CompressedColumnTests
{
    // Worked by hand: counts 2, 0, 3, 1 give columns starting at 0, 2, 2, 5 and 6 entries in all.
    [Fact]
    public void Cumulative_sum_gives_column_starts_and_leaves_them_in_the_counts()
    {
        int[] counts = [2, 0, 3, 1];
        var p = new int[5];

        int total = CompressedColumn.CumulativeSum(p, counts);

        Assert.Equal(6, total);
        Assert.Equal([0, 2, 2, 5, 6], p);
        Assert.Equal([0, 2, 2, 5], counts);
    }

    [Fact]
    public void Cumulative_sum_of_nothing_is_a_single_zero_pointer()
    {
        var p = new int[1] { 7 };
        Assert.Equal(0, CompressedColumn.CumulativeSum(p, []));
        Assert.Equal([0], p);
    }

    // Reference: the definition (Aᵀ)(j, i) = A(i, j), on a dense copy.
    [Theory]
    [InlineData(7, 3, 1)]
    [InlineData(3, 9, 2)]
    [InlineData(40, 40, 3)]
    public void Transpose_matches_the_dense_transpose_with_rows_sorted(int rows, int cols, int seed)
    {
        CscMatrix<Complex> a = RandomRectangular(rows, cols, seed);
        Complex[,] dense = TestMatrices.ToDense(a);

        CscMatrix<Complex> t = a.Transpose();

        Assert.Equal(cols, t.Rows);
        Assert.Equal(rows, t.Cols);
        Complex[,] transposed = TestMatrices.ToDense(t);
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
                Assert.Equal(dense[i, j], transposed[j, i]);
        AssertRowsIncrease(t.ColPtr, t.RowIdx);
    }

    [Fact]
    public void Pattern_transpose_gives_the_same_pattern_as_the_valued_one()
    {
        CscMatrix<Complex> a = RandomRectangular(12, 17, 4);
        CscMatrix<Complex> t = a.Transpose();
        var cp = new int[a.Rows + 1];
        var ci = new int[a.NonZeros];

        CompressedColumn.Transpose(a.ColPtr, a.RowIdx, cp, ci, new int[a.Rows]);

        Assert.Equal(t.ColPtr, cp);
        Assert.Equal(t.RowIdx, ci);
    }

    // Rows given out of order, with a duplicate: two transposes sort them and keep every entry.
    [Fact]
    public void Transposing_twice_sorts_each_column()
    {
        var a = new CscMatrix<double>(4, 2, [0, 4, 6], [3, 0, 2, 0, 1, 0], [1.0, 2, 3, 4, 5, 6]);

        CscMatrix<double> twice = a.Transpose().Transpose();

        Assert.Equal([0, 4, 6], twice.ColPtr);
        Assert.Equal([0, 0, 2, 3, 0, 1], twice.RowIdx);
        Assert.Equal(TestMatrices.ToDense(a), TestMatrices.ToDense(twice));
    }

    private static CscMatrix<Complex> RandomRectangular(int rows, int cols, int seed)
    {
        var rng = new Random(seed);
        var builder = new TripletBuilder<Complex>(rows, cols);
        for (int e = 0; e < 2 * (rows + cols); e++)
            builder.Add(rng.Next(rows), rng.Next(cols), new Complex(rng.NextDouble() - 0.5, rng.NextDouble()));
        return builder.ToCsc();
    }

    private static void AssertRowsIncrease(int[] colPtr, int[] rowIdx)
    {
        for (int j = 0; j + 1 < colPtr.Length; j++)
            for (int p = colPtr[j] + 1; p < colPtr[j + 1]; p++)
                Assert.True(rowIdx[p - 1] < rowIdx[p], $"column {j} is not sorted");
    }
}
