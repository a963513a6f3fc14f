// A motor in the compiled model: what fault studies and motor starts need (its running load is a PuLoad).
using System.Numerics;
using Study.Core.Model;

namespace Study.Core.Units;

/// <summary>
/// A motor (all its units) at an in-service bus, per unit on the system base at that bus. Its running load
/// is compiled as a <see cref="PuLoad"/> with <see cref="PuLoad.Motor"/> set, so every load flow sees it.
/// </summary>
public sealed record PuMotor
{
    public required string Id { get; init; }
    public int Bus { get; init; }
    /// <summary>Fault impedance Z_M = R_M + jX_M (IEC 60909-0), positive and negative sequence.</summary>
    public Complex ZPu { get; init; }
    public double ROverX { get; init; }
    /// <summary>Rated current of all units, in pu of the bus base current.</summary>
    public double RatedCurrentPu { get; init; }
    public double RatedMva { get; init; }
    /// <summary>Rated output per pole pair, MW (of the whole group for a low-voltage group): the m of the factor q.</summary>
    public double MwPerPolePair { get; init; }
    /// <summary>A low-voltage group or a motor at or below 1 kV.</summary>
    public bool LowVoltage { get; init; }
    /// <summary>Locked-rotor impedance of all units at the locked-rotor power factor.</summary>
    public Complex LockedRotorZPu { get; init; }
    /// <summary>I_LR/I_rM.</summary>
    public double CurrentRatio { get; init; }
    public MotorStarter Starter { get; init; } = new();
    public int Units { get; init; } = 1;
}
