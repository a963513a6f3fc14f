// The fill-reducing ordering returns a permutation and cuts fill where it should.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class ApproximateMinimumDegreeTests
{
    public static TheoryData<string> Patterns => new() { "grid", "random", "random-shuffled", "dense-row", "diagonal", "tiny" };

    [Theory]
    [MemberData(nameof(Patterns))]
    public void Order_is_a_permutation_of_the_columns(string kind)
    {
        var a = Pattern(kind);

        var order = ApproximateMinimumDegree.Order(a);

        Assert.Equal(a.Cols, order.Length);
        var seen = new bool[a.Cols];
        foreach (int c in order)
        {
            Assert.InRange(c, 0, a.Cols - 1);
            Assert.False(seen[c], $"column {c} appears twice");
            seen[c] = true;
        }
    }

    [Fact]
    public void Empty_matrix_has_an_empty_order()
    {
        var a = new CscMatrix<double>(0, 0, [0], [], []);
        Assert.Empty(ApproximateMinimumDegree.Order(a));
    }

    // A 30×30 five-point grid factorised in natural (banded) order fills the whole band, about 30
    // entries per column in L and in U; minimum degree keeps far fewer (Davis 2006, §7.1).
    [Fact]
    public void Amd_needs_far_less_fill_than_natural_order_on_a_30_by_30_grid()
    {
        var a = TestMatrices.Grid(30);
        var natural = SparseLu<double>.Analyse(a, new LuOptions { Ordering = ColumnOrdering.Natural });
        var amd = SparseLu<double>.Analyse(a, new LuOptions { Ordering = ColumnOrdering.Amd });

        natural.Factor(a);
        amd.Factor(a);

        Assert.True(amd.NonZerosLU < 0.5 * natural.NonZerosLU,
            $"nnz(L+U): AMD {amd.NonZerosLU}, natural {natural.NonZerosLU}");
    }

    [Fact]
    public void Amd_order_factorises_a_grid_with_less_fill_than_a_random_order()
    {
        var a = TestMatrices.Grid(25);
        var shuffled = Enumerable.Range(0, a.Cols).ToArray();
        new Random(1).Shuffle(shuffled);
        var permuted = SymmetricallyPermuted(a, shuffled);

        var amdOnShuffled = SparseLu<double>.Analyse(permuted);
        var naturalOnShuffled = SparseLu<double>.Analyse(permuted, new LuOptions { Ordering = ColumnOrdering.Natural });
        amdOnShuffled.Factor(permuted);
        naturalOnShuffled.Factor(permuted);

        Assert.True(amdOnShuffled.NonZerosLU < 0.25 * naturalOnShuffled.NonZerosLU,
            $"nnz(L+U): AMD {amdOnShuffled.NonZerosLU}, random order {naturalOnShuffled.NonZerosLU}");
    }

    private static CscMatrix<double> Pattern(string kind)
    {
        switch (kind)
        {
            case "grid": return TestMatrices.Grid(20);
            case "random": return TestMatrices.RandomReal(300, 1, shuffleRows: false);
            case "random-shuffled": return TestMatrices.RandomReal(300, 2, shuffleRows: true, offDiagonalPerColumn: 8);
            case "dense-row":
            {
                // One row and column touching everything: ordered last instead of slowing the degree updates.
                var builder = new TripletBuilder<double>(400, 400);
                for (int i = 0; i < 400; i++)
                {
                    builder.Add(i, i, 4);
                    if (i > 0)
                    {
                        builder.Add(0, i, 1);
                        builder.Add(i, 0, 1);
                    }
                    if (i > 1) builder.Add(i, i - 1, 1);
                }
                return builder.ToCsc();
            }
            case "diagonal":
            {
                var builder = new TripletBuilder<double>(50, 50);
                for (int i = 0; i < 50; i++) builder.Add(i, i, 1);
                return builder.ToCsc();
            }
            default:
            {
                var builder = new TripletBuilder<double>(2, 2);
                builder.Add(0, 1, 1);
                builder.Add(1, 0, 1);
                return builder.ToCsc();
            }
        }
    }

    // B = P·A·Pᵀ with new index k for old index order[k].
    private static CscMatrix<double> SymmetricallyPermuted(CscMatrix<double> a, int[] order)
    {
        var inverse = new int[order.Length];
        for (int k = 0; k < order.Length; k++) inverse[order[k]] = k;
        var builder = new TripletBuilder<double>(a.Rows, a.Cols);
        for (int j = 0; j < a.Cols; j++)
            for (int p = a.ColPtr[j]; p < a.ColPtr[j + 1]; p++)
                builder.Add(inverse[a.RowIdx[p]], inverse[j], a.Values[p]);
        return builder.ToCsc();
    }
}
