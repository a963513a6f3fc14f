// Result records of a comparison of two solved cases: per-bus voltage, per-branch flow, losses and violations.
using Study.Core.LoadFlow;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>Whether an element is in both cases or in one only.</summary>
public enum CaseMembership
{
    Both,
    /// <summary>Only in the after case.</summary>
    Added,
    /// <summary>Only in the before case.</summary>
    Removed,
}

/// <summary>One bus in the two cases; a voltage is null where the bus is absent or dead.</summary>
public sealed record BusChange
{
    public required string Id { get; init; }
    public double Kv { get; init; }
    public CaseMembership Membership { get; init; }
    public double? BeforePu { get; init; }
    public double? AfterPu { get; init; }
    /// <summary>After minus before, pu; null unless the bus is live in both cases.</summary>
    public double? DeltaPu => BeforePu is double b && AfterPu is double a ? a - b : null;
}

/// <summary>One branch in the two cases: active power at its from end, and its loading.</summary>
public sealed record BranchChange
{
    public required string Id { get; init; }
    public required BranchKind Kind { get; init; }
    public CaseMembership Membership { get; init; }
    public double? BeforeMw { get; init; }
    public double? AfterMw { get; init; }
    public double? BeforeLoadingPercent { get; init; }
    public double? AfterLoadingPercent { get; init; }
    public double? DeltaMw => BeforeMw is double b && AfterMw is double a ? a - b : null;
}

/// <summary>A tap changer's final position in the two cases (null where the transformer is absent).</summary>
public sealed record TapChange(string Id, int? BeforePosition, int? AfterPosition);

/// <summary>Two solved cases side by side: per-bus voltage and per-branch flow changes, losses, tap moves, and the violations that appear or clear.</summary>
public sealed record CaseComparisonResult
{
    public bool BeforeConverged { get; init; }
    public bool AfterConverged { get; init; }
    /// <summary>Why a case failed to converge, when one did; the lists below are then empty.</summary>
    public string? BeforeMessage { get; init; }
    public string? AfterMessage { get; init; }
    public string? BeforeScenario { get; init; }
    public string? AfterScenario { get; init; }
    /// <summary>Buses of the before case in its order, then the buses only the after case has.</summary>
    public IReadOnlyList<BusChange> Buses { get; init; } = [];
    public IReadOnlyList<BranchChange> Branches { get; init; } = [];
    /// <summary>Every tap changer in either case: a regulating bank that moves explains voltages that rise under more load.</summary>
    public IReadOnlyList<TapChange> Taps { get; init; } = [];
    public double LossBeforeMw { get; init; }
    public double LossAfterMw { get; init; }
    public double LoadBeforeMw { get; init; }
    public double LoadAfterMw { get; init; }
    /// <summary>Violations of the after case that the before case does not have (same element, same kind of limit).</summary>
    public IReadOnlyList<Violation> ViolationsAppeared { get; init; } = [];
    /// <summary>Violations of the before case that the after case no longer has.</summary>
    public IReadOnlyList<Violation> ViolationsCleared { get; init; } = [];
}
