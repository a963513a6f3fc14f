// A singular matrix is reported with the column where elimination broke down, never as NaN.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class SingularMatrixTests
{
    [Theory]
    [InlineData(ColumnOrdering.Natural)]
    [InlineData(ColumnOrdering.Amd)]
    public void Empty_column_is_reported_as_singular_with_its_index(ColumnOrdering ordering)
    {
        const int n = 40;
        var full = TestMatrices.RandomReal(n, 3, shuffleRows: true);
        const int emptyColumn = 17;
        var builder = new TripletBuilder<double>(n, n);
        for (int j = 0; j < n; j++)
        {
            if (j == emptyColumn) continue;
            for (int p = full.ColPtr[j]; p < full.ColPtr[j + 1]; p++) builder.Add(full.RowIdx[p], j, full.Values[p]);
        }
        var a = builder.ToCsc();
        var lu = SparseLu<double>.Analyse(a, new LuOptions { Ordering = ordering });

        var error = Assert.Throws<SingularMatrixException>(() => lu.Factor(a));

        Assert.Equal(emptyColumn, error.Column);
        Assert.False(lu.IsFactorised);
        Assert.Throws<InvalidOperationException>(() => lu.Solve(new double[n]));
    }

    [Fact]
    public void Two_equal_columns_are_reported_at_one_of_them()
    {
        // [[1 2 2], [3 4 4], [5 6 6]]: columns 1 and 2 are equal, so rank 2.
        var builder = new TripletBuilder<double>(3, 3);
        double[,] values = { { 1, 2, 2 }, { 3, 4, 4 }, { 5, 6, 6 } };
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++)
                builder.Add(i, j, values[i, j]);
        var a = builder.ToCsc();
        var lu = SparseLu<double>.Analyse(a, new LuOptions { Ordering = ColumnOrdering.Natural });

        bool ok = lu.TryFactor(a, out int column);

        Assert.False(ok);
        Assert.Equal(2, column);
    }

    [Fact]
    public void Refactor_to_singular_values_is_reported_not_solved()
    {
        var builder = new TripletBuilder<double>(2, 2);
        builder.Add(0, 0, 2);
        builder.Add(1, 0, 1);
        builder.Add(0, 1, 1);
        builder.Add(1, 1, 2);
        var a = builder.ToCsc(out int[] positions);
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);

        a.Refill(positions, new double[] { 1, 2, 1, 2 }); // both columns (1, 2)ᵀ

        Assert.False(lu.TryRefactor(a, out int column));
        Assert.InRange(column, 0, 1);
        Assert.Throws<SingularMatrixException>(() => lu.Refactor(a));
    }

    // With no path to earth the admittance matrix is a Laplacian (rows sum to zero); rounding leaves a
    // last pivot near 1e-16 of its column instead of zero, which must still count as singular.
    [Theory]
    [InlineData(5)]
    [InlineData(30)]
    public void Floating_network_admittance_matrix_is_reported_singular(int side)
    {
        var y = TestMatrices.GridAdmittance(side, 4, withShunts: false);
        var lu = SparseLu<System.Numerics.Complex>.Analyse(y);

        Assert.False(lu.TryFactor(y, out int column));
        Assert.InRange(column, 0, side * side - 1);
    }

    [Fact]
    public void Non_finite_entry_is_refused()
    {
        var builder = new TripletBuilder<double>(2, 2);
        builder.Add(0, 0, 1);
        builder.Add(1, 1, double.NaN);
        var a = builder.ToCsc();
        var lu = SparseLu<double>.Analyse(a);

        Assert.Throws<ArgumentException>(() => lu.Factor(a));
    }
}
