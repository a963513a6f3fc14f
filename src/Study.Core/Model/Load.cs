// A bus load, with its voltage dependence as a ZIP mix.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>Shares of a load that are constant impedance, constant current and constant power; they sum to 1.</summary>
public sealed record ZipMix
{
    public ZipMix() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal ZipMix(double z = 0, double i = 0, double p = 1.0)
    {
        Z = z;
        I = i;
        P = p;
    }

    public double Z { get; init; }
    public double I { get; init; }
    public double P { get; init; } = 1.0;

    public static ZipMix ConstantPower { get; } = new();
}

/// <summary>A load at a bus, at 1 pu voltage and scenario scale 1.</summary>
public sealed record Load
{
    public Load() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Load(string id, string bus, bool inService = true)
    {
        Id = id;
        Bus = bus;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double PMw { get; init; }
    public double QMvar { get; init; }
    public ZipMix? Zip { get; init; }
    public bool InService { get; init; } = true;
}
