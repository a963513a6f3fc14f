// Outage screening (N-1): each line and transformer out in turn, in each scenario, ranked by severity.
using Study.Core.LoadFlow;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// Solves the intact case of each scenario, then each outage warm started from it. Outages run in
/// parallel, each on its own model: the intact model with that element's branches taken out (the solver
/// keeps no shared state), and land in a fixed slot so the result never depends on which core finished first.
/// An outage is judged against the intact case of the same scenario: a violation counts as new when
/// the intact case does not have it, or has it by a smaller margin.
/// </summary>
public static class OutageScreening
{
    /// <summary>A violation already present in the intact case counts again only when worse by more than this.</summary>
    private const double WorseLoadingPercent = 0.1, WorseVoltagePu = 1e-4;

    /// <param name="intactModels">The intact case of each scenario to screen, compiled.</param>
    /// <param name="elements">The lines and transformers to take out, one at a time, in this order.</param>
    public static OutageScreeningResult Run(IReadOnlyList<PerUnitModel> intactModels, IReadOnlyList<OutageElement> elements,
        LoadFlowOptions? options = null, int? maxParallelism = null, IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        options ??= LoadFlowOptions.Default;
        var intact = intactModels.Select(m => LoadFlowSolver.Solve(m, options, cancel)).ToArray();

        int total = intactModels.Count * elements.Count, done = 0;
        var cases = new OutageCase[total];
        var gate = new object();
        var parallel = new ParallelOptions
        {
            MaxDegreeOfParallelism = Math.Max(1, maxParallelism ?? Environment.ProcessorCount),
            CancellationToken = cancel,
        };
        Parallel.For(0, total, parallel, k =>
        {
            int s = k / elements.Count;
            OutageElement element = elements[k % elements.Count];
            PerUnitModel model = intactModels[s].WithoutBranch(element.Id);
            LoadFlowResult outage = LoadFlowSolver.Solve(model,
                options with { WarmStart = intact[s].Converged ? intact[s] : null }, cancel);
            cases[k] = Assess(element, intactModels[s].Scenario?.Name, intact[s], outage);
            if (progress is null) return;
            lock (gate) progress.Report(++done / (double)total);
        });

        var screenings = new List<ScenarioScreening>(intactModels.Count);
        for (int s = 0; s < intactModels.Count; s++)
        {
            var ranked = cases.Skip(s * elements.Count).Take(elements.Count)
                .OrderByDescending(c => c.Severity).ThenByDescending(c => c.StressPercent).ToList();
            screenings.Add(new ScenarioScreening
            {
                Scenario = intactModels[s].Scenario?.Name, IntactConverged = intact[s].Converged, IntactMessage = intact[s].Message,
                IntactLoadMw = intact[s].Totals.LoadMw, IntactViolations = intact[s].Violations, Outages = ranked,
            });
        }
        return new OutageScreeningResult { Elements = elements.Select(e => e.Id).ToList(), Scenarios = screenings };
    }

    /// <summary>What one outage breaks, measured against the intact case.</summary>
    internal static OutageCase Assess(OutageElement element, string? scenario, LoadFlowResult intact, LoadFlowResult outage)
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
