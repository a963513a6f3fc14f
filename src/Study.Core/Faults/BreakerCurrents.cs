// The currents one breaker carries for one fault at its bus, at its own time of contact separation.
namespace Study.Core.Faults;

/// <summary>Which current a breaker's duty is figured from.</summary>
public enum DutySide
{
    /// <summary>A breaker that sees its whole bus: the bus fault current.</summary>
    Bus,
    /// <summary>Fault on the bus side of a breaker that switches a branch: the branch's own contribution flows through it.</summary>
    BusSideFault,
    /// <summary>Fault on the branch side: the bus total minus the branch's contribution (phasor difference) flows through it.</summary>
    BranchSideFault,
}

/// <summary>
/// One side's currents, pu of the bus base current: I''k, the symmetrical breaking current I_b, the DC
/// component i_DC and the asymmetric breaking current at t_min, the peak i_p (the bus's κ) and the thermal
/// equivalent I_th for the study's fault duration.
/// </summary>
public sealed record SideCurrents(DutySide Side, double IkPu, double IbPu, double IdcPu, double IbAsymPu, double IpPu, double IthPu);

/// <summary>
/// What a breaker carries for one fault at its bus, at its own t_min: one <see cref="SideCurrents"/> for a
/// breaker that sees the whole bus, two for one that switches a branch. <see cref="DecayCredited"/> is false
/// when the branch does not split the network in two, so no machine's decay could be placed on either side
/// and I_b is taken as I''k on both (conservative).
/// </summary>
public sealed record BreakerCurrents(string Breaker, double TMinS, double DcROverX, IReadOnlyList<SideCurrents> Sides, bool DecayCredited = true);
