// How a star point (generator or transformer neutral) is connected to earth.
namespace Study.Core.Model;

/// <summary>Neutral earthing of a star winding: solid when grounded with zero impedance.</summary>
public sealed record Earthing
{
    public bool Grounded { get; init; } = true;
    public double ROhm { get; init; }
    public double XOhm { get; init; }
}
