// What an outage screening is asked: which elements to take out, in which scenarios, on how many cores.
namespace Study.Core.Studies;

public sealed record OutageScreeningRequest
{
    /// <summary>Lines and transformers to take out one at a time; empty means every in-service one.</summary>
    public IReadOnlyList<string> ElementIds { get; init; } = [];

    /// <summary>Scenario names to screen; empty means every scenario of the network (the loads as entered when it has none); a null name is the loads as entered.</summary>
    public IReadOnlyList<string?> Scenarios { get; init; } = [];

    /// <summary>Outage solves run at once; null means one per processor.</summary>
    public int? MaxParallelism { get; init; }

    /// <summary>The slice of the outages to solve (<see cref="OutageShard"/>); null for every outage.</summary>
    public OutageShard? Shard { get; init; }

    /// <summary>Checks what can be checked without the network.</summary>
    /// <exception cref="Model.InputException">The parallelism is below one, an id is blank, or the shard does not exist.</exception>
    public void Validate()
    {
        Shard?.Validate();
        if (MaxParallelism is < 1)
            throw new Model.InputException($"the number of parallel solves must be at least 1 (got {MaxParallelism})");
        if (ElementIds.Any(string.IsNullOrWhiteSpace))
            throw new Model.InputException("an element id to take out is blank");
    }
}
