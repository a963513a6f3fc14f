// First factorisation of a structurally symmetric matrix on its diagonal, and its fall-back to pivoting.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class DiagonalFactorTests
{
    [Fact]
    public void Diagonally_dominant_grid_keeps_the_symbolic_fill_and_matches_MathNet_dense_LU()
    {
        var a = TestMatrices.Grid(15);
        var b = TestMatrices.RandomReal(a.Rows, 7);
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        var x = (double[])b.Clone();
        lu.Solve(x);

        // Diagonal pivots on a symmetric pattern: exactly the Cholesky fill the analysis counted.
        Assert.Equal(lu.Symbolic.EstimatedNonZerosL + lu.Symbolic.EstimatedNonZerosU - a.Rows, lu.NonZerosLU);
        Assert.Equal(1, lu.PivotingFactorisations);
        Assert.True(TestMatrices.RelativeDifference<double>(x, DenseReference.Solve(TestMatrices.ToDense(a), b)) < 1e-10);
    }

    [Fact]
    public void Small_diagonal_on_a_symmetric_pattern_falls_back_to_pivoting_and_matches_MathNet_dense_LU()
    {
        // Symmetric pattern, but the diagonal is far below PivotTolerance of its column.
        var g = TestMatrices.Grid(10);
        var values = (double[])g.Values.Clone();
        for (int j = 0; j < g.Cols; j++)
        {
            for (int p = g.ColPtr[j]; p < g.ColPtr[j + 1]; p++)
            {
                if (g.RowIdx[p] == j) values[p] = j % 3 == 0 ? 1e-4 : 4.1;
            }
        }
        var a = new CscMatrix<double>(g.Rows, g.Cols, g.ColPtr, g.RowIdx, values);
        var b = TestMatrices.RandomReal(a.Rows, 8);
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        var x = (double[])b.Clone();
        lu.Solve(x);

        Assert.True(TestMatrices.RelativeDifference<double>(x, DenseReference.Solve(TestMatrices.ToDense(a), b)) < 1e-10);
    }

    [Fact]
    public void Unsymmetric_pattern_uses_the_pivoting_factorisation_and_matches_MathNet_dense_LU()
    {
        var a = TestMatrices.RandomReal(120, 5, shuffleRows: true);
        var b = TestMatrices.RandomReal(a.Rows, 9);
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        var x = (double[])b.Clone();
        lu.Solve(x);

        Assert.True(TestMatrices.RelativeDifference<double>(x, DenseReference.Solve(TestMatrices.ToDense(a), b)) < 1e-10);
    }

    // A symmetric matrix other than the one analysed: with links removed its pattern lies inside the
    // analysed fill (factorised on the diagonal with some stored zeros); with a long link added it
    // does not (the pivoting factorisation finds its pattern). Both against MathNet.Numerics dense LU.
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void A_symmetric_pattern_other_than_the_analysed_one_matches_MathNet_dense_LU(bool addLongLink)
    {
        const int side = 9;
        int n = side * side;
        var analysed = TestMatrices.Grid(side);
        var builder = new TripletBuilder<double>(n, n);
        for (int j = 0; j < n; j++)
        {
            for (int p = analysed.ColPtr[j]; p < analysed.ColPtr[j + 1]; p++)
            {
                int i = analysed.RowIdx[p];
                if (!addLongLink && i != j && (i + j) % 7 == 0) continue; // drop both halves of a link
                builder.Add(i, j, analysed.Values[p]);
            }
        }
        if (addLongLink)
        {
            builder.Add(0, n - 1, -0.5);
            builder.Add(n - 1, 0, -0.5);
        }
        var a = builder.ToCsc();
        var b = TestMatrices.RandomReal(n, 11);
        var lu = SparseLu<double>.Analyse(analysed);

        lu.Factor(a);
        var x = (double[])b.Clone();
        lu.Solve(x);

        Assert.True(TestMatrices.RelativeDifference<double>(x, DenseReference.Solve(TestMatrices.ToDense(a), b)) < 1e-10);
    }
}
