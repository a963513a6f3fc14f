// How a star point (generator or transformer neutral) is connected to earth.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>Neutral earthing of a star winding: solid when grounded with zero impedance.</summary>
public sealed record Earthing
{
    public Earthing() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Earthing(bool grounded = true)
    {
        Grounded = grounded;
    }

    public bool Grounded { get; init; } = true;
    public double ROhm { get; init; }
    public double XOhm { get; init; }
}
