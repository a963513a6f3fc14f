// A breaker's rating against the largest fault its bus can see.
namespace Study.Core.Faults;

public enum DutyStatus
{
    Ok,
    /// <summary>Above 90 % of a rating.</summary>
    Warning,
    /// <summary>Above 100 % of a rating.</summary>
    Over,
    /// <summary>Neither interruptingKa nor peakKa is given.</summary>
    NoRating,
    /// <summary>The bus kV is not stated, so kA cannot be compared with the rating.</summary>
    KvNotStated,
}

/// <summary>
/// Duty of one breaker: the largest I''k over the fault types studied and the largest i_p at its bus,
/// each over its rating; <see cref="DutyPercent"/> is the larger of the two.
/// </summary>
public sealed record BreakerDuty
{
    public required string Id { get; init; }
    public required string Bus { get; init; }
    public double? IkKa { get; init; }
    public double? IpKa { get; init; }
    /// <summary>The fault type that gives the largest I''k.</summary>
    public FaultKind? GoverningKind { get; init; }
    public double? InterruptingKa { get; init; }
    public double? PeakKa { get; init; }
    public double? BreakingPercent { get; init; }
    public double? MakingPercent { get; init; }
    public double? DutyPercent { get; init; }
    public DutyStatus Status { get; init; }
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
}
