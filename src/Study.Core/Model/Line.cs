// An overhead line or cable between two buses, as a pi section.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>
/// A line or cable. Exactly one impedance form: per km (with LengthKm), totals in ohm, or system per-unit.
/// </summary>
public sealed record Line
{
    public Line() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Line(string id, string from, string to, bool inService = true)
    {
        Id = id;
        From = from;
        To = to;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string From { get; init; }
    public required string To { get; init; }

    public double? LengthKm { get; init; }
    public double? ROhmPerKm { get; init; }
    public double? XOhmPerKm { get; init; }
    /// <summary>Shunt susceptance per km, microsiemens.</summary>
    public double? BUsPerKm { get; init; }
    public double? R0OhmPerKm { get; init; }
    public double? X0OhmPerKm { get; init; }
    public double? B0UsPerKm { get; init; }

    public double? ROhm { get; init; }
    public double? XOhm { get; init; }
    public double? BUs { get; init; }
    public double? R0Ohm { get; init; }
    public double? X0Ohm { get; init; }
    public double? B0Us { get; init; }

    public double? RPu { get; init; }
    public double? XPu { get; init; }
    /// <summary>Total line charging susceptance, per unit on the system base.</summary>
    public double? BPu { get; init; }
    public double? R0Pu { get; init; }
    public double? X0Pu { get; init; }
    public double? B0Pu { get; init; }

    public double? RatingMva { get; init; }
    public bool InService { get; init; } = true;
}
