// The solution printed with an imported case, kept so results can be compared with it.
namespace Study.Core.Model;

/// <summary>One bus of a published load-flow solution.</summary>
public sealed record PublishedBus
{
    public required string Id { get; init; }
    public double VPu { get; init; }
    public double AngleDeg { get; init; }
    public double PGenMw { get; init; }
    public double QGenMvar { get; init; }
}

/// <summary>A published load-flow solution that came with an imported case.</summary>
public sealed record PublishedSolution
{
    public string? Source { get; init; }
    public IReadOnlyList<PublishedBus> Buses { get; init; } = [];
}
