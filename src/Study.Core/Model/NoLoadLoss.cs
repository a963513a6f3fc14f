// Magnetising (no-load) data of a transformer, from its test certificate.
namespace Study.Core.Model;

/// <summary>No-load current (percent of rated) and no-load (iron) loss.</summary>
public sealed record NoLoadLoss
{
    public double I0Percent { get; init; }
    public double P0Kw { get; init; }
}
