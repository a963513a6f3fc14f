// The --json shape of `study taps` (README, "Results as JSON").
using System.Text.Json.Serialization;
using Study.Core.Studies;

namespace Study.App.Cli.Taps;

public sealed record TapsWatchedJson(string Bus, double VPu);

public sealed record TapsPositionJson(int Position, double Ratio, string? Scenario, IReadOnlyList<TapsWatchedJson> Watched,
    double? VMinPu, double? VMaxPu, double? LossMw, int Violations)
{
    /// <summary>Present (false) only for a position whose load flow did not converge.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)]
    public bool? Converged { get; init; }

    /// <summary>Present (true) only for a position where only a collapsed, low-voltage solution was found (never recommended).</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)]
    public bool? LowVoltage { get; init; }
}

public sealed record TapsRecommendedJson(int Position, double MarginPu);

public sealed record TapsJson(string Transformer, IReadOnlyList<TapsPositionJson> Positions, IReadOnlyList<TapsRecommendedJson> Recommended)
{
    public string Finding { get; init; } = "";

    /// <summary>Positions solved again from flat start, and why.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    public static TapsJson From(TapStudyResult r) => new(
        r.Transformer,
        r.Points.Select(p => new TapsPositionJson(p.Position, p.Ratio, p.Scenario,
            p.Watched.Select(w => new TapsWatchedJson(w.Bus, w.VPu)).ToList(),
            p.Converged ? p.VMinPu : null, p.Converged ? p.VMaxPu : null, p.Converged ? p.LossMw : null, p.Violations)
        {
            Converged = p.Converged ? null : false,
            LowVoltage = p.LowVoltage ? true : null,
        }).ToList(),
        r.Recommended.Select(x => new TapsRecommendedJson(x.Position, x.MarginPu)).ToList())
    {
        Finding = r.Finding,
        Notes = r.Notes,
    };
}
