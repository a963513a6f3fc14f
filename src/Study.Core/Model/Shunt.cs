// A fixed shunt element: capacitor bank, reactor, or bus shunt conductance.
namespace Study.Core.Model;

/// <summary>
/// A shunt at a bus, rated at 1 pu voltage. Positive QMvar is capacitive (supplies reactive power);
/// a reactor has negative QMvar. PMw is the active power it absorbs.
/// </summary>
public sealed record Shunt
{
    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double QMvar { get; init; }
    public double PMw { get; init; }
    public bool InService { get; init; } = true;
}
