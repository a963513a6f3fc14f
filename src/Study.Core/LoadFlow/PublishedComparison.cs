// For imported cases: how far a solved load flow sits from the solution published with the case.
using Study.Core.Model;

namespace Study.Core.LoadFlow;

/// <summary>Largest voltage and angle differences from a published solution, and where they are.</summary>
public sealed record PublishedComparison
{
    public required string Source { get; init; }
    public int BusesCompared { get; init; }
    public double MaxVoltageDifferencePu { get; init; }
    public string? MaxVoltageBus { get; init; }
    public double MaxAngleDifferenceDeg { get; init; }
    public string? MaxAngleBus { get; init; }

    /// <summary>Null when the network carries no published solution or the solve failed.</summary>
    public static PublishedComparison? Compare(Network network, LoadFlowResult result)
    {
        if (network.PublishedSolution is not { } published || !result.Converged) return null;
        var solved = result.Buses.ToDictionary(b => b.Id);
        double dv = 0, da = 0;
        string? vBus = null, aBus = null;
        int count = 0;
        foreach (PublishedBus p in published.Buses)
        {
            if (!solved.TryGetValue(p.Id, out BusResult? b)) continue;
            count++;
            double v = Math.Abs(b.VPu - p.VPu), a = Math.Abs(b.AngleDeg - p.AngleDeg);
            if (v > dv) { dv = v; vBus = p.Id; }
            if (a > da) { da = a; aBus = p.Id; }
        }
        return new PublishedComparison
        {
            Source = published.Source ?? "published solution",
            BusesCompared = count,
            MaxVoltageDifferencePu = dv, MaxVoltageBus = vBus,
            MaxAngleDifferenceDeg = da, MaxAngleBus = aBus,
        };
    }
}
