// Options of a load-flow solve, and their defaults.
namespace Study.Core.LoadFlow;

/// <summary>Settings of the Newton-Raphson load flow: tolerance, iteration and control-round limits, the controls that act, and a warm start.</summary>
public sealed record LoadFlowOptions
{
    public static LoadFlowOptions Default { get; } = new();

    /// <summary>Largest P or Q mismatch accepted as converged, per unit.</summary>
    public double TolerancePu { get; init; } = 1e-8;

    /// <summary>Newton-Raphson iterations allowed in one inner solve.</summary>
    public int MaxIterations { get; init; } = 30;

    /// <summary>Switch PV buses to PQ at their reactive limits (and back when the voltage recovers).</summary>
    public bool EnforceQLimits { get; init; } = true;

    /// <summary>Let on-load tap changers with a regulation setting move toward their band.</summary>
    public bool RegulateTaps { get; init; } = true;

    /// <summary>Rounds of the outer control loops (Q limits, taps) before giving up.</summary>
    public int MaxControlRounds { get; init; } = 30;

    /// <summary>Start from this solved state (matched by bus id) instead of a flat start.</summary>
    public LoadFlowResult? WarmStart { get; init; }

    /// <summary>List the internal star buses of three-winding transformers among the bus results.</summary>
    public bool IncludeInternalBuses { get; init; }

    /// <summary>Keep the Jacobian at the final state in <see cref="LoadFlowResult.Jacobian"/> (diagnosis).</summary>
    public bool CaptureJacobian { get; init; }

    /// <summary>Tightest and loosest tolerance accepted, pu: below 1e-13 rounding alone keeps the mismatch up; above 1e-3 (0.1 MW on 100 MVA) the answer is not a solution.</summary>
    public const double MinTolerancePu = 1e-13, MaxTolerancePu = 1e-3;

    /// <summary>Most Newton-Raphson iterations, or control rounds, that may be asked for.</summary>
    public const int MaxIterationLimit = 1000;

    /// <summary>Checks the options against their bounds, so every front end refuses the same values with the same words.</summary>
    /// <exception cref="Model.InputException">An option is out of bounds.</exception>
    public void Validate()
    {
        if (!(TolerancePu >= MinTolerancePu && TolerancePu <= MaxTolerancePu))
            throw new Model.InputException(
                $"the tolerance {TolerancePu.ToString("G3", System.Globalization.CultureInfo.InvariantCulture)} pu is outside "
                + $"{MinTolerancePu:0e0}..{MaxTolerancePu:0e0} pu (1e-8 is the default)");
        if (MaxIterations < 1 || MaxIterations > MaxIterationLimit)
            throw new Model.InputException($"the iteration limit {MaxIterations} is outside 1..{MaxIterationLimit} (30 is the default)");
        if (MaxControlRounds < 0 || MaxControlRounds > MaxIterationLimit)
            throw new Model.InputException($"the control-round limit {MaxControlRounds} is outside 0..{MaxIterationLimit}");
    }
}
