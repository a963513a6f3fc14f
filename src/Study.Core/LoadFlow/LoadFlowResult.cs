// The result records of a load flow, read alike by the CLI, the TUI and the tests.
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.LoadFlow;

/// <summary>The end of a tap changer's range.</summary>
public enum TapLimit
{
    Lowest,
    Highest,
}

/// <summary>Which reactive limit holds a voltage-controlling bus.</summary>
public enum ReactiveLimitSide
{
    Min,
    Max,
}

/// <summary>A voltage-controlling bus held at one of its reactive limits (it no longer holds its voltage).</summary>
public sealed record ReactiveLimitState(string Bus, ReactiveLimitSide Side);

/// <summary>Which limit a bus voltage or branch loading breaks.</summary>
public enum ViolationKind
{
    None,
    Low,
    High,
    Overload,
}

/// <summary>Solved state of one bus.</summary>
public sealed record BusResult
{
    public required string Id { get; init; }
    /// <summary>Base kV; 0 when not stated.</summary>
    public double Kv { get; init; }
    public double VPu { get; init; }
    /// <summary>Voltage in kV, null when the base kV is not stated.</summary>
    public double? VKv { get; init; }
    public double AngleDeg { get; init; }
    public double PGenMw { get; init; }
    public double QGenMvar { get; init; }
    public double PLoadMw { get; init; }
    public double QLoadMvar { get; init; }
    public ViolationKind Violation { get; init; }
    public double VMin { get; init; }
    public double VMax { get; init; }
    /// <summary>False for a bus in an island with no slack source (after an outage, say).</summary>
    public bool Energised { get; init; } = true;
}

/// <summary>Flows at both ends of one branch (a three-winding transformer gives one row per winding).</summary>
public sealed record BranchResult
{
    public required string Id { get; init; }
    public required BranchKind Kind { get; init; }
    public required string From { get; init; }
    public required string To { get; init; }
    public double PFromMw { get; init; }
    public double QFromMvar { get; init; }
    public double PToMw { get; init; }
    public double QToMvar { get; init; }
    public double SFromMva { get; init; }
    public double SToMva { get; init; }
    /// <summary>Current at each end in A; null when kV is not stated.</summary>
    public double? IFromA { get; init; }
    public double? IToA { get; init; }
    public double LossMw { get; init; }
    public double LossMvar { get; init; }
    /// <summary>Larger end MVA over the rating, percent; null without a rating.</summary>
    public double? LoadingPercent { get; init; }
    public double? RatingMva { get; init; }
}

/// <summary>Final position of a tap changer after the solve.</summary>
public sealed record TapResult
{
    public required string Id { get; init; }
    public int Position { get; init; }
    public double Ratio { get; init; }
    public bool Regulating { get; init; }
    /// <summary>The end of its range the tap sits at while it wants to move further; null otherwise.</summary>
    public TapLimit? AtLimit { get; init; }
    public string? RegulatedBus { get; init; }
}

/// <summary>System totals.</summary>
public sealed record LoadFlowTotals
{
    public double GenerationMw { get; init; }
    public double GenerationMvar { get; init; }
    public double LoadMw { get; init; }
    public double LoadMvar { get; init; }
    public double LossMw { get; init; }
    public double LossMvar { get; init; }
    /// <summary>Reactive power of shunts (capacitive positive), Mvar.</summary>
    public double ShuntMvar { get; init; }
    /// <summary>Active power absorbed by shunts, MW.</summary>
    public double ShuntMw { get; init; }
}

/// <summary>A limit broken in the solved state.</summary>
public sealed record Violation
{
    public required string Element { get; init; }
    /// <summary>A bus, or the kind of branch (line, transformer, three-winding transformer).</summary>
    public required ElementKind Kind { get; init; }
    public ViolationKind Type { get; init; }
    /// <summary>Voltage in pu, or loading in percent.</summary>
    public double Value { get; init; }
    public double Limit { get; init; }
}

/// <summary>One Newton-Raphson iteration: the largest mismatch and where it was.</summary>
public sealed record IterationRecord(int Iteration, double MaxMismatchPu, string WorstBus);

/// <summary>Everything a load flow produces. When <see cref="Converged"/> is false, only the log and the worst bus are meaningful.</summary>
public sealed record LoadFlowResult
{
    public bool Converged { get; init; }
    public int Iterations { get; init; }
    public double MaxMismatchPu { get; init; }
    /// <summary>The bus with the largest mismatch at the end (the place to look when it fails).</summary>
    public string? WorstBus { get; init; }
    public string? Message { get; init; }
    public string? Scenario { get; init; }
    public IReadOnlyList<BusResult> Buses { get; init; } = [];
    public IReadOnlyList<BranchResult> Branches { get; init; } = [];
    public IReadOnlyList<TapResult> Taps { get; init; } = [];
    public LoadFlowTotals Totals { get; init; } = new();
    public IReadOnlyList<Violation> Violations { get; init; } = [];
    public IReadOnlyList<IterationRecord> Log { get; init; } = [];
    /// <summary>Voltage-controlling buses held at a reactive limit, and which one.</summary>
    public IReadOnlyList<ReactiveLimitState> BusesAtReactiveLimit { get; init; } = [];

    /// <summary>The Jacobian at the final state, when asked for (rows/columns: ΔP then ΔQ of the unknown buses).</summary>
    public Numerics.CscMatrix<double>? Jacobian { get; init; }

    /// <summary>Stage times of this solve.</summary>
    public LoadFlowTimings? Timings { get; init; }
}
