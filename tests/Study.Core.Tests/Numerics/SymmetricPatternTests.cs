// The graph of A + Aᵀ that ordering and symbolic analysis work on.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class SymmetricPatternTests
{
    [Fact]
    public void Sum_pattern_lists_each_neighbour_once_and_drops_the_diagonal()
    {
        // a(1,0) and a(0,1) both present, a(2,0) stored twice, a one-sided a(1,2), a diagonal a(1,1).
        var a = new CscMatrix<double>(3, 3, [0, 3, 5, 6], [1, 2, 2, 0, 1, 1], [1.0, 1, 1, 1, 1, 1]);
        var s = SymmetricPattern.OfSum(3, a.ColPtr, a.RowIdx);

        Assert.Equal(new[] { 1, 2 }, Neighbours(s, 0));
        Assert.Equal(new[] { 0, 2 }, Neighbours(s, 1));
        Assert.Equal(new[] { 0, 1 }, Neighbours(s, 2));
        Assert.Equal(6, s.NonZeros);
    }

    [Fact]
    public void Permuted_pattern_renames_the_nodes()
    {
        var a = TestMatrices.Grid(3);
        var s = SymmetricPattern.OfSum(9, a.ColPtr, a.RowIdx);
        int[] order = [4, 0, 1, 2, 3, 5, 6, 7, 8]; // the centre node first

        var p = s.Permute(order);

        // The centre of a 3×3 grid touches the four edge midpoints 1, 3, 5, 7, now 2, 4, 5, 7.
        Assert.Equal(new[] { 2, 4, 5, 7 }, Neighbours(p, 0));
    }

    private static int[] Neighbours(SymmetricPattern s, int j)
    {
        var list = s.RowIdx[s.ColPtr[j]..s.ColPtr[j + 1]];
        Array.Sort(list);
        return list;
    }
}
