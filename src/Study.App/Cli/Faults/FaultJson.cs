// The --json shape of `study fault` (README, "Results as JSON").
using System.Numerics;
using Study.Core.Faults;

namespace Study.App.Cli.Faults;

public sealed record FaultContributionJson(string Branch, double? IkKa);

/// <summary>One fault; kA, kV and ohm values are null when the bus kV is not stated; a sequence impedance is null when open.</summary>
public sealed record FaultLevelJson(string Bus, double? Kv, string Type, double? IkKa, double SkMva, double? XOverR, double Kappa,
    double? IpKa, double[]? Z1Ohm, double[]? Z2Ohm, double[]? Z0Ohm, IReadOnlyList<FaultContributionJson> Contributions);

public sealed record FaultBreakerJson(string Id, string Bus, double? DutyPercent, string Status);

public sealed record FaultJson(string Method, string Caution, IReadOnlyList<FaultLevelJson> Faults, IReadOnlyList<FaultBreakerJson> Breakers)
{
    /// <summary>Only with --timings: the time of each stage of the command.</summary>
    [System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)]
    public TimingsJson? Timings { get; init; }

    public static FaultJson From(FaultResult r) => new(
        r.Method.Code(),
        r.Caution,
        r.Faults.Select(f => new FaultLevelJson(f.Bus, f.Kv > 0 ? f.Kv : null, f.Kind.Code(), f.IkKa, f.SkMva, f.XOverR, f.Kappa, f.IpKa,
            Pair(f.Z1Ohm), Pair(f.Z2Ohm), Pair(f.Z0Ohm),
            f.Contributions.Select(c => new FaultContributionJson(c.Branch, c.IkKa)).ToList())).ToList(),
        r.Breakers.Select(b => new FaultBreakerJson(b.Id, b.Bus, b.DutyPercent, b.Status.Code())).ToList());

    private static double[]? Pair(Complex? z) => z is Complex v ? [v.Real, v.Imaginary] : null;
}
