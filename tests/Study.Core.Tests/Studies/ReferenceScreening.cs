// The outage screening by its definition, for checking the engine against: each outage rebuilt as a
// model without the element and solved from scratch, its result records compared with the intact ones.
using Study.Core.LoadFlow;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.Core.Tests.Studies;

/// <summary>
/// What the screening was before outages became changes of values: for each element, the model
/// without it (<see cref="PerUnitModel.WithoutBranch"/>) solved by <see cref="LoadFlowSolver"/> warm
/// started from the intact result, then judged from the two results' bus, branch and violation
/// records. Slow (a new pattern, analysis and factorisation per outage) and plain, so the fast path
/// can be held to it.
/// </summary>
internal static class ReferenceScreening
{
    private const double WorseLoadingPercent = 0.1, WorseVoltagePu = 1e-4;

    /// <summary>Per scenario: the intact result and every outage, ranked as the engine ranks them.</summary>
    public static IReadOnlyList<(LoadFlowResult Intact, IReadOnlyList<OutageCase> Outages)> Run(
        IReadOnlyList<PerUnitModel> models, IReadOnlyList<OutageElement> elements)
    {
        var scenarios = new List<(LoadFlowResult, IReadOnlyList<OutageCase>)>();
        for (int s = 0; s < models.Count; s++)
        {
            LoadFlowResult intact = LoadFlowSolver.Solve(models[s]);
            var cases = new List<OutageCase>();
            for (int e = 0; e < elements.Count; e++)
            {
                LoadFlowResult outage = LoadFlowSolver.Solve(models[s].WithoutBranch(elements[e].Id),
                    LoadFlowOptions.Default with { WarmStart = intact.Converged ? intact : null });
                cases.Add(Assess(elements[e], models[s].Scenario?.Name, intact, outage) with { Order = s * elements.Count + e });
            }
            scenarios.Add((intact, OutageScreening.Rank(cases)));
        }
        return scenarios;
    }

    private static OutageCase Assess(OutageElement element, string? scenario, LoadFlowResult intact, LoadFlowResult outage)
    {
        if (!outage.Converged)
            return new OutageCase
            {
                Element = element.Id, Kind = element.Kind, Scenario = scenario, Converged = false, Message = outage.Message,
                Severity = OutageSeverity.NoConvergence,
            };

        var intactBuses = intact.Buses.ToDictionary(b => b.Id);
        var islanded = outage.Buses
            .Where(b => !b.Energised && (!intactBuses.TryGetValue(b.Id, out var i) || i.Energised)).ToList();
        double lostLoad = islanded.Sum(b => intactBuses.TryGetValue(b.Id, out var i) ? i.PLoadMw : 0);
        double lostGeneration = islanded.Sum(b => intactBuses.TryGetValue(b.Id, out var i) ? i.PGenMw : 0);

        var newViolations = NewViolations(intact.Violations, outage.Violations);
        double stress = newViolations.Sum(OutageSeverity.Excursion);
        BusResult? worstBus = outage.Buses.Where(b => b.Energised).MinBy(b => Math.Min(b.VPu - b.VMin, b.VMax - b.VPu));
        BranchResult? worstBranch = outage.Branches.Where(b => b.LoadingPercent is not null).MaxBy(b => b.LoadingPercent);
        return new OutageCase
        {
            Element = element.Id, Kind = element.Kind, Scenario = scenario, Converged = true,
            IslandedBuses = islanded.Select(b => b.Id).ToList(), LostLoadMw = lostLoad, LostGenerationMw = lostGeneration,
            NewViolations = newViolations,
            WorstVPu = worstBus?.VPu, WorstVBus = worstBus?.Id,
            WorstLoadingPercent = worstBranch?.LoadingPercent, WorstLoadingElement = worstBranch?.Id,
            ParallelLoadings = element.Terminals.Count != 2 ? [] : outage.Branches
                .Where(b => (b.From == element.Terminals[0] && b.To == element.Terminals[1])
                         || (b.From == element.Terminals[1] && b.To == element.Terminals[0]))
                .Select(b => new ParallelLoading(b.Id, b.LoadingPercent)).ToList(),
            StressPercent = stress,
            Severity = OutageSeverity.Score(true, lostLoad, intact.Converged ? intact.Totals.LoadMw : outage.Totals.LoadMw + lostLoad, stress),
        };
    }

    private static List<OutageViolation> NewViolations(IReadOnlyList<Violation> intact, IReadOnlyList<Violation> outage)
    {
        var list = new List<OutageViolation>();
        foreach (Violation v in outage)
        {
            Violation? before = intact.FirstOrDefault(i => i.Element == v.Element && i.Type == v.Type);
            bool worse = before is null || v.Type switch
            {
                ViolationKind.Overload => v.Value > before.Value + WorseLoadingPercent,
                ViolationKind.Low => v.Value < before.Value - WorseVoltagePu,
                _ => v.Value > before.Value + WorseVoltagePu,
            };
            if (worse)
                list.Add(new OutageViolation
                {
                    Element = v.Element, Kind = v.Kind, Type = v.Type, Value = v.Value, Limit = v.Limit, IntactValue = before?.Value,
                });
        }
        return list;
    }
}
