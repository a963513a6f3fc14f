// Sparse LU of a square matrix, P·A·Q = L·U, over double (Jacobians) or Complex (admittance
// matrices): one symbolic analysis, a full factorisation with threshold pivoting, then values-only
// refactorisations and in-place solves that allocate nothing (Davis 2006, ch. 6 and §8.1 cs_lusol).
using System.Numerics;
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

/// <summary>
/// Sparse LU factorisation with a fixed fill-reducing column order. Usage per Newton iteration:
/// <c>Factor</c> once, then <c>Refactor</c> and <c>Solve</c>. Instances keep workspaces and are not thread-safe.
/// </summary>
/// <remarks>
/// L is unit lower triangular (its diagonal is implicit) and U upper triangular with its diagonal
/// stored last in each column; after factorisation both use pivot-order row indices.
/// The kernels are compiled fully optimised at once: a study runs each only a few times, too few
/// for tiered compilation to promote them before the large matrices have gone through.
/// </remarks>
public sealed partial class SparseLu<T> where T : INumberBase<T>
{
    private readonly int n;
    private readonly int[] lp;  // L column pointers
    private int[] li;           // L row indices (strictly below the diagonal)
    private T[] lx;
    private readonly int[] up;  // U column pointers
    private int[] ui;           // U row indices, diagonal last in each column
    private T[] ux;
    private readonly int[] lpend;      // end of the pruned part of each L column, -1 if unpruned
    private readonly int[] pinv;       // row i of A is pivot row pinv[i]
    private readonly int[] qinv;       // column j of A is column qinv[j] of the factors
    private readonly int[] rowPivot;   // pinv during factorisation, on rows numbered by qinv
    private readonly T[] x;            // dense column accumulator, all zero between columns
    private readonly int[] xi;         // reach output and DFS recursion stack
    private readonly int[] pstack;     // DFS resume positions
    private readonly int[] mark;       // DFS visit stamps
    private readonly T[] work;         // solve workspace
    private int[] factoredColPtr = [];  // pattern of the matrix last factorised, for Refactor's check
    private int[] factoredRowIdx = [];
    private bool factorised;

    public SparseLu(LuSymbolic symbolic, LuOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(symbolic);
        options ??= LuOptions.Default;
        options.Validate();
        Symbolic = symbolic;
        Options = options;
        n = symbolic.Size;
        lp = new int[n + 1];
        up = new int[n + 1];
        li = new int[Capacity(symbolic.EstimatedNonZerosL - n)];
        lx = new T[li.Length];
        ui = new int[Capacity(symbolic.EstimatedNonZerosU)];
        ux = new T[ui.Length];
        pinv = new int[n];
        qinv = new int[n];
        for (int k = 0; k < n; k++) qinv[symbolic.ColumnOrder[k]] = k;
        rowPivot = new int[n];
        lpend = new int[n];
        x = new T[n];
        xi = new int[n];
        pstack = new int[n];
        mark = new int[n];
        work = new T[n];
    }

    /// <summary>Analyses the pattern of a (ordering and fill estimate) and returns a solver ready to <c>Factor</c>.</summary>
    public static SparseLu<T> Analyse(CscMatrix<T> a, LuOptions? options = null)
    {
        options ??= LuOptions.Default;
        return new SparseLu<T>(LuSymbolic.Analyse(a, options.Ordering), options);
    }

    public LuSymbolic Symbolic { get; }
    public LuOptions Options { get; }

    /// <summary>Order n of the system.</summary>
    public int Size => n;

    /// <summary>True after a successful factorisation; false before one or after a singular matrix.</summary>
    public bool IsFactorised => factorised;

    /// <summary>nnz(L) including its unit diagonal.</summary>
    public int NonZerosL => factorised ? lp[n] + n : 0;

    /// <summary>nnz(U) including its diagonal.</summary>
    public int NonZerosU => factorised ? up[n] : 0;

    /// <summary>nnz(L + U): every stored factor entry, the diagonal counted once.</summary>
    public int NonZerosLU => factorised ? lp[n] + up[n] : 0;

    /// <summary>How many factorisations chose pivots afresh (first Factor and Refactor fallbacks).</summary>
    public int PivotingFactorisations { get; private set; }

    /// <summary>How many refactorisations reused the previous pivot sequence.</summary>
    public int ValueRefactorisations { get; private set; }

    /// <summary>Factorises a with threshold partial pivoting; throws <see cref="SingularMatrixException"/> if singular.</summary>
    public void Factor(CscMatrix<T> a)
    {
        if (!TryFactor(a, out int column)) throw new SingularMatrixException(column);
    }

    /// <summary>Factorises a; on a singular matrix returns false with the column of A that has no pivot.</summary>
    public bool TryFactor(CscMatrix<T> a, out int singularColumn)
    {
        CheckMatrix(a);
        RememberPattern(a);
        return FactorFresh(a, out singularColumn);
    }

    /// <summary>
    /// Factorises new values of the pattern last factorised, reusing its pivot sequence and L/U
    /// patterns; falls back to <see cref="Factor"/> when a pivot has become too small, when no
    /// factorisation exists yet, or when the pattern differs.
    /// </summary>
    public void Refactor(CscMatrix<T> a)
    {
        if (!TryRefactor(a, out int column)) throw new SingularMatrixException(column);
    }

    /// <summary><see cref="Refactor"/> that returns false with the singular column instead of throwing.</summary>
    public bool TryRefactor(CscMatrix<T> a, out int singularColumn)
    {
        CheckMatrix(a);
        if (factorised && SamePatternAsFactored(a))
        {
            bool refactored = RefactorValues(a, Options.RefactorPivotTolerance);
            factorCount++;
            if (refactored)
            {
                ValueRefactorisations++;
                singularColumn = -1;
                return true;
            }
        }
        else
        {
            RememberPattern(a);
        }
        return FactorFresh(a, out singularColumn);
    }

    /// <summary>Solves A·x = b in place: b holds x on return.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Solve(Span<T> b)
    {
        CheckSolve(b.Length);
        int[] lpl = lp, lil = li, upl = up, uil = ui, q = Symbolic.ColumnOrder, pinvl = pinv;
        T[] lxl = lx, uxl = ux, w = work;
        for (int i = 0; i < n; i++) w[pinvl[i]] = b[i];
        // L·y = P·b, column by column (Davis 2006, §3.1, cs_lsolve; unit diagonal implicit).
        for (int j = 0; j < n; j++)
        {
            T wj = w[j];
            if (T.IsZero(wj)) continue;
            for (int p = lpl[j]; p < lpl[j + 1]; p++) w[lil[p]] -= lxl[p] * wj;
        }
        // U·z = y (Davis 2006, §3.1, cs_usolve; diagonal last in each column).
        for (int j = n - 1; j >= 0; j--)
        {
            int pd = upl[j + 1] - 1;
            T wj = w[j] / uxl[pd];
            w[j] = wj;
            if (T.IsZero(wj)) continue;
            for (int p = upl[j]; p < pd; p++) w[uil[p]] -= uxl[p] * wj;
        }
        for (int k = 0; k < n; k++) b[q[k]] = w[k];
    }

    /// <summary>Solves A·X = B in place for a column-major block of right-hand sides, n entries each.</summary>
    public void Solve(Span<T> block, int rightHandSides)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(rightHandSides);
        if (block.Length != (long)n * rightHandSides)
            throw new ArgumentException($"the block must hold {rightHandSides} columns of {n} entries.", nameof(block));
        for (int r = 0; r < rightHandSides; r++) Solve(block.Slice(r * n, n));
    }

    /// <summary>Solves Aᵀ·x = b in place (plain transpose, no conjugation).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void SolveTransposed(Span<T> b)
    {
        CheckSolve(b.Length);
        int[] lpl = lp, lil = li, upl = up, uil = ui, q = Symbolic.ColumnOrder, pinvl = pinv;
        T[] lxl = lx, uxl = ux, w = work;
        // Aᵀ = Q·Uᵀ·Lᵀ·P, so solve Uᵀ then Lᵀ on Qᵀ·b (Davis 2006, §3.1, cs_utsolve and cs_ltsolve).
        for (int k = 0; k < n; k++) w[k] = b[q[k]];
        for (int j = 0; j < n; j++)
        {
            int pd = upl[j + 1] - 1;
            T s = w[j];
            for (int p = upl[j]; p < pd; p++) s -= uxl[p] * w[uil[p]];
            w[j] = s / uxl[pd];
        }
        for (int j = n - 1; j >= 0; j--)
        {
            T s = w[j];
            for (int p = lpl[j]; p < lpl[j + 1]; p++) s -= lxl[p] * w[lil[p]];
            w[j] = s;
        }
        for (int i = 0; i < n; i++) b[i] = w[pinvl[i]];
    }

    private bool FactorFresh(CscMatrix<T> a, out int singularColumn)
    {
        singularColumn = -1;
        factorised = TryFactorOnDiagonal(a) || FactorWithPivoting(a, out singularColumn);
        factorCount++;
        if (factorised) PivotingFactorisations++;
        return factorised;
    }

    private void CheckMatrix(CscMatrix<T> a)
    {
        ArgumentNullException.ThrowIfNull(a);
        if (a.Rows != n || a.Cols != n)
            throw new ArgumentException($"the analysis is for {n}×{n}, the matrix is {a.Rows}×{a.Cols}.", nameof(a));
        // A NaN or infinity would otherwise spread through the factors unnoticed.
        int[] ap = a.ColPtr;
        T[] ax = a.Values;
        for (int j = 0; j < n; j++)
        {
            for (int p = ap[j]; p < ap[j + 1]; p++)
            {
                if (!T.IsFinite(ax[p]))
                    throw new ArgumentException($"entry ({a.RowIdx[p]}, {j}) of the matrix is not finite.", nameof(a));
            }
        }
    }

    private void CheckSolve(int length)
    {
        if (!factorised) throw new InvalidOperationException("Solve needs a successful Factor or Refactor first.");
        if (length != n) throw new ArgumentException($"the right-hand side has {length} entries, the system {n}.");
    }

    private void RememberPattern(CscMatrix<T> a)
    {
        int nnz = a.NonZeros;
        if (factoredColPtr.Length != n + 1) factoredColPtr = new int[n + 1];
        if (factoredRowIdx.Length != nnz) factoredRowIdx = new int[nnz];
        Array.Copy(a.ColPtr, factoredColPtr, n + 1);
        Array.Copy(a.RowIdx, factoredRowIdx, nnz);
    }

    private bool SamePatternAsFactored(CscMatrix<T> a) =>
        a.NonZeros == factoredRowIdx.Length
        && a.ColPtr.AsSpan().SequenceEqual(factoredColPtr)
        && a.RowIdx.AsSpan(0, a.NonZeros).SequenceEqual(factoredRowIdx);

    private static int Capacity(long estimate) => (int)Math.Clamp(estimate, 1, Array.MaxLength);
}
