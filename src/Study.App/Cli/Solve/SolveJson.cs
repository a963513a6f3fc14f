// The --json shape of `study solve` (README, "Results as JSON").
using Study.App.Reports;
using Study.Core.LoadFlow;

namespace Study.App.Cli.Solve;

public sealed record SolveBusJson(string Id, double? Kv, double VPu, double? VKv, double AngleDeg,
    double PGenMw, double QGenMvar, double PLoadMw, double QLoadMvar, string? Violation);

/// <summary>One end of a branch: its bus, the power into the branch there and the current, A (null without kV).</summary>
public sealed record BranchEndJson(string Bus, double Mw, double Mvar, double? Amps);

public sealed record BranchLossJson(double Mw, double Mvar);

public sealed record SolveBranchJson(string Id, string Kind, BranchEndJson From, BranchEndJson To, BranchLossJson Loss, double? PctOfRating);

/// <summary>A tap's final position; atLimit "lowest" or "highest" when it sits at that end of its range wanting to move further.</summary>
public sealed record SolveTapJson(string Id, int Position, string? AtLimit);

public sealed record SolveTotalsJson(double GenerationMw, double GenerationMvar, double LoadMw, double LoadMvar,
    double LossMw, double LossMvar);

public sealed record PublishedJson(string Source, double MaxVoltageDifferencePu, string? MaxVoltageBus,
    double MaxAngleDifferenceDeg, string? MaxAngleBus);

public sealed record SolveJson(bool Converged, int Iterations, double MaxMismatchPu,
    IReadOnlyList<SolveBusJson> Buses, IReadOnlyList<SolveBranchJson> Branches, IReadOnlyList<SolveTapJson> Taps,
    SolveTotalsJson? Totals)
{
    /// <summary>Only when not converged: why, and the bus to look at.</summary>
    [System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)]
    public string? Message { get; init; }

    [System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)]
    public string? WorstBus { get; init; }

    /// <summary>Only for imported cases: the largest difference from the solution published with the case.</summary>
    [System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)]
    public PublishedJson? Published { get; init; }

    /// <summary>Only with --timings: the time of each stage of the command.</summary>
    [System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)]
    public TimingsJson? Timings { get; init; }

    public static string? ViolationName(ViolationKind kind) => kind switch
    {
        ViolationKind.Low => "low",
        ViolationKind.High => "high",
        ViolationKind.Overload => "overload",
        _ => null,
    };

    public static SolveJson From(LoadFlowResult r, PublishedComparison? published)
    {
        var t = r.Totals;
        return new SolveJson(
            r.Converged, r.Iterations, r.MaxMismatchPu,
            r.Buses.Select(b => new SolveBusJson(b.Id, b.Kv > 0 ? b.Kv : null, b.VPu, b.VKv, b.AngleDeg,
                b.PGenMw, b.QGenMvar, b.PLoadMw, b.QLoadMvar, ViolationName(b.Violation))).ToList(),
            r.Branches.Select(b => new SolveBranchJson(b.Id, Labels.Kind(b.Kind),
                new BranchEndJson(b.From, b.PFromMw, b.QFromMvar, b.IFromA), new BranchEndJson(b.To, b.PToMw, b.QToMvar, b.IToA),
                new BranchLossJson(b.LossMw, b.LossMvar), b.LoadingPercent)).ToList(),
            r.Taps.Select(x => new SolveTapJson(x.Id, x.Position, Labels.Limit(x.AtLimit))).ToList(),
            r.Converged ? new SolveTotalsJson(t.GenerationMw, t.GenerationMvar, t.LoadMw, t.LoadMvar, t.LossMw, t.LossMvar) : null)
        {
            Message = r.Converged ? null : r.Message,
            WorstBus = r.Converged ? null : r.WorstBus,
            Published = published is null ? null : new PublishedJson(published.Source, published.MaxVoltageDifferencePu,
                published.MaxVoltageBus, published.MaxAngleDifferenceDeg, published.MaxAngleBus),
        };
    }
}
