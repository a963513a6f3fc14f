// Options of a load-flow solve, with the defaults DESIGN.md states.
namespace Study.Core.LoadFlow;

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
}
