// A circuit breaker at a bus (switching one branch there, or the bus as a whole), with its ratings.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>
/// A breaker at a bus, switching <see cref="Branch"/> there when given. Ratings (IEC 62271-100 terms): rated
/// short-circuit breaking current, its DC component, making (peak) current, short-time current for a
/// time; <see cref="MinTripS"/> is relay plus opening time, the minimum time delay t_min of IEC 60909-0.
/// </summary>
public sealed record Breaker
{
    public Breaker() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Breaker(string id, string bus, bool inService = true)
    {
        Id = id;
        Bus = bus;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }

    /// <summary>The line or transformer the breaker switches at its bus; null for a breaker that sees the whole bus.</summary>
    public string? Branch { get; init; }

    /// <summary>Rated symmetrical short-circuit breaking current, kA; 0 when not given.</summary>
    public double InterruptingKa { get; init; }

    /// <summary>Rated short-circuit making (peak) current, kA; 0 when not given.</summary>
    public double PeakKa { get; init; }

    /// <summary>Rated DC component of the breaking current, percent of the peak of the symmetrical current.</summary>
    public double? DcPercent { get; init; }

    /// <summary>Rated short-time withstand current, kA, for <see cref="ShortTimeS"/>.</summary>
    public double? ShortTimeKa { get; init; }

    /// <summary>Rated duration of the short-time current, s; 1 s taken when not given.</summary>
    public double? ShortTimeS { get; init; }

    /// <summary>Relay plus opening time, s: the minimum time delay t_min at which the breaker's contacts part.</summary>
    public double? MinTripS { get; init; }

    public bool InService { get; init; } = true;
}
