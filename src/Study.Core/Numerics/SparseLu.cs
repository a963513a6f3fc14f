// Sparse LU of a square matrix, P·A·Q = L·U, over double (Jacobians) or Complex (admittance
// matrices): one symbolic analysis, a full factorisation with threshold pivoting, then values-only
// refactorisations and in-place solves that allocate nothing (Davis 2006, ch. 6 and §8.1 cs_lusol).
// This file holds the public entry points and the factors' storage; the phases live beside it:
// SparseLu.Diagonal (first factorisation on the diagonal), SparseLu.Factor (with pivoting),
// SparseLu.Refactor (values only), SparseLu.Solve and SparseLu.Entries (selected entries of A⁻¹).
using System.Numerics;

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
    private readonly int[] pinv;       // row i of A is pivot row pinv[i]
    private readonly int[] qinv;       // column j of A is column qinv[j] of the factors
    private readonly LuWorkspace<T> ws;
    private int[] factoredColPtr = [];  // pattern of the matrix last factorised, for Refactor's check
    private int[] factoredRowIdx = [];
    private bool factorised;
    private int factorCount;           // factorisations so far, to tell when the Uᵀ copy is stale
    private bool onDiagonal;           // the factors have diagonal pivots on the analysis's pattern
    private SparseLu<T>? adoptedFrom;  // the solver whose pivots were last taken over, and when (AdoptPivots)
    private int adoptedAt, ownAtAdoption;
    // Factor columns refactorised since the values were last taken over (AdoptPivots), unless all may have been.
    private readonly List<int> changedSinceAdoption = [];
    private bool allChangedSinceAdoption = true;

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
        ws = new LuWorkspace<T>(n);
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

    /// <summary>
    /// Takes over the pivot sequence and the L and U patterns of <paramref name="source"/>, a factorisation
    /// of the same analysis, so the next <see cref="TryRefactor"/> replays them with new values exactly as
    /// <paramref name="source"/> would; with <paramref name="values"/> the factors' numbers too, so
    /// <see cref="Solve"/> solves with <paramref name="source"/>'s matrix. The pattern is not copied when
    /// it is already the one in use here (taken over before, and neither solver has chosen pivots
    /// since). Returns false, leaving this solver unfactorised, when <paramref name="source"/> holds no
    /// factorisation.
    /// </summary>
    /// <exception cref="ArgumentException">The two solvers do not share one symbolic analysis.</exception>
    public bool AdoptPivots(SparseLu<T> source, bool values = false)
    {
        ArgumentNullException.ThrowIfNull(source);
        if (!ReferenceEquals(source.Symbolic, Symbolic))
            throw new ArgumentException("pivots can be taken over only from a factorisation of the same analysis.", nameof(source));
        if (!source.factorised)
        {
            factorised = false;
            return false;
        }
        bool samePattern = factorised && ReferenceEquals(adoptedFrom, source) && adoptedAt == source.PivotingFactorisations
            && ownAtAdoption == PivotingFactorisations;
        if (!samePattern) AdoptPattern(source);
        if (values)
        {
            if (!samePattern || allChangedSinceAdoption)
            {
                Array.Copy(source.lx, lx, lp[n]);
                Array.Copy(source.ux, ux, up[n]);
            }
            else
            {
                foreach (int k in changedSinceAdoption)
                {
                    Array.Copy(source.lx, lp[k], lx, lp[k], lp[k + 1] - lp[k]);
                    Array.Copy(source.ux, up[k], ux, up[k], up[k + 1] - up[k]);
                }
            }
            changedSinceAdoption.Clear();
            allChangedSinceAdoption = false;
        }
        else
        {
            allChangedSinceAdoption = true;
        }
        return true;
    }

    private void AdoptPattern(SparseLu<T> source)
    {
        Array.Copy(source.lp, lp, n + 1);
        Array.Copy(source.up, up, n + 1);
        Array.Copy(source.pinv, pinv, n);
        if (lp[n] > li.Length) Grow(ref li, ref lx, lp[n]);
        if (up[n] > ui.Length) Grow(ref ui, ref ux, up[n]);
        Array.Copy(source.li, li, lp[n]);
        Array.Copy(source.ui, ui, up[n]);
        factoredColPtr = (int[])source.factoredColPtr.Clone();
        factoredRowIdx = (int[])source.factoredRowIdx.Clone();
        factorised = true;
        onDiagonal = source.onDiagonal;
        factorCount++;
        adoptedFrom = source;
        adoptedAt = source.PivotingFactorisations;
        ownAtAdoption = PivotingFactorisations;
    }

    private bool FactorFresh(CscMatrix<T> a, out int singularColumn)
    {
        singularColumn = -1;
        allChangedSinceAdoption = true;
        onDiagonal = TryFactorOnDiagonal(a);
        factorised = onDiagonal || FactorWithPivoting(a, out singularColumn);
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

    // Room for at least `needed` entries in a factor's index and value arrays (only the first
    // factorisation of a pattern grows them; refactorisations reuse them as they are).
    private static void Grow(ref int[] index, ref T[] values, int needed)
    {
        if (needed <= index.Length) return;
        long grown = Math.Max(needed, (long)index.Length + index.Length / 2 + 1024);
        int size = (int)Math.Min(grown, Array.MaxLength);
        if (size < needed) throw new OutOfMemoryException("the LU factors exceed the largest array .NET allows.");
        Array.Resize(ref index, size);
        Array.Resize(ref values, size);
    }
}
