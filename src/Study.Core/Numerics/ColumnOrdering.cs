// Which fill-reducing column ordering the symbolic analysis applies.
namespace Study.Core.Numerics;

/// <summary>Column ordering used by <see cref="LuSymbolic"/>.</summary>
public enum ColumnOrdering
{
    /// <summary>Columns in their given order (for tests and tiny systems).</summary>
    Natural,

    /// <summary>Approximate minimum degree on A + Aᵀ (Davis 2006, §7.1).</summary>
    Amd,

    /// <summary>An order given by the caller, such as <see cref="BlockOrdering"/>'s.</summary>
    Given,
}
