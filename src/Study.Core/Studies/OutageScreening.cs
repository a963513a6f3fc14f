// Outage screening (N-1): each line and transformer out in turn, in each scenario, ranked by severity.
using Study.Core.LoadFlow;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// Solves the intact case of each scenario, then each outage as a change of values of it: the
/// branches of the element are zeroed in the intact admittance matrix, so every outage solve keeps the
/// intact Jacobian pattern, its symbolic analysis and its pivots (values-only refactorisations), and
/// starts from the intact solution. Every verdict comes from a full AC load flow with the element out.
/// Outages run on every core, one solver per core, and each lands in a fixed slot, so the result never
/// depends on which core finished first; only each outage's verdict is kept, so memory does not grow
/// with the network size times the number of outages.
/// An outage is judged against the intact case of the same scenario: a violation counts as new when
/// the intact case does not have it, or has it by a smaller margin.
/// </summary>
public static class OutageScreening
{
    /// <param name="intactModels">The intact case of each scenario to screen, compiled.</param>
    /// <param name="elements">The lines and transformers to take out, one at a time, in this order.</param>
    /// <param name="shard">Which slice of the outages to solve (<see cref="OutageShard"/>); null for all of them.</param>
    public static OutageScreeningResult Run(IReadOnlyList<PerUnitModel> intactModels, IReadOnlyList<OutageElement> elements,
        LoadFlowOptions? options = null, int? maxParallelism = null, IProgress<double>? progress = null, CancellationToken cancel = default,
        OutageShard? shard = null)
    {
        options ??= LoadFlowOptions.Default;
        shard ??= OutageShard.Whole;
        shard.Validate();
        int outageCount = intactModels.Count * elements.Count;
        int total = shard.CountOf(outageCount), done = 0;
        var gate = new object();
        int cores = Math.Max(1, maxParallelism ?? Environment.ProcessorCount);

        var screenings = new List<ScenarioScreening>(intactModels.Count);
        for (int s = 0; s < intactModels.Count; s++)
        {
            var solver = new OutageSolver(intactModels[s], options, cancel);
            var assessment = new OutageAssessment(intactModels[s], solver.Intact);
            int first = s * elements.Count;
            int[] picked = Enumerable.Range(first, elements.Count).Where(shard.Holds).ToArray();
            var cases = new OutageCase[picked.Length];
            int next = -1;
            var parallel = new ParallelOptions { MaxDegreeOfParallelism = cores, CancellationToken = cancel };
            Parallel.For(0, Math.Min(cores, picked.Length), parallel, _ =>
            {
                OutageWorker worker = solver.CreateWorker();
                for (int j = Interlocked.Increment(ref next); j < picked.Length; j = Interlocked.Increment(ref next))
                {
                    cancel.ThrowIfCancellationRequested();
                    OutageElement element = elements[picked[j] - first];
                    worker.Solve(assessment.BranchesOf(element.Id), cancel);
                    cases[j] = assessment.Assess(element, picked[j], worker);
                    if (progress is null) continue;
                    lock (gate) progress.Report(++done / (double)total);
                }
            });
            LoadFlowResult intact = solver.Intact;
            screenings.Add(new ScenarioScreening
            {
                Scenario = intactModels[s].Scenario?.Name, IntactConverged = intact.Converged, IntactMessage = intact.Message,
                IntactLoadMw = intact.Totals.LoadMw, IntactViolations = intact.Violations, Outages = Rank(cases),
            });
        }
        return new OutageScreeningResult
        {
            Elements = elements.Select(e => e.Id).ToList(), Scenarios = screenings, Shard = shard, OutageCount = outageCount,
        };
    }

    /// <summary>
    /// The ranking: severity, then stress, both highest first, then the outage's number in the whole
    /// screening (the elements' order), so ties always fall the same way, sharded or not.
    /// </summary>
    public static IReadOnlyList<OutageCase> Rank(IEnumerable<OutageCase> cases) =>
        cases.OrderByDescending(c => c.Severity).ThenByDescending(c => c.StressPercent).ThenBy(c => c.Order).ToList();
}
