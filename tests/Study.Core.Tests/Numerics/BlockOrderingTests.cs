// The block ordering for Jacobians: a permutation that keeps the rows of each block together.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class BlockOrderingTests
{
    [Theory]
    [InlineData(6)]
    [InlineData(15)]
    public void Block_order_is_a_permutation_with_each_block_contiguous(int side)
    {
        // A 2×2-block matrix shaped like a load-flow Jacobian: rows k and m + k are bus k.
        var grid = TestMatrices.Grid(side);
        int m = grid.Cols;
        var builder = new TripletBuilder<double>(2 * m, 2 * m, 4 * grid.NonZeros);
        for (int j = 0; j < m; j++)
            for (int p = grid.ColPtr[j]; p < grid.ColPtr[j + 1]; p++)
            {
                int i = grid.RowIdx[p];
                builder.Add(i, j, grid.Values[p]);
                builder.Add(i, m + j, 0.5);
                builder.Add(m + i, j, -0.5);
                builder.Add(m + i, m + j, grid.Values[p]);
            }
        var a = builder.ToCsc(out _);
        var blockOf = new int[2 * m];
        for (int k = 0; k < m; k++) blockOf[k] = blockOf[m + k] = k;

        int[] q = BlockOrdering.Order(a, m, blockOf);

        Assert.Equal(Enumerable.Range(0, 2 * m), q.Order());
        for (int t = 0; t < m; t++) Assert.Equal(blockOf[q[2 * t]], blockOf[q[2 * t + 1]]);
        var lu = new SparseLu<double>(LuSymbolic.Analyse(a, q));
        lu.Factor(a);
        var b = TestMatrices.RandomReal(2 * m, 3);
        var expected = DenseReference.Solve(TestMatrices.ToDense(a), b);
        lu.Solve(b);
        Assert.True(TestMatrices.RelativeDifference<double>(b, expected) < 1e-10);
    }

    [Fact]
    public void A_given_order_that_is_not_a_permutation_is_refused()
    {
        var a = TestMatrices.Grid(3);
        Assert.Throws<ArgumentException>(() => LuSymbolic.Analyse(a, [0, 1, 2, 3, 4, 5, 6, 7, 7]));
    }
}
