// Complex sparse LU against the dense reference: random systems and a grid admittance matrix.
using System.Numerics;
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class SparseLuComplexTests
{
    // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(10, 1, true)]
    [InlineData(50, 2, false)]
    [InlineData(120, 3, true)]
    [InlineData(300, 4, true)]
    public void Complex_solution_matches_MathNet_dense_LU(int n, int seed, bool shuffleRows)
    {
        var a = TestMatrices.RandomComplex(n, seed, shuffleRows);
        var b = TestMatrices.RandomComplex(n, seed + 100);
        var expected = DenseReference.Solve(TestMatrices.ToDense(a), b);

        var lu = SparseLu<Complex>.Analyse(a);
        lu.Factor(a);
        lu.Solve(b);

        Assert.True(TestMatrices.RelativeDifference<Complex>(b, expected) < 1e-10);
    }

    // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(6, 1)]
    [InlineData(16, 2)]
    public void Grid_admittance_matrix_solution_matches_MathNet_dense_LU(int side, int seed)
    {
        var y = TestMatrices.GridAdmittance(side, seed);
        var currents = TestMatrices.RandomComplex(side * side, seed + 100);
        var expected = DenseReference.Solve(TestMatrices.ToDense(y), currents);

        var lu = SparseLu<Complex>.Analyse(y);
        lu.Factor(y);
        lu.Solve(currents);

        Assert.True(TestMatrices.RelativeDifference<Complex>(currents, expected) < 1e-10);
    }

    // Reference: MathNet.Numerics dense LU of Aᵀ (DEVELOPERS.md, Outside references).
    [Fact]
    public void Complex_transposed_solution_matches_MathNet_dense_LU_of_the_transpose()
    {
        var a = TestMatrices.RandomComplex(80, 7, shuffleRows: true);
        var b = TestMatrices.RandomComplex(80, 8);
        var expected = DenseReference.SolveTransposed(TestMatrices.ToDense(a), b);

        var lu = SparseLu<Complex>.Analyse(a);
        lu.Factor(a);
        lu.SolveTransposed(b);

        Assert.True(TestMatrices.RelativeDifference<Complex>(b, expected) < 1e-10);
    }
}
