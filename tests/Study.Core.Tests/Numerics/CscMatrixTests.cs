// Compressed-column storage, assembly from triplets, products and transposes.
using System.Numerics;
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class CscMatrixTests
{
    [Fact]
    public void Triplets_compress_to_sorted_columns_with_duplicates_summed()
    {
        var builder = new TripletBuilder<double>(3, 2);
        builder.Add(2, 0, 1.0);
        builder.Add(0, 0, 2.0);
        builder.Add(2, 0, 3.0);
        builder.Add(1, 1, 4.0);

        var a = builder.ToCsc(out int[] positions);

        Assert.Equal([0, 2, 3], a.ColPtr);
        Assert.Equal([0, 2, 1], a.RowIdx);
        Assert.Equal([2.0, 4.0, 4.0], a.Values);
        Assert.Equal([1, 0, 1, 2], positions);
    }

    [Fact]
    public void Refill_puts_new_slot_values_into_the_same_pattern()
    {
        var builder = new TripletBuilder<Complex>(2, 2);
        builder.Add(0, 0, 1);
        builder.Add(1, 0, 1);
        builder.Add(0, 0, 1);
        builder.Add(1, 1, 1);
        var a = builder.ToCsc(out int[] positions);

        a.Refill(positions, new Complex[] { new(1, 1), 2, new(0, -3), 5 });

        Assert.Equal(new Complex[] { new(1, -2), 2, 5 }, a.Values);
    }

    [Fact]
    public void Multiply_matches_the_dense_product()
    {
        var a = TestMatrices.RandomComplex(40, 3, shuffleRows: true);
        var x = TestMatrices.RandomComplex(40, 4);
        var dense = TestMatrices.ToDense(a);
        var expected = new Complex[40];
        for (int i = 0; i < 40; i++)
            for (int j = 0; j < 40; j++)
                expected[i] += dense[i, j] * x[j];

        var y = new Complex[40];
        a.Multiply(x, y);

        Assert.True(TestMatrices.RelativeDifference<Complex>(y, expected) < 1e-14);
    }

    [Fact]
    public void Transpose_swaps_rows_and_columns()
    {
        var builder = new TripletBuilder<double>(2, 3);
        builder.Add(0, 2, 7);
        builder.Add(1, 0, 5);
        builder.Add(1, 2, 6);
        var a = builder.ToCsc();

        var t = a.Transpose();

        Assert.Equal(3, t.Rows);
        Assert.Equal(2, t.Cols);
        var dense = TestMatrices.ToDense(t);
        Assert.Equal(new double[,] { { 0, 5 }, { 0, 0 }, { 7, 6 } }, dense);
    }

    [Fact]
    public void Out_of_range_row_is_refused()
    {
        Assert.Throws<ArgumentException>(() => new CscMatrix<double>(2, 1, [0, 1], [2], [1.0]));
        Assert.Throws<ArgumentOutOfRangeException>(() => new TripletBuilder<double>(2, 2).Add(0, 2, 1.0));
    }
}
