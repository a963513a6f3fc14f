// A node of the single-line network, at one nominal voltage.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>A bus: one node of the single-line network at one base voltage.</summary>
public sealed record Bus
{
    public Bus() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Bus(string id, double vMin = 0.95, double vMax = 1.05, bool inService = true)
    {
        Id = id;
        VMin = vMin;
        VMax = vMax;
        InService = inService;
    }

    public required string Id { get; init; }

    /// <summary>Base (nominal) line-to-line voltage in kV; 0 means "not stated" (per-unit-only cases).</summary>
    public double Kv { get; init; }

    public double VMin { get; init; } = 0.95;
    public double VMax { get; init; } = 1.05;
    public string? Zone { get; init; }
    public string? Name { get; init; }
    public bool InService { get; init; } = true;
}
