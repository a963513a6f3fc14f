// Where the time of one load flow went, stage by stage, with the sizes that explain it.
namespace Study.Core.LoadFlow;

/// <summary>Stage times in milliseconds and the sparse sizes behind them.</summary>
public sealed record LoadFlowTimings
{
    /// <summary>Building the admittance matrix.</summary>
    public double AdmittanceMs { get; init; }
    /// <summary>Jacobian pattern and the symbolic LU analysis (ordering), done once.</summary>
    public double AnalyseMs { get; init; }
    /// <summary>Mismatch and Jacobian values, every iteration.</summary>
    public double JacobianMs { get; init; }
    /// <summary>Numeric LU factorisations and refactorisations.</summary>
    public double FactorMs { get; init; }
    /// <summary>Forward and back substitutions.</summary>
    public double SolveMs { get; init; }
    /// <summary>Everything inside the solver, results included.</summary>
    public double TotalMs { get; init; }
    public int JacobianSize { get; init; }
    public int JacobianNonZeros { get; init; }
    /// <summary>Nonzeros of L + U: the factor size the solve time follows.</summary>
    public int FactorNonZeros { get; init; }
}
