// A loading condition to study, such as winter peak or summer night.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>A named loading condition: every load (and, optionally, generation) scaled.</summary>
public sealed record Scenario
{
    public Scenario() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Scenario(string name, double loadScale = 1.0)
    {
        Name = name;
        LoadScale = loadScale;
    }

    public required string Name { get; init; }
    public double LoadScale { get; init; } = 1.0;

    /// <summary>Scale on generator active power set points (not the slack); 1 when absent.</summary>
    public double? GenerationScale { get; init; }
    public string? Description { get; init; }
}
