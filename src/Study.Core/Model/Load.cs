// A bus load, with its voltage dependence as a ZIP mix.
namespace Study.Core.Model;

/// <summary>Shares of a load that are constant impedance, constant current and constant power; they sum to 1.</summary>
public sealed record ZipMix
{
    public double Z { get; init; }
    public double I { get; init; }
    public double P { get; init; } = 1.0;

    public static ZipMix ConstantPower { get; } = new();
}

/// <summary>A load at a bus, at 1 pu voltage and scenario scale 1.</summary>
public sealed record Load
{
    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double PMw { get; init; }
    public double QMvar { get; init; }
    public ZipMix? Zip { get; init; }
    public bool InService { get; init; } = true;
}
