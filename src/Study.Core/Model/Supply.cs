// The utility's infeed at the point of supply: a slack source with a declared fault level.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>A grid supply point (utility infeed). Slack in the load flow; Z_Q in fault studies.</summary>
public sealed record Supply
{
    public Supply() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Supply(string id, string bus, double vSet = 1.0, bool inService = true)
    {
        Id = id;
        Bus = bus;
        VSet = vSet;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double VSet { get; init; } = 1.0;
    public double AngleDeg { get; init; }

    /// <summary>Declared maximum three-phase fault level at the supply point, MVA.</summary>
    public double? ScMvaMax { get; init; }

    /// <summary>Declared minimum three-phase fault level, MVA (defaults to the maximum).</summary>
    public double? ScMvaMin { get; init; }

    /// <summary>X/R ratio of the supply impedance.</summary>
    public double? Xr { get; init; }

    /// <summary>Ratio of zero- to positive-sequence supply impedance, Z0/Z1.</summary>
    [JsonPropertyName("z0z1")]
    public double? Z0Z1 { get; init; }

    public bool InService { get; init; } = true;
}
