// Result records of an outage screening: per scenario, every outage with what it breaks, ranked by severity.
using Study.Core.LoadFlow;

namespace Study.Core.Studies;

/// <summary>A limit broken with the element out that was not broken (or was broken less) in the intact case.</summary>
public sealed record OutageViolation
{
    public required string Element { get; init; }
    /// <summary>A bus, or the kind of branch, as in <see cref="Violation.Kind"/>.</summary>
    public required Model.ElementKind Kind { get; init; }
    public ViolationKind Type { get; init; }
    /// <summary>Voltage in pu, or loading in percent, with the element out.</summary>
    public double Value { get; init; }
    public double Limit { get; init; }
    /// <summary>The same quantity in the intact case when it already broke the limit there; null when it did not.</summary>
    public double? IntactValue { get; init; }
}

/// <summary>A branch in parallel with the element taken out (same two buses), and its loading with that element out.</summary>
public sealed record ParallelLoading(string Element, double? LoadingPercent);

/// <summary>One element out in one scenario.</summary>
public sealed record OutageCase
{
    public required string Element { get; init; }
    public required Units.BranchKind Kind { get; init; }
    public string? Scenario { get; init; }
    /// <summary>
    /// The outage's number in the whole screening: scenario by scenario, elements in their order
    /// (<see cref="OutageShard"/>). It orders ties and tells which shard solved it.
    /// </summary>
    public int Order { get; init; }
    public bool Converged { get; init; }
    /// <summary>Why the load flow failed, when it did.</summary>
    public string? Message { get; init; }
    /// <summary>Buses live in the intact case and dead with the element out (their island lost its source).</summary>
    public IReadOnlyList<string> IslandedBuses { get; init; } = [];
    /// <summary>Load those buses carried in the intact case, MW.</summary>
    public double LostLoadMw { get; init; }
    /// <summary>Generation those buses carried in the intact case, MW.</summary>
    public double LostGenerationMw { get; init; }
    public IReadOnlyList<OutageViolation> NewViolations { get; init; } = [];
    /// <summary>The live bus closest to (or furthest outside) its band, and its voltage.</summary>
    public double? WorstVPu { get; init; }
    public string? WorstVBus { get; init; }
    /// <summary>The most loaded rated branch left in service, and its loading.</summary>
    public double? WorstLoadingPercent { get; init; }
    public string? WorstLoadingElement { get; init; }
    /// <summary>The branches left between the same two buses — for a bank, the remaining bank(s) — and their loading.</summary>
    public IReadOnlyList<ParallelLoading> ParallelLoadings { get; init; } = [];
    /// <summary>Size of the new overloads and voltage excursions, percent (see <see cref="OutageSeverity"/>).</summary>
    public double StressPercent { get; init; }
    /// <summary>See <see cref="OutageSeverity"/>: 1000 no convergence, 100–999 load lost, below 100 stress only, 0 secure.</summary>
    public double Severity { get; init; }
}

/// <summary>The intact case of one scenario and its outages, most severe first.</summary>
public sealed record ScenarioScreening
{
    public string? Scenario { get; init; }
    public bool IntactConverged { get; init; }
    public string? IntactMessage { get; init; }
    public double IntactLoadMw { get; init; }
    public IReadOnlyList<Violation> IntactViolations { get; init; } = [];
    /// <summary>Ranked (<see cref="OutageScreening.Rank"/>): severity, then stress, then the order the elements were given in.</summary>
    public IReadOnlyList<OutageCase> Outages { get; init; } = [];
}

public sealed record OutageScreeningResult
{
    /// <summary>The elements taken out, in the order screened.</summary>
    public IReadOnlyList<string> Elements { get; init; } = [];
    public IReadOnlyList<ScenarioScreening> Scenarios { get; init; } = [];
    /// <summary>The slice of the outages solved here (the whole screening unless it was sharded).</summary>
    public OutageShard Shard { get; init; } = OutageShard.Whole;
    /// <summary>Outages in the whole screening: elements × scenarios, whichever shard this is.</summary>
    public int OutageCount { get; init; }
}
