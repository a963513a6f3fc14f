// A breaker's ratings against the currents it must break, make and carry for the faults at its bus.
namespace Study.Core.Faults;

public enum DutyStatus
{
    Ok,
    /// <summary>Above 90 % of a rating.</summary>
    Warning,
    /// <summary>Above 100 % of a rating.</summary>
    Over,
    /// <summary>The rating this check needs is not given.</summary>
    NoRating,
    /// <summary>The bus kV is not stated, so kA cannot be compared with the rating.</summary>
    KvNotStated,
}

/// <summary>The checks of a breaker's duty, each against its own rating.</summary>
public enum DutyCheckKind
{
    /// <summary>Symmetrical breaking current I_b at the breaker's t_min against interruptingKa.</summary>
    Breaking,
    /// <summary>Asymmetric breaking current √(I_b² + i_DC²) against interruptingKa·√(1 + 2·(dcPercent/100)²).</summary>
    BreakingAsym,
    /// <summary>Peak i_p against peakKa.</summary>
    Making,
    /// <summary>Thermal equivalent I_th for the fault duration, referred to shortTimeS, against shortTimeKa.</summary>
    ShortTime,
}

/// <summary>One check of one breaker: the largest current it must stand over the fault types studied, against its rating.</summary>
public sealed record DutyCheck
{
    public DutyCheckKind Check { get; init; }
    /// <summary>The fault type and the side that give the largest current.</summary>
    public FaultKind? Kind { get; init; }
    public DutySide Side { get; init; }
    public double? RequiredKa { get; init; }
    public double? RatedKa { get; init; }
    public double? DutyPercent { get; init; }
    public DutyStatus Status { get; init; }
    /// <summary>Breaking asymmetric: the DC component at contact separation, 100·i_DC/(√2·I_b), and the rated one.</summary>
    public double? DcPercent { get; init; }
    public double? RatedDcPercent { get; init; }
}

/// <summary>
/// Duty of one breaker: every check with its own status; <see cref="DutyPercent"/> and <see cref="Status"/>
/// are those of the worst check. <see cref="IkKa"/> and <see cref="IpKa"/> are the largest I''k and i_p the
/// breaker carries over the fault types studied (for a breaker on a branch, the larger side).
/// </summary>
public sealed record BreakerDuty
{
    public required string Id { get; init; }
    public required string Bus { get; init; }
    /// <summary>The branch it switches; null for a breaker that sees its whole bus.</summary>
    public string? Branch { get; init; }
    /// <summary>Its minimum time delay (its own minTripS, else the study's t_min), s.</summary>
    public double TMinS { get; init; }
    public double? IkKa { get; init; }
    public double? IpKa { get; init; }
    /// <summary>The fault type that gives the largest I''k.</summary>
    public FaultKind? GoverningKind { get; init; }
    public double? InterruptingKa { get; init; }
    public double? PeakKa { get; init; }
    /// <summary>The breaking check's percent (I_b over interruptingKa).</summary>
    public double? BreakingPercent { get; init; }
    /// <summary>The making check's percent (i_p over peakKa).</summary>
    public double? MakingPercent { get; init; }
    public double? DutyPercent { get; init; }
    public DutyStatus Status { get; init; }
    public IReadOnlyList<DutyCheck> Checks { get; init; } = [];
}

public static class DutyStatusNames
{
    public static string Code(this DutyStatus status) => status switch
    {
        DutyStatus.Ok => "ok",
        DutyStatus.Warning => "warning",
        DutyStatus.Over => "over",
        DutyStatus.NoRating => "no rating",
        _ => "kV not stated",
    };

    /// <summary>"breaking", "breakingAsym", "making", "shortTime" (JSON and reports).</summary>
    public static string Code(this DutyCheckKind check) => check switch
    {
        DutyCheckKind.Breaking => "breaking",
        DutyCheckKind.BreakingAsym => "breakingAsym",
        DutyCheckKind.Making => "making",
        _ => "shortTime",
    };

    /// <summary>"bus", "bus-side fault", "branch-side fault".</summary>
    public static string Code(this DutySide side) => side switch
    {
        DutySide.Bus => "bus",
        DutySide.BusSideFault => "bus-side fault",
        _ => "branch-side fault",
    };
}
