// The result of one fault at one bus: currents, power, X/R, peak factor, sequence impedances, voltages, contributions.
using System.Numerics;

namespace Study.Core.Faults;

/// <summary>Whether a branch feeds the fault or carries current away from the faulted bus.</summary>
public enum ContributionDirection
{
    IntoFault,
    AwayFromFault,
    /// <summary>The branch carries no fault current (a radial feeder with nothing behind it, say).</summary>
    None,
}

/// <summary>
/// One branch's fault-induced current at the faulted end (the largest of its three phase currents).
/// <see cref="OtherBus"/> is the far end (a three-winding bank's internal star shows as "ID/star").
/// </summary>
public sealed record BranchContribution(string Branch, string OtherBus, double IkPu, double? IkKa, ContributionDirection Direction);

/// <summary>Post-fault phase-voltage magnitudes in pu of the bus base (phase a is the faulted phase of an slg fault).</summary>
public sealed record PhaseVoltages(string Bus, bool Faulted, double VaPu, double VbPu, double VcPu);

/// <summary>
/// One fault at one bus. Sequence Thevenin impedances are null where that sequence network has no
/// path to a source or to earth from the bus (an open circuit: no current). Quantities in kA and ohm
/// are null when the bus kV is not stated.
/// </summary>
public sealed record ShortCircuitLevel
{
    public required string Bus { get; init; }
    /// <summary>Nominal voltage U_n (the bus base kV); 0 when not stated.</summary>
    public double Kv { get; init; }
    public FaultKind Kind { get; init; }
    /// <summary>Voltage factor c of the equivalent source (IEC 60909); |V_pre| in pu for the load-flow method.</summary>
    public double VoltageFactor { get; init; }

    /// <summary>I''k in pu of the bus base current: the largest phase current (for dlg, IEC's I''k2E).</summary>
    public double IkPu { get; init; }
    public double? IkKa { get; init; }
    /// <summary>Earth current |3·I0| (slg, dlg: IEC's I''kE2E for dlg); zero for 3ph and ll.</summary>
    public double EarthCurrentPu { get; init; }
    public double? EarthCurrentKa { get; init; }
    /// <summary>S''k = √3·U_n·I''k, MVA (in pu terms I''k·S_base, so known without kV).</summary>
    public double SkMva { get; init; }

    /// <summary>R/X and X/R of the positive-sequence impedance at the fault, Z_k = Z1.</summary>
    public double ROverX { get; init; }
    /// <summary>Null when R is zero (X/R unbounded).</summary>
    public double? XOverR { get; init; }
    /// <summary>R/X used for κ: by the equivalent frequency f_c (IEC 60909-0 §8.1.3 method C, from memory).</summary>
    public double KappaROverX { get; init; }
    public double Kappa { get; init; }
    public double IpPu { get; init; }
    public double? IpKa { get; init; }

    /// <summary>Symmetrical breaking current I_b at the study's t_min (IEC 60909-0 §9.1; I''k for unbalanced faults).</summary>
    public double IbPu { get; init; }
    public double? IbKa { get; init; }
    /// <summary>DC component i_DC at t_min, with <see cref="DcROverX"/> by the equivalent frequency for f·t_min.</summary>
    public double IdcPu { get; init; }
    public double? IdcKa { get; init; }
    public double DcROverX { get; init; }
    /// <summary>Asymmetric breaking current √(I_b² + i_DC²).</summary>
    public double IbAsymPu { get; init; }
    public double? IbAsymKa { get; init; }
    /// <summary>Steady-state current I_k: I''k with the motors left out (far from generators).</summary>
    public double IkSteadyPu { get; init; }
    public double? IkSteadyKa { get; init; }
    /// <summary>Thermal equivalent current I_th = I''k·√(m + n) for the study's fault duration, and its m.</summary>
    public double IthPu { get; init; }
    public double? IthKa { get; init; }
    public double ThermalM { get; init; }

    /// <summary>Three-phase faults: each generator's and motor's own current and the share that decays (empty otherwise).</summary>
    public IReadOnlyList<MachineContribution> Machines { get; init; } = [];

    /// <summary>The currents each breaker at this bus carries for this fault (its duty is the largest over the fault types).</summary>
    public IReadOnlyList<BreakerCurrents> BreakerCurrents { get; init; } = [];

    public Complex? Z1Pu { get; init; }
    public Complex? Z2Pu { get; init; }
    public Complex? Z0Pu { get; init; }
    public Complex? Z1Ohm { get; init; }
    public Complex? Z2Ohm { get; init; }
    public Complex? Z0Ohm { get; init; }

    public IReadOnlyList<PhaseVoltages> Voltages { get; init; } = [];
    public IReadOnlyList<BranchContribution> Contributions { get; init; } = [];
}
