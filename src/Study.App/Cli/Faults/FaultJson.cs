// The --json shape of `study fault` (README, "Results as JSON").
using System.Numerics;
using Study.Core.Faults;

namespace Study.App.Cli.Faults;

public sealed record FaultContributionJson(string Branch, double? IkKa);

/// <summary>
/// One fault; kA, kV and ohm values are null when the bus kV is not stated; a sequence impedance is null when
/// open. ibKa, idcKa and ibAsymKa are at the study's t_min, ithKa for its T_k, ikSteadyKa without motors.
/// </summary>
public sealed record FaultLevelJson(string Bus, double? Kv, string Type, double? IkKa, double SkMva, double? XOverR, double Kappa,
    double? IpKa, double? IbKa, double? IdcKa, double? IbAsymKa, double? IkSteadyKa, double? IthKa,
    double[]? Z1Ohm, double[]? Z2Ohm, double[]? Z0Ohm, IReadOnlyList<FaultContributionJson> Contributions);

/// <summary>One check of a breaker: the largest current over the fault types (and both sides of its branch) against its rating.</summary>
public sealed record FaultCheckJson(string Check, double? RequiredKa, double? RatedKa, double? DutyPercent, string Status,
    string? Type, string Side, double? DcPercent, double? RatedDcPercent);

public sealed record FaultBreakerJson(string Id, string Bus, string? Branch, double TMinS, double? DutyPercent, string Status,
    IReadOnlyList<FaultCheckJson> Checks);

public sealed record FaultJson(string Method, string Caution, double TMinS, double TkS, string BreakingCurrent, double? LineTemperatureC,
    IReadOnlyList<FaultLevelJson> Faults, IReadOnlyList<FaultBreakerJson> Breakers)
{
    /// <summary>Only with --timings: the time of each stage of the command.</summary>
    [System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)]
    public TimingsJson? Timings { get; init; }

    public static FaultJson From(FaultResult r) => new(
        r.Method.Code(),
        r.Caution,
        r.TMinS,
        r.TkS,
        r.Breaking == Study.Core.Faults.BreakingCurrent.Decay ? "decay" : "conservative",
        r.LineTemperatureC,
        r.Faults.Select(f => new FaultLevelJson(f.Bus, f.Kv > 0 ? f.Kv : null, f.Kind.Code(), f.IkKa, f.SkMva, f.XOverR, f.Kappa, f.IpKa,
            f.IbKa, f.IdcKa, f.IbAsymKa, f.IkSteadyKa, f.IthKa,
            Pair(f.Z1Ohm), Pair(f.Z2Ohm), Pair(f.Z0Ohm),
            f.Contributions.Select(c => new FaultContributionJson(c.Branch, c.IkKa)).ToList())).ToList(),
        r.Breakers.Select(b => new FaultBreakerJson(b.Id, b.Bus, b.Branch, b.TMinS, b.DutyPercent, b.Status.Code(),
            b.Checks.Select(c => new FaultCheckJson(c.Check.Code(), c.RequiredKa, c.RatedKa, c.DutyPercent, c.Status.Code(),
                c.Kind?.Code(), c.Side.Code(), c.DcPercent, c.RatedDcPercent)).ToList())).ToList());

    private static double[]? Pair(Complex? z) => z is Complex v ? [v.Real, v.Imaginary] : null;
}
