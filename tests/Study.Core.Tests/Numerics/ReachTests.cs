// The reach of a sparse triangular solve and the row subtree of the elimination tree, each against
// a brute-force computation on a dense copy of the graph.
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class ReachTests
{
    // Reference: reachability by repeated sweeps over a dense adjacency matrix (the definition).
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void Reach_in_the_graph_of_L_is_the_brute_force_reachable_set_in_topological_order(int seed)
    {
        var rng = new Random(seed);
        const int n = 60;
        CscMatrix<double> l = RandomLower(n, rng);
        bool[,] edge = Edges(n, l.ColPtr, l.ColPtr.AsSpan(1), l.RowIdx);
        var xi = new int[n];
        var pstack = new int[n];
        var marks = new int[n];
        int stamp = 0;

        for (int trial = 0; trial < 20; trial++)
        {
            int[] sources = [rng.Next(n), rng.Next(n), rng.Next(n)];
            int top = Reach.Of(new ColumnGraph(l.ColPtr, l.RowIdx), sources, default, xi, pstack, marks, ++stamp);

            AssertTopologicalReach(edge, sources, xi[top..]);
        }
    }

    // A pivoting factorisation's view: rows renamed on the way in, nodes without a column yet, and
    // columns whose search stops early (pruned).
    [Fact]
    public void Reach_follows_renamed_sources_column_map_and_column_ends()
    {
        var rng = new Random(4);
        const int n = 50;
        CscMatrix<double> l = RandomLower(n, rng);
        int[] columnOf = Enumerable.Range(0, n).Select(j => j % 5 == 0 ? -1 : j).ToArray();
        int[] end = Enumerable.Range(0, n).Select(j => j % 3 == 0 ? (l.ColPtr[j] + l.ColPtr[j + 1]) / 2 : l.ColPtr[j + 1]).ToArray();
        var edge = new bool[n, n];
        for (int j = 0; j < n; j++)
        {
            if (columnOf[j] < 0) continue;
            for (int p = l.ColPtr[j]; p < end[j]; p++) edge[j, l.RowIdx[p]] = true;
        }
        int[] rename = Enumerable.Range(0, n).Reverse().ToArray();
        int[] rows = [3, 17, 40];
        var xi = new int[n];

        int top = Reach.Of(new ColumnGraph(l.ColPtr, end, l.RowIdx, columnOf), rows, rename, xi, new int[n], new int[n], 1);

        AssertTopologicalReach(edge, rows.Select(r => rename[r]).ToArray(), xi[top..]);
    }

    // Reference: symbolic Cholesky by elimination on a dense boolean copy (Davis 2006, §4.1: eliminating
    // node k joins its remaining neighbours), whose row k is then compared with the row subtree.
    [Theory]
    [InlineData(5)]
    [InlineData(6)]
    public void Row_subtree_is_the_brute_force_row_of_the_Cholesky_pattern(int seed)
    {
        const int n = 70;
        var a = TestMatrices.RandomReal(n, seed, shuffleRows: false, offDiagonalPerColumn: 2);
        var c = SymmetricPattern.OfSum(n, a.ColPtr, a.RowIdx);
        int[] parent = EliminationTree.Parents(c);
        bool[,] filled = CholeskyPattern(n, c);
        var s = new int[n];
        var marks = new int[n];

        for (int k = 0; k < n; k++)
        {
            int top = EliminationTree.Reach(k, c.RowIdx.AsSpan(c.ColPtr[k], c.ColPtr[k + 1] - c.ColPtr[k]), default, parent, s, marks, k + 1);

            int[] row = s[top..];
            Assert.Equal(Enumerable.Range(0, k).Where(j => filled[k, j]), row.Order());
            // Each node before its parent, as the solve with L(0:k-1, 0:k-1) needs.
            for (int t = 0; t < row.Length; t++)
            {
                int up = Array.IndexOf(row, parent[row[t]]);
                Assert.True(up < 0 || up > t, $"row {k}: {row[t]} comes after its parent");
            }
        }
    }

    [Fact]
    public void Row_subtree_reports_a_tree_that_does_not_hold_the_entry()
    {
        int[] noEdges = [-1, -1, -1];
        Assert.Equal(-1, EliminationTree.Reach(2, [0], default, noEdges, new int[3], new int[3], 1));
    }

    // Strictly lower triangular pattern (the graph of a unit L): about three entries per column.
    private static CscMatrix<double> RandomLower(int n, Random rng)
    {
        var builder = new TripletBuilder<double>(n, n);
        for (int j = 0; j < n - 1; j++)
            for (int e = 0; e < 3; e++) builder.Add(rng.Next(j + 1, n), j, 1.0);
        return builder.ToCsc();
    }

    private static bool[,] Edges(int n, ReadOnlySpan<int> start, ReadOnlySpan<int> end, int[] index)
    {
        var edge = new bool[n, n];
        for (int j = 0; j < n; j++)
            for (int p = start[j]; p < end[j]; p++) edge[j, index[p]] = true;
        return edge;
    }

    private static void AssertTopologicalReach(bool[,] edge, int[] sources, int[] found)
    {
        int n = edge.GetLength(0);
        var reached = new bool[n];
        foreach (int s in sources) reached[s] = true;
        for (bool grew = true; grew;)
        {
            grew = false;
            for (int j = 0; j < n; j++)
                for (int i = 0; i < n; i++)
                    if (reached[j] && edge[j, i] && !reached[i]) grew = reached[i] = true;
        }
        Assert.Equal(Enumerable.Range(0, n).Where(i => reached[i]), found.Order());
        var position = new int[n];
        for (int t = 0; t < found.Length; t++) position[found[t]] = t;
        foreach (int j in found)
            foreach (int i in found)
                if (edge[j, i]) Assert.True(position[j] < position[i], $"{j} -> {i} is out of topological order");
    }

    private static bool[,] CholeskyPattern(int n, SymmetricPattern c)
    {
        var adjacent = new bool[n, n];
        for (int j = 0; j < n; j++)
            for (int p = c.ColPtr[j]; p < c.ColPtr[j + 1]; p++) adjacent[c.RowIdx[p], j] = true;
        for (int k = 0; k < n; k++)
            for (int i = k + 1; i < n; i++)
            {
                if (!adjacent[i, k]) continue;
                for (int j = k + 1; j < n; j++)
                    if (adjacent[j, k]) adjacent[i, j] = adjacent[j, i] = true;
            }
        return adjacent;
    }
}
