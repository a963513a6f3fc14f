// Values-only refactorisation: reuses the pivot sequence when it can, re-pivots when it must.
using System.Numerics;
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

public class RefactorTests
{
    [Theory]
    [InlineData(50, 1, false)]
    [InlineData(200, 2, false)]
    [InlineData(200, 3, true)]
    public void Refactor_with_new_values_gives_the_same_solution_as_a_fresh_factorisation(int n, int seed, bool shuffleRows)
    {
        var first = TestMatrices.RandomReal(n, seed, shuffleRows);
        var second = TestMatrices.WithPerturbedValues(first, seed + 1);
        var b = TestMatrices.RandomReal(n, seed + 2);

        var lu = SparseLu<double>.Analyse(first);
        lu.Factor(first);
        lu.Refactor(second);
        var x = (double[])b.Clone();
        lu.Solve(x);

        var fresh = SparseLu<double>.Analyse(second);
        fresh.Factor(second);
        var y = (double[])b.Clone();
        fresh.Solve(y);

        Assert.Equal(1, lu.ValueRefactorisations);
        Assert.Equal(1, lu.PivotingFactorisations);
        Assert.True(TestMatrices.RelativeDifference<double>(x, y) < 1e-10);
        // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
        Assert.True(TestMatrices.RelativeDifference<double>(x, DenseReference.Solve(TestMatrices.ToDense(second), b)) < 1e-10);
    }

    [Fact]
    public void Complex_refactor_after_refilling_a_fixed_pattern_matches_MathNet_dense_LU()
    {
        const int side = 12;
        var first = TestMatrices.GridAdmittance(side, 5);
        var builder = new TripletBuilder<Complex>(first.Rows, first.Cols);
        var slotValues = new List<Complex>();
        for (int j = 0; j < first.Cols; j++)
        {
            for (int p = first.ColPtr[j]; p < first.ColPtr[j + 1]; p++)
            {
                // Each stored value split over two slots, as an assembler adding branch by branch would.
                builder.Add(first.RowIdx[p], j, first.Values[p] / 2);
                builder.Add(first.RowIdx[p], j, first.Values[p] / 2);
                slotValues.Add(first.Values[p] * 0.3);
                slotValues.Add(first.Values[p] * 0.5);
            }
        }
        var matrix = builder.ToCsc(out int[] positions);
        var lu = SparseLu<Complex>.Analyse(matrix);
        lu.Factor(matrix);

        matrix.Refill(positions, slotValues.ToArray());
        lu.Refactor(matrix);
        var b = TestMatrices.RandomComplex(side * side, 6);
        var expected = DenseReference.Solve(TestMatrices.ToDense(matrix), b);
        lu.Solve(b);

        Assert.Equal(1, lu.ValueRefactorisations);
        // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
        Assert.True(TestMatrices.RelativeDifference<Complex>(b, expected) < 1e-10);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1e-9)]
    public void Refactor_repivots_when_a_former_pivot_becomes_too_small(double newPivotValue)
    {
        const int n = 150;
        var first = TestMatrices.RandomReal(n, 9, shuffleRows: false);
        var lu = SparseLu<double>.Analyse(first);
        lu.Factor(first);

        // The first pivot is the diagonal of column q[0] (the matrix is diagonally dominant); zero it.
        int c = lu.Symbolic.ColumnOrder[0];
        var values = (double[])first.Values.Clone();
        for (int p = first.ColPtr[c]; p < first.ColPtr[c + 1]; p++)
        {
            if (first.RowIdx[p] == c) values[p] = newPivotValue;
        }
        var second = new CscMatrix<double>(n, n, first.ColPtr, first.RowIdx, values);
        var b = TestMatrices.RandomReal(n, 10);
        // Reference: MathNet.Numerics dense LU (DEVELOPERS.md, Outside references).
        var expected = DenseReference.Solve(TestMatrices.ToDense(second), b);

        lu.Refactor(second);
        lu.Solve(b);

        Assert.Equal(0, lu.ValueRefactorisations);
        Assert.Equal(2, lu.PivotingFactorisations);
        Assert.True(TestMatrices.RelativeDifference<double>(b, expected) < 1e-10);
    }

    [Fact]
    public void Refactor_of_a_different_pattern_factorises_afresh()
    {
        var first = TestMatrices.RandomReal(80, 11, shuffleRows: false);
        var other = TestMatrices.RandomReal(80, 12, shuffleRows: true);
        var b = TestMatrices.RandomReal(80, 13);
        var expected = DenseReference.Solve(TestMatrices.ToDense(other), b);

        var lu = SparseLu<double>.Analyse(first);
        lu.Refactor(first); // no factorisation yet: this one chooses pivots
        lu.Refactor(other);
        lu.Solve(b);

        Assert.Equal(2, lu.PivotingFactorisations);
        Assert.Equal(0, lu.ValueRefactorisations);
        Assert.True(TestMatrices.RelativeDifference<double>(b, expected) < 1e-10);
    }

    [Fact]
    public void Refactor_and_solve_allocate_nothing()
    {
        var a = TestMatrices.RandomComplex(300, 14, shuffleRows: true);
        var lu = SparseLu<Complex>.Analyse(a);
        lu.Factor(a);
        var b = TestMatrices.RandomComplex(300, 15);
        lu.Refactor(a);
        lu.Solve(b); // warm up (first calls may compile)

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int iteration = 0; iteration < 3; iteration++)
        {
            lu.Refactor(a);
            lu.Solve(b);
            lu.SolveTransposed(b);
        }
        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;

        Assert.Equal(4, lu.ValueRefactorisations);
        Assert.Equal(0, allocated);
    }
}
