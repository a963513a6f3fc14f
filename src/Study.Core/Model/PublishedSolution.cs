// The solution printed with an imported case, kept so results can be compared with it.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

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
    public PublishedSolution() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal PublishedSolution(string? source = null, IReadOnlyList<PublishedBus>? buses = null)
    {
        Source = source;
        Buses = buses ?? [];
    }

    public string? Source { get; init; }
    public IReadOnlyList<PublishedBus> Buses { get; init; } = [];
}
