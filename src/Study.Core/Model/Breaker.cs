// A circuit breaker at a bus, with its rated breaking and making capability.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>A breaker at a bus: rated short-circuit breaking current and peak (making) current.</summary>
public sealed record Breaker
{
    public Breaker() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Breaker(string id, string bus, bool inService = true)
    {
        Id = id;
        Bus = bus;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double InterruptingKa { get; init; }
    public double PeakKa { get; init; }
    public bool InService { get; init; } = true;
}
