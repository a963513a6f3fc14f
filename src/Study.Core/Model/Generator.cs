// A synchronous generator (or any controllable source) connected to a bus.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>How a generator is controlled in the load flow.</summary>
[System.Text.Json.Serialization.JsonConverter(typeof(System.Text.Json.Serialization.JsonStringEnumConverter<GeneratorMode>))]
public enum GeneratorMode
{
    /// <summary>Holds voltage magnitude and angle; takes up the balance.</summary>
    [System.Text.Json.Serialization.JsonStringEnumMemberName("slack")]
    Slack,
    /// <summary>Holds active power and voltage magnitude within its reactive limits.</summary>
    [System.Text.Json.Serialization.JsonStringEnumMemberName("pv")]
    Pv,
    /// <summary>Fixed active and reactive power.</summary>
    [System.Text.Json.Serialization.JsonStringEnumMemberName("pq")]
    Pq,
}

/// <summary>A generator: load-flow set points and the sequence reactances fault studies need.</summary>
public sealed record Generator
{
    public Generator() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Generator(string id, string bus, GeneratorMode mode = GeneratorMode.Pv, double vSet = 1.0, bool inService = true)
    {
        Id = id;
        Bus = bus;
        Mode = mode;
        VSet = vSet;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }
    public GeneratorMode Mode { get; init; } = GeneratorMode.Pv;
    public double PMw { get; init; }
    public double QMvar { get; init; }
    public double VSet { get; init; } = 1.0;

    /// <summary>The angle a slack generator holds, degrees: the island's reference angle (0 when not given).</summary>
    public double? AngleDeg { get; init; }

    public double? QMinMvar { get; init; }
    public double? QMaxMvar { get; init; }

    /// <summary>Rated apparent power, MVA (base of the per-unit reactances below).</summary>
    public double? Mva { get; init; }

    /// <summary>Rated terminal voltage, kV.</summary>
    public double? Kv { get; init; }

    /// <summary>Subtransient reactance x''d, per unit on the generator's own rating.</summary>
    public double? XdppPu { get; init; }
    public double? X2Pu { get; init; }
    public double? X0Pu { get; init; }
    public double? Xr { get; init; }

    /// <summary>Rated power factor (IEC 60909 K_G); 0.85 assumed when absent.</summary>
    public double? PowerFactor { get; init; }

    public Earthing? Neutral { get; init; }
    public bool InService { get; init; } = true;
}
