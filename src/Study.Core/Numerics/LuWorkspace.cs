// The work arrays of one sparse LU, allocated once per analysis and passed to every phase, so
// factorisation, refactorisation, solves and inverse entries allocate nothing in their loops
// (as CSparse's routines are handed theirs, Davis 2006).
using System.Numerics;

namespace Study.Core.Numerics;

/// <summary>Workspace of a <see cref="SparseLu{T}"/> of order n.</summary>
/// <remarks>
/// X and W are kept all zero between uses: each routine clears exactly the entries it touched, so
/// none of them pays O(n) per column. Nothing else here carries meaning from one call to the next.
/// </remarks>
internal sealed class LuWorkspace<T> where T : INumberBase<T>
{
    private int stamp;

    public LuWorkspace(int n)
    {
        X = new T[n];
        W = new T[n];
        Dense = new T[n];
        Nodes = new int[n];
        SecondNodes = new int[n];
        Stack = new int[n];
        Marks = new int[n];
        Pointers = new int[n + 1];
        RowPivot = new int[n];
        SearchEnd = new int[n];
    }

    /// <summary>Dense accumulator of one column of L and U, or of L⁻¹·e for inverse entries; all zero between uses.</summary>
    public T[] X { get; }

    /// <summary>Second accumulator, for U⁻ᵀ·e while X holds L⁻¹·e; all zero between uses.</summary>
    public T[] W { get; }

    /// <summary>The full vector of the triangular solves (no invariant).</summary>
    public T[] Dense { get; }

    /// <summary>Output of a reach (its front doubles as the search stack), or of a row subtree.</summary>
    public int[] Nodes { get; }

    /// <summary>A second node list, for a second reach kept beside the first.</summary>
    public int[] SecondNodes { get; }

    /// <summary>Resume positions of the depth-first search; counts of a transpose.</summary>
    public int[] Stack { get; }

    /// <summary>Visit marks: marks[i] == a stamp from <see cref="NewStamp"/> means visited in that search.</summary>
    public int[] Marks { get; }

    /// <summary>Column pointers (n + 1) of a pattern being built: Aᵀ, or U without its diagonal.</summary>
    public int[] Pointers { get; }

    /// <summary>Row indices of the pattern Aᵀ, grown on demand by <see cref="PatternOfSize"/>.</summary>
    public int[] Pattern { get; private set; } = [];

    /// <summary>During a pivoting factorisation: the pivot step of each row (rows in symbolic order), -1 until chosen.</summary>
    public int[] RowPivot { get; }

    /// <summary>During a pivoting factorisation: where the search stops in each finished column of L (symmetric pruning).</summary>
    public int[] SearchEnd { get; }

    /// <summary>A stamp no entry of <see cref="Marks"/> holds yet; clears the marks when the counter would wrap.</summary>
    public int NewStamp()
    {
        if (stamp == int.MaxValue)
        {
            Array.Clear(Marks);
            stamp = 0;
        }
        return ++stamp;
    }

    /// <summary><see cref="Pattern"/> with room for at least nnz entries.</summary>
    public int[] PatternOfSize(int nnz)
    {
        if (Pattern.Length < nnz) Pattern = new int[nnz];
        return Pattern;
    }
}
