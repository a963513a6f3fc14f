// Selected entries of A⁻¹ from the factors (the fault scan's Z-bus entries) against a dense inverse.
using System.Numerics;
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class InverseEntriesTests
{
    // Reference: MathNet.Numerics dense inverse (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(8, 1, false)]
    [InlineData(40, 2, true)]
    [InlineData(150, 3, true)]
    public void Real_inverse_entries_match_MathNet_dense_inverse(int n, int seed, bool shuffleRows)
    {
        var a = TestMatrices.RandomReal(n, seed, shuffleRows);
        double[,] inverse = DenseReference.Inverse(TestMatrices.ToDense(a));
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);
        AssertEveryColumn(lu, n, (r, c) => inverse[r, c]);
    }

    // Reference: MathNet.Numerics dense inverse (DEVELOPERS.md, Outside references).
    [Theory]
    [InlineData(30, 4, true)]
    [InlineData(120, 5, false)]
    public void Complex_inverse_entries_match_MathNet_dense_inverse(int n, int seed, bool shuffleRows)
    {
        var a = TestMatrices.RandomComplex(n, seed, shuffleRows);
        Complex[,] inverse = DenseReference.Inverse(TestMatrices.ToDense(a));
        var lu = SparseLu<Complex>.Analyse(a);
        lu.Factor(a);
        AssertEveryColumn(lu, n, (r, c) => inverse[r, c]);
    }

    // Reference: MathNet.Numerics dense inverse (DEVELOPERS.md, Outside references).
    [Fact]
    public void Grid_admittance_diagonal_after_refactor_matches_MathNet_dense_inverse()
    {
        var y = TestMatrices.GridAdmittance(7, 6);
        var lu = SparseLu<Complex>.Analyse(y);
        lu.Factor(y);
        _ = lu.InverseEntries(0, [0]);
        var changed = TestMatrices.WithPerturbedValues(y, 7);
        lu.Refactor(changed);
        Complex[,] inverse = DenseReference.Inverse(TestMatrices.ToDense(changed));
        int n = y.Cols;
        for (int k = 0; k < n; k++)
        {
            Complex z = lu.InverseEntries(k, [k])[0];
            Assert.True((z - inverse[k, k]).Magnitude <= 1e-10 * inverse[k, k].Magnitude, $"Z({k},{k})");
        }
    }

    // Reference: MathNet.Numerics dense inverse. A solve in between must not disturb the entries
    // (they once shared the solve's work vector and came out wrong after one).
    [Fact]
    public void Inverse_entries_after_a_solve_match_MathNet_dense_inverse()
    {
        const int n = 40;
        var a = TestMatrices.RandomReal(n, 2, shuffleRows: true);
        double[,] inverse = DenseReference.Inverse(TestMatrices.ToDense(a));
        var lu = SparseLu<double>.Analyse(a);
        lu.Factor(a);

        lu.Solve(TestMatrices.RandomReal(n, 9));
        lu.SolveTransposed(TestMatrices.RandomReal(n, 10));

        AssertEveryColumn(lu, n, (r, c) => inverse[r, c]);
    }

    [Fact]
    public void A_row_out_of_range_is_refused_and_leaves_later_entries_right()
    {
        var a = TestMatrices.RandomComplex(30, 4, shuffleRows: true);
        Complex[,] inverse = DenseReference.Inverse(TestMatrices.ToDense(a));
        var lu = SparseLu<Complex>.Analyse(a);
        lu.Factor(a);

        Assert.Throws<ArgumentOutOfRangeException>(() => lu.InverseEntries(3, [1, 30]));

        AssertEveryColumn(lu, 30, (r, c) => inverse[r, c]);
    }

    private static void AssertEveryColumn<T>(SparseLu<T> lu, int n, Func<int, int, T> expected) where T : INumberBase<T>
    {
        int[] rows = Enumerable.Range(0, n).Reverse().ToArray();
        double scale = 0;
        for (int c = 0; c < n; c++) for (int r = 0; r < n; r++) scale = Math.Max(scale, TestMatrices.Magnitude(expected(r, c)));
        for (int c = 0; c < n; c++)
        {
            T[] values = lu.InverseEntries(c, rows);
            for (int t = 0; t < n; t++)
                Assert.True(TestMatrices.Magnitude(values[t] - expected(rows[t], c)) <= 1e-10 * scale, $"({rows[t]}, {c})");
        }
    }
}

file static class InverseEntriesExtensions
{
    public static T[] InverseEntries<T>(this SparseLu<T> lu, int column, int[] rows) where T : INumberBase<T>
    {
        var values = new T[rows.Length];
        lu.InverseEntries(column, rows, values);
        return values;
    }
}
