// What a motor-start study produces: every bus before and during the start, and each started motor's terminal voltage.
using Study.Core.Faults;
using Study.Core.Model;

namespace Study.Core.Studies;

/// <summary>One bus at the instant of starting: its voltage before and during, and the dip.</summary>
public sealed record StartBus(string Id, double Kv, double BeforePu, double DuringPu, double DipPercent, bool Watched, bool AtStartedMotor);

/// <summary>
/// One started motor: the voltage at its bus during the start, the line current it draws (pu of its bus base
/// current, kA when the kV is known, and in multiples of its rated current) and whether it still gets the
/// minimum voltage. <see cref="CurrentLimited"/> is true for a soft starter holding its limit.
/// </summary>
public sealed record StartedMotor(string Id, string Bus, StarterMethod Starter, double TerminalPu, double CurrentPu, double? CurrentKa,
    double CurrentPerRated, bool CurrentLimited, bool Ok);

public sealed record MotorStartResult
{
    /// <summary>Why the study could not run (the pre-start load flow did not converge); null when it ran.</summary>
    public string? Failure { get; init; }
    public bool Completed => Failure is null;
    /// <summary>The caution every fault, duty and start output carries (<see cref="FaultStudy.Caution"/>).</summary>
    public string Caution { get; init; } = FaultStudy.Caution;
    public string? Scenario { get; init; }
    public IReadOnlyList<string> Motors { get; init; } = [];
    public double MinTerminalPu { get; init; }
    /// <summary>Every bus (internal star points excepted), in network order.</summary>
    public IReadOnlyList<StartBus> Buses { get; init; } = [];
    public IReadOnlyList<StartedMotor> Started { get; init; } = [];
    /// <summary>The lowest terminal voltage among the started motors, pu.</summary>
    public double MotorTerminalPu { get; init; }
    /// <summary>True when every started motor gets at least <see cref="MinTerminalPu"/>.</summary>
    public bool Ok { get; init; }
    /// <summary>How the sources and loads were taken (assumptions the engineer should see).</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
