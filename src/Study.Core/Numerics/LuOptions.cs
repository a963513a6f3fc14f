// Settings of the sparse LU, with defaults that suit load-flow Jacobians and admittance matrices.
namespace Study.Core.Numerics;

/// <summary>Options for <see cref="SparseLu{T}"/>.</summary>
public sealed record LuOptions
{
    public static LuOptions Default { get; } = new();

    public ColumnOrdering Ordering { get; init; } = ColumnOrdering.Amd;

    /// <summary>
    /// Threshold partial pivoting: the diagonal is kept as pivot while its magnitude is at least this
    /// fraction of the largest candidate in its column (Davis 2006, §6.3, cs_lu tol). 1 is plain
    /// partial pivoting; smaller values keep the ordering's sparsity more often.
    /// </summary>
    public double PivotTolerance { get; init; } = 0.1;

    /// <summary>
    /// A values-only refactorisation keeps the previous pivot sequence while each pivot is at least
    /// this fraction of the largest candidate in its column; below it (or at zero) the factorisation
    /// is redone with fresh pivoting.
    /// </summary>
    public double RefactorPivotTolerance { get; init; } = 1e-3;

    /// <summary>
    /// A column is reported singular when every pivot candidate left in it is at most this fraction
    /// of the largest entry of that column of A: rounding leaves such a remainder where exact
    /// arithmetic would leave zero (a floating island in an admittance matrix, say). 0 reports only
    /// exact zeros.
    /// </summary>
    public double SingularPivotTolerance { get; init; } = 1e-13;

    internal void Validate()
    {
        if (!(PivotTolerance > 0 && PivotTolerance <= 1))
            throw new ArgumentOutOfRangeException(nameof(PivotTolerance), PivotTolerance, "must be in (0, 1].");
        if (!(RefactorPivotTolerance >= 0 && RefactorPivotTolerance <= 1))
            throw new ArgumentOutOfRangeException(nameof(RefactorPivotTolerance), RefactorPivotTolerance, "must be in [0, 1].");
        if (!(SingularPivotTolerance >= 0 && SingularPivotTolerance < 1))
            throw new ArgumentOutOfRangeException(nameof(SingularPivotTolerance), SingularPivotTolerance, "must be in [0, 1).");
    }
}
