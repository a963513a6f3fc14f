// A fixed shunt element: capacitor bank, reactor, or bus shunt conductance.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>
/// A shunt at a bus, rated at 1 pu voltage. Positive QMvar is capacitive (supplies reactive power);
/// a reactor has negative QMvar. PMw is the active power it absorbs.
/// </summary>
public sealed record Shunt
{
    public Shunt() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Shunt(string id, string bus, bool inService = true)
    {
        Id = id;
        Bus = bus;
        InService = inService;
    }

    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double QMvar { get; init; }
    public double PMw { get; init; }
    public bool InService { get; init; } = true;
}
