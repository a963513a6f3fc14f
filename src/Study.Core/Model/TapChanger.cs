// Tap changer of a transformer: which winding it is on, its range, and optional on-load regulation.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>Winding that carries the taps.</summary>
[System.Text.Json.Serialization.JsonConverter(typeof(System.Text.Json.Serialization.JsonStringEnumConverter<TapSide>))]
public enum TapSide
{
    [System.Text.Json.Serialization.JsonStringEnumMemberName("hv")]
    Hv,
    [System.Text.Json.Serialization.JsonStringEnumMemberName("lv")]
    Lv,
    [System.Text.Json.Serialization.JsonStringEnumMemberName("mv")]
    Mv,
}

/// <summary>On-load regulation: hold the voltage of a (local or remote) bus inside a dead band around VTarget.</summary>
public sealed record TapRegulation
{
    public TapRegulation() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal TapRegulation(string bus, double vTarget = 1.0, double bandPu = 0.015)
    {
        Bus = bus;
        VTarget = vTarget;
        BandPu = bandPu;
    }

    public required string Bus { get; init; }
    public double VTarget { get; init; } = 1.0;

    /// <summary>Width of the dead band, per unit: the tap rests while |V − vTarget| ≤ bandPu / 2.</summary>
    public double BandPu { get; init; } = 0.015;
}

/// <summary>
/// A tap changer. Position p gives the tapped winding's voltage factor 1 + (p − Neutral)·StepPercent/100.
/// Without <see cref="Regulate"/> it is a fixed (off-circuit) tap.
/// </summary>
public sealed record TapChanger
{
    public TapSide Side { get; init; } = TapSide.Hv;
    public double StepPercent { get; init; }
    public int Min { get; init; }
    public int Max { get; init; }
    public int Neutral { get; init; }
    public int Position { get; init; }
    public TapRegulation? Regulate { get; init; }
}
