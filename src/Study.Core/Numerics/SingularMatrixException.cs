// Raised when a factorisation finds no usable pivot: the matrix is singular (structurally or numerically).
namespace Study.Core.Numerics;

/// <summary>The matrix is singular; <see cref="Column"/> is the column of A where elimination broke down.</summary>
public sealed class SingularMatrixException : ArithmeticException
{
    public SingularMatrixException(int column)
        : base($"The matrix is singular: no nonzero pivot is left in column {column}.")
    {
        Column = column;
    }

    /// <summary>Index of the column of the original matrix (before ordering) that has no usable pivot.</summary>
    public int Column { get; }
}
