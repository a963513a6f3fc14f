// A circuit breaker at a bus, with its rated breaking and making capability.
namespace Study.Core.Model;

/// <summary>A breaker at a bus: rated short-circuit breaking current and peak (making) current.</summary>
public sealed record Breaker
{
    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double InterruptingKa { get; init; }
    public double PeakKa { get; init; }
    public bool InService { get; init; } = true;
}
