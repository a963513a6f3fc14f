// The symbolic analysis sizes L and U before any numbers are seen.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class LuSymbolicTests
{
    // On a structurally symmetric, diagonally dominant matrix every pivot stays on the diagonal, so
    // L and U have exactly the Cholesky pattern the column counts predict (Davis 2006, §4.5).
    [Theory]
    [InlineData(ColumnOrdering.Natural)]
    [InlineData(ColumnOrdering.Amd)]
    public void Estimated_factor_sizes_are_exact_when_pivots_stay_on_the_diagonal(ColumnOrdering ordering)
    {
        var a = TestMatrices.Grid(24);
        var lu = SparseLu<double>.Analyse(a, new LuOptions { Ordering = ordering });

        lu.Factor(a);

        Assert.Equal(lu.Symbolic.EstimatedNonZerosL, lu.NonZerosL);
        Assert.Equal(lu.Symbolic.EstimatedNonZerosU, lu.NonZerosU);
    }

    // Elimination on a dense boolean copy of the graph of A + Aᵀ, the textbook definition of fill
    // (Davis 2006, §4.1: eliminating node k joins all its remaining neighbours).
    [Theory]
    [InlineData(ColumnOrdering.Natural, 1)]
    [InlineData(ColumnOrdering.Amd, 2)]
    [InlineData(ColumnOrdering.Amd, 3)]
    public void Estimated_nonzeros_equal_brute_force_symbolic_elimination(ColumnOrdering ordering, int seed)
    {
        var a = TestMatrices.RandomReal(120, seed, shuffleRows: true, offDiagonalPerColumn: 2);
        var symbolic = LuSymbolic.Analyse(a, ordering);
        int n = a.Cols;
        int[] q = symbolic.ColumnOrder;
        var position = new int[n];
        for (int k = 0; k < n; k++) position[q[k]] = k;
        var adjacent = new bool[n, n];
        for (int j = 0; j < n; j++)
        {
            for (int p = a.ColPtr[j]; p < a.ColPtr[j + 1]; p++)
            {
                int r = position[a.RowIdx[p]], c = position[j];
                adjacent[r, c] = adjacent[c, r] = true;
            }
        }

        long lower = 0;
        for (int k = 0; k < n; k++)
        {
            lower++;
            for (int i = k + 1; i < n; i++)
            {
                if (!adjacent[i, k]) continue;
                lower++;
                for (int j = k + 1; j < n; j++)
                {
                    if (adjacent[k, j]) adjacent[i, j] = true;
                }
            }
        }

        Assert.Equal(lower, symbolic.EstimatedNonZerosL);
    }

    [Fact]
    public void Analysis_needs_a_square_matrix()
    {
        var a = new CscMatrix<double>(2, 1, [0, 1], [1], [1.0]);
        Assert.Throws<ArgumentException>(() => LuSymbolic.Analyse(a));
    }
}
