// Compare two cases — two networks (before and after a change) or two scenarios — bus by bus and branch by branch.
using Study.Core.LoadFlow;

namespace Study.Core.Studies;

/// <summary>
/// Matches buses and branches by id. An element in one case only is listed as added or removed
/// rather than dropped, so a new bank's buses show up in the comparison.
/// </summary>
public static class CaseComparison
{
    public static CaseComparisonResult Compare(LoadFlowResult before, LoadFlowResult after)
    {
        var result = new CaseComparisonResult
        {
            BeforeConverged = before.Converged, AfterConverged = after.Converged,
            BeforeMessage = before.Message, AfterMessage = after.Message,
            BeforeScenario = before.Scenario, AfterScenario = after.Scenario,
        };
        if (!before.Converged || !after.Converged) return result;
        return result with
        {
            Buses = Buses(before.Buses, after.Buses),
            Branches = Branches(before.Branches, after.Branches),
            Taps = before.Taps.Select(t => new TapChange(t.Id, t.Position, after.Taps.FirstOrDefault(a => a.Id == t.Id)?.Position))
                .Concat(after.Taps.Where(a => !before.Taps.Any(t => t.Id == a.Id)).Select(a => new TapChange(a.Id, null, a.Position)))
                .ToList(),
            LossBeforeMw = before.Totals.LossMw, LossAfterMw = after.Totals.LossMw,
            LoadBeforeMw = before.Totals.LoadMw, LoadAfterMw = after.Totals.LoadMw,
            ViolationsAppeared = Missing(after.Violations, before.Violations),
            ViolationsCleared = Missing(before.Violations, after.Violations),
        };
    }

    private static List<BusChange> Buses(IReadOnlyList<BusResult> before, IReadOnlyList<BusResult> after)
    {
        static double? Live(BusResult? b) => b is { Energised: true } ? b.VPu : null;
        var afterById = after.ToDictionary(b => b.Id);
        var beforeIds = before.Select(b => b.Id).ToHashSet();
        var list = before.Select(b =>
        {
            BusResult? a = afterById.GetValueOrDefault(b.Id);
            return new BusChange
            {
                Id = b.Id, Kv = b.Kv, Membership = a is null ? CaseMembership.Removed : CaseMembership.Both,
                BeforePu = Live(b), AfterPu = Live(a),
            };
        }).ToList();
        list.AddRange(after.Where(a => !beforeIds.Contains(a.Id))
            .Select(a => new BusChange { Id = a.Id, Kv = a.Kv, Membership = CaseMembership.Added, AfterPu = Live(a) }));
        return list;
    }

    private static List<BranchChange> Branches(IReadOnlyList<BranchResult> before, IReadOnlyList<BranchResult> after)
    {
        var afterById = after.ToDictionary(b => b.Id);
        var beforeIds = before.Select(b => b.Id).ToHashSet();
        var list = before.Select(b =>
        {
            BranchResult? a = afterById.GetValueOrDefault(b.Id);
            return new BranchChange
            {
                Id = b.Id, Kind = b.Kind, Membership = a is null ? CaseMembership.Removed : CaseMembership.Both,
                BeforeMw = b.PFromMw, AfterMw = a?.PFromMw,
                BeforeLoadingPercent = b.LoadingPercent, AfterLoadingPercent = a?.LoadingPercent,
            };
        }).ToList();
        list.AddRange(after.Where(a => !beforeIds.Contains(a.Id)).Select(a => new BranchChange
        {
            Id = a.Id, Kind = a.Kind, Membership = CaseMembership.Added, AfterMw = a.PFromMw, AfterLoadingPercent = a.LoadingPercent,
        }));
        return list;
    }

    /// <summary>Violations of <paramref name="of"/> with no violation of the same element and kind in <paramref name="against"/>.</summary>
    private static List<Violation> Missing(IReadOnlyList<Violation> of, IReadOnlyList<Violation> against) =>
        of.Where(v => !against.Any(x => x.Element == v.Element && x.Type == v.Type)).ToList();
}
