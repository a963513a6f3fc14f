// Load-flow bus types, derived from what is connected to each bus.
namespace Study.Core.LoadFlow;

/// <summary>How the load flow treats a bus: its slack, PV or PQ role, or dead (no path to a source).</summary>
public enum BusType
{
    /// <summary>Fixed P and Q injection; unknowns V and angle.</summary>
    Pq,
    /// <summary>Fixed P and |V|; unknowns Q and angle.</summary>
    Pv,
    /// <summary>Fixed |V| and angle: the reference of its island.</summary>
    Slack,
    /// <summary>In an island with no slack source: de-energised, left out of the solve.</summary>
    Dead,
}
