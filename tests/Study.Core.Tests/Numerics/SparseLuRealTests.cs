// Real sparse LU against the dense reference on random nonsymmetric systems.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class SparseLuRealTests
{
    // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(10, 1, false)]
    [InlineData(10, 2, true)]
    [InlineData(40, 3, true)]
    [InlineData(100, 4, false)]
    [InlineData(100, 5, true)]
    [InlineData(200, 6, true)]
    [InlineData(300, 7, false)]
    [InlineData(300, 8, true)]
    public void Real_solution_matches_MathNet_dense_LU(int n, int seed, bool shuffleRows)
    {
        var a = TestMatrices.RandomReal(n, seed, shuffleRows);
        var b = TestMatrices.RandomReal(n, seed + 100);
        var expected = DenseReference.Solve(TestMatrices.ToDense(a), b);

        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        var x = (double[])b.Clone();
        lu.Solve(x);

        Assert.True(TestMatrices.RelativeDifference<double>(x, expected) < 1e-10);
    }

    // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(30, 11)]
    [InlineData(150, 12)]
    public void Natural_order_and_plain_partial_pivoting_also_match_MathNet_dense_LU(int n, int seed)
    {
        var a = TestMatrices.RandomReal(n, seed, shuffleRows: true, offDiagonalPerColumn: 6);
        var b = TestMatrices.RandomReal(n, seed + 100);
        var expected = DenseReference.Solve(TestMatrices.ToDense(a), b);

        var lu = SparseLu<double>.Analyse(a, new LuOptions { Ordering = ColumnOrdering.Natural, PivotTolerance = 1 });
        lu.Factor(a);
        lu.Solve(b);

        Assert.True(TestMatrices.RelativeDifference<double>(b, expected) < 1e-10);
    }

    // Reference: MathNet.Numerics dense LU of Aᵀ (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(25, 21)]
    [InlineData(250, 22)]
    public void Transposed_solution_matches_MathNet_dense_LU_of_the_transpose(int n, int seed)
    {
        var a = TestMatrices.RandomReal(n, seed, shuffleRows: true);
        var b = TestMatrices.RandomReal(n, seed + 100);
        var expected = DenseReference.SolveTransposed(TestMatrices.ToDense(a), b);

        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        lu.SolveTransposed(b);

        Assert.True(TestMatrices.RelativeDifference<double>(b, expected) < 1e-10);
    }

    [Fact]
    public void Block_solve_gives_each_column_its_own_solution()
    {
        const int n = 60;
        var a = TestMatrices.RandomReal(n, 31, shuffleRows: true);
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        var b0 = TestMatrices.RandomReal(n, 32);
        var b1 = TestMatrices.RandomReal(n, 33);
        var block = b0.Concat(b1).ToArray();

        lu.Solve(block, 2);
        lu.Solve(b0);
        lu.Solve(b1);

        Assert.Equal(b0, block[..n]);
        Assert.Equal(b1, block[n..]);
    }

    [Fact]
    public void Solution_satisfies_the_system_it_was_solved_for()
    {
        var a = TestMatrices.RandomReal(120, 41, shuffleRows: true);
        var b = TestMatrices.RandomReal(120, 42);
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        var x = (double[])b.Clone();
        lu.Solve(x);

        var ax = new double[120];
        a.Multiply(x, ax);
        Assert.True(TestMatrices.RelativeDifference<double>(ax, b) < 1e-12);
    }
}
