// The --json shape of `study compare` (README, "Results as JSON"); null voltages mark added, removed or dead buses.
using Study.App.Cli.Solve;
using Study.Core.LoadFlow;
using Study.Core.Studies;

using Study.App.Reports;
namespace Study.App.Cli.Compare;

public sealed record CompareBusJson(string Id, double? BeforePu, double? AfterPu, double? DeltaPu);

public sealed record CompareBranchJson(string Id, double? BeforeMw, double? AfterMw, double? BeforeLoadingPercent, double? AfterLoadingPercent);

public sealed record CompareViolationJson(string Element, string Kind, string? Type, double Value, double Limit);

public sealed record CompareJson(IReadOnlyList<CompareBusJson> Buses, IReadOnlyList<CompareBranchJson> Branches,
    double LossBeforeMw, double LossAfterMw,
    IReadOnlyList<CompareViolationJson> ViolationsAppeared, IReadOnlyList<CompareViolationJson> ViolationsCleared)
{
    /// <summary>What each side is: file and scenario.</summary>
    public string Before { get; init; } = "";
    public string After { get; init; } = "";

    public static CompareJson From(CaseComparisonResult r, string before, string after) => new(
        r.Buses.Select(b => new CompareBusJson(b.Id, b.BeforePu, b.AfterPu, b.DeltaPu)).ToList(),
        r.Branches.Select(b => new CompareBranchJson(b.Id, b.BeforeMw, b.AfterMw, b.BeforeLoadingPercent, b.AfterLoadingPercent)).ToList(),
        r.LossBeforeMw, r.LossAfterMw, r.ViolationsAppeared.Select(Of).ToList(), r.ViolationsCleared.Select(Of).ToList())
    {
        Before = before, After = after,
    };

    private static CompareViolationJson Of(Violation v) => new(v.Element, Labels.Kind(v.Kind), SolveJson.ViolationName(v.Type), v.Value, v.Limit);
}
