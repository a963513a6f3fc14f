// A node of the single-line network, at one nominal voltage.
namespace Study.Core.Model;

/// <summary>A bus: one node of the single-line network at one base voltage.</summary>
public sealed record Bus
{
    public required string Id { get; init; }

    /// <summary>Base (nominal) line-to-line voltage in kV; 0 means "not stated" (per-unit-only cases).</summary>
    public double Kv { get; init; }

    public double VMin { get; init; } = 0.95;
    public double VMax { get; init; } = 1.05;
    public string? Zone { get; init; }
    public string? Name { get; init; }
    public bool InService { get; init; } = true;
}
