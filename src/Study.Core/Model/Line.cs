// An overhead line or cable between two buses, as a pi section.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>How the r, x and b of a line's sequence data are given.</summary>
[JsonConverter(typeof(JsonStringEnumConverter<ImpedanceBasis>))]
public enum ImpedanceBasis
{
    /// <summary>"km": r and x in Ω per km, b in µS per km, times the line's <see cref="Line.Km"/>.</summary>
    [JsonStringEnumMemberName("km")]
    PerKm,

    /// <summary>"line": r and x in Ω and b in µS for the whole line.</summary>
    [JsonStringEnumMemberName("line")]
    WholeLine,

    /// <summary>"pu": r, x and b (total charging) in per unit on the system base.</summary>
    [JsonStringEnumMemberName("pu")]
    PerUnit,
}

/// <summary>The conductor material, for the resistance at the end-of-fault temperature.</summary>
[JsonConverter(typeof(JsonStringEnumConverter<ConductorMaterial>))]
public enum ConductorMaterial
{
    [JsonStringEnumMemberName("copper")]
    Copper,
    [JsonStringEnumMemberName("aluminium")]
    Aluminium,
}

/// <summary>One sequence of a line (z1: positive, z0: zero): series r + jx and shunt charging b, on one basis.</summary>
public sealed record SequenceImpedance
{
    public SequenceImpedance() { }

    /// <summary>Used when reading a file: <c>per</c>, <c>r</c> and <c>x</c> are required, <c>b</c> is optional.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal SequenceImpedance(ImpedanceBasis per, double r, double x, double? b = null)
    {
        Per = per;
        R = r;
        X = x;
        B = b;
    }

    public required ImpedanceBasis Per { get; init; }

    /// <summary>Series resistance (Ω/km, Ω or pu by <see cref="Per"/>).</summary>
    public required double R { get; init; }

    /// <summary>Series reactance (Ω/km, Ω or pu by <see cref="Per"/>).</summary>
    public required double X { get; init; }

    /// <summary>Shunt charging susceptance (µS/km, µS or pu by <see cref="Per"/>); null when not given (no charging).</summary>
    public double? B { get; init; }
}

/// <summary>
/// A line or cable: its length, its positive-sequence data <see cref="Z1"/> and, for earth faults, its
/// zero-sequence data <see cref="Z0"/>, each on its own basis (per km, whole line, or per unit).
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

    /// <summary>Route length in km; needed when a sequence is given per km.</summary>
    public double? Km { get; init; }

    /// <summary>Positive-sequence data (also the negative sequence).</summary>
    public SequenceImpedance? Z1 { get; init; }

    /// <summary>Zero-sequence data; null when not given (earth-fault studies then refuse the line).</summary>
    public SequenceImpedance? Z0 { get; init; }

    /// <summary>Thermal rating, MVA; null when not given (no loading is reported).</summary>
    public double? RatingMva { get; init; }

    /// <summary>Conductor material (its temperature coefficient of resistance); null when not given.</summary>
    public ConductorMaterial? Conductor { get; init; }
    public bool InService { get; init; } = true;
}
