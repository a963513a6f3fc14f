// What an outage screening is asked: which elements to take out, in which scenarios, on how many cores.
using Study.Core.Model;

namespace Study.Core.Studies;

public sealed record OutageScreeningRequest
{
    /// <summary>Lines and transformers to take out one at a time; empty means every in-service one.</summary>
    public IReadOnlyList<string> ElementIds { get; init; } = [];

    /// <summary>Scenarios to screen; empty means "loads as entered" (one case).</summary>
    public IReadOnlyList<Scenario> Scenarios { get; init; } = [];

    /// <summary>Outage solves run at once; null means one per processor.</summary>
    public int? MaxParallelism { get; init; }
}
