// What one outage breaks, judged against the intact case of its scenario, read straight from the
// outage solver's state (no load-flow result records are built per outage).
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// The intact case of one scenario, indexed for judging its outages: each bus's state, load and
/// generation, and each violation the intact case already has. An outage's figures are the ones a load
/// flow result of the model without the element would give: islanded buses (live in the intact case,
/// dead with the element out), the load and generation they carried in the intact case, the
/// violations that are new or worse, the worst bus and the most loaded branch.
/// </summary>
internal sealed class OutageAssessment
{
    /// <summary>A violation already present in the intact case counts again only when worse by more than this.</summary>
    private const double WorseLoadingPercent = 0.1, WorseVoltagePu = 1e-4;

    private readonly PerUnitModel model;
    private readonly LoadFlowResult intact;
    private readonly bool[] intactLive;
    private readonly double[] intactLoadMw, intactGenerationMw;
    private readonly Dictionary<(string, ViolationKind), double> intactViolations = [];
    private readonly string[] branchIds;
    private readonly Dictionary<string, int[]> branchesOf = new(StringComparer.Ordinal);

    public OutageAssessment(PerUnitModel model, LoadFlowResult intact)
    {
        this.model = model;
        this.intact = intact;
        int n = model.Buses.Count;
        // Buses the intact result does not list (it did not converge) count as live, with nothing on them.
        intactLive = new bool[n];
        Array.Fill(intactLive, true);
        intactLoadMw = new double[n];
        intactGenerationMw = new double[n];
        foreach (BusResult b in intact.Buses)
        {
            if (!model.BusIndex.TryGetValue(b.Id, out int i)) continue;
            intactLive[i] = b.Energised;
            intactLoadMw[i] = b.PLoadMw;
            intactGenerationMw[i] = b.PGenMw;
        }
        foreach (Violation v in intact.Violations) intactViolations.TryAdd((v.Element, v.Type), v.Value);
        branchIds = model.Branches.Select(b => b.Winding is null ? b.Id : $"{b.Id}/{b.Winding}").ToArray();
        foreach (var group in model.Branches.Select((b, k) => (b.Id, k)).GroupBy(x => x.Id, StringComparer.Ordinal))
            branchesOf[group.Key] = group.Select(x => x.k).ToArray();
    }

    /// <summary>The model's branches that make up an element (none when it is not in the model).</summary>
    public IReadOnlyList<int> BranchesOf(string elementId) => branchesOf.GetValueOrDefault(elementId) ?? [];

    /// <summary>Judges the outage the worker has just solved.</summary>
    public OutageCase Assess(OutageElement element, int order, OutageWorker outage)
    {
        string? scenario = model.Scenario?.Name;
        if (!outage.Converged)
            return new OutageCase
            {
                Element = element.Id, Kind = element.Kind, Scenario = scenario, Order = order, Converged = false,
                Message = outage.Message, Severity = OutageSeverity.NoConvergence,
            };

        var islanded = new List<string>();
        double lostLoad = 0, lostGeneration = 0;
        var newViolations = new List<OutageViolation>();
        int worstBus = -1;
        double worstMargin = 0;
        for (int i = 0; i < model.Buses.Count; i++)
        {
            PuBus bus = model.Buses[i];
            if (bus.IsInternal) continue;
            if (!outage.IsLive(i))
            {
                if (!intactLive[i]) continue;
                islanded.Add(bus.Id);
                lostLoad += intactLoadMw[i];
                lostGeneration += intactGenerationMw[i];
                continue;
            }
            double v = outage.VPu(i);
            double margin = Math.Min(v - bus.VMin, bus.VMax - v);
            if (worstBus < 0 || margin < worstMargin)
            {
                worstBus = i;
                worstMargin = margin;
            }
            if (v < bus.VMin) Judge(bus.Id, ElementKind.Bus, ViolationKind.Low, v, bus.VMin, newViolations);
            else if (v > bus.VMax) Judge(bus.Id, ElementKind.Bus, ViolationKind.High, v, bus.VMax, newViolations);
        }

        int worstBranch = -1;
        double worstLoading = 0;
        for (int k = 0; k < model.Branches.Count; k++)
        {
            if (outage.IsOut(k) || model.Branches[k].RatingMva is not > 0) continue;
            double loading = outage.LoadingPercent(k)!.Value;
            if (worstBranch < 0 || loading > worstLoading)
            {
                worstBranch = k;
                worstLoading = loading;
            }
            if (loading > 100)
                Judge(branchIds[k], LoadFlowResults.KindOf(model.Branches[k].Kind), ViolationKind.Overload, loading, 100, newViolations);
        }

        double stress = 0;
        foreach (OutageViolation v in newViolations) stress += OutageSeverity.Excursion(v);
        double scenarioLoad = intact.Converged ? intact.Totals.LoadMw : outage.LoadMw() + lostLoad;
        return new OutageCase
        {
            Element = element.Id, Kind = element.Kind, Scenario = scenario, Order = order, Converged = true,
            IslandedBuses = islanded, LostLoadMw = lostLoad, LostGenerationMw = lostGeneration,
            NewViolations = newViolations,
            WorstVPu = worstBus >= 0 ? outage.VPu(worstBus) : null, WorstVBus = worstBus >= 0 ? model.Buses[worstBus].Id : null,
            WorstLoadingPercent = worstBranch >= 0 ? worstLoading : null, WorstLoadingElement = worstBranch >= 0 ? branchIds[worstBranch] : null,
            ParallelLoadings = ParallelLoadings(element, outage),
            StressPercent = stress,
            Severity = OutageSeverity.Score(true, lostLoad, scenarioLoad, stress),
        };
    }

    /// <summary>Adds the violation when the intact case does not have it, or has it by a smaller margin.</summary>
    private void Judge(string element, ElementKind kind, ViolationKind type, double value, double limit, List<OutageViolation> into)
    {
        bool known = intactViolations.TryGetValue((element, type), out double before);
        bool worse = !known || type switch
        {
            ViolationKind.Overload => value > before + WorseLoadingPercent,
            ViolationKind.Low => value < before - WorseVoltagePu,
            _ => value > before + WorseVoltagePu,
        };
        if (worse)
            into.Add(new OutageViolation
            {
                Element = element, Kind = kind, Type = type, Value = value, Limit = limit, IntactValue = known ? before : null,
            });
    }

    /// <summary>The branches left between the two buses of a two-terminal element, and their loading.</summary>
    private IReadOnlyList<ParallelLoading> ParallelLoadings(OutageElement element, OutageWorker outage)
    {
        if (element.Terminals.Count != 2) return [];
        if (!model.BusIndex.TryGetValue(element.Terminals[0], out int a) || !model.BusIndex.TryGetValue(element.Terminals[1], out int b)) return [];
        var list = new List<ParallelLoading>();
        for (int k = 0; k < model.Branches.Count; k++)
        {
            PuBranch branch = model.Branches[k];
            if (outage.IsOut(k) || !((branch.From == a && branch.To == b) || (branch.From == b && branch.To == a))) continue;
            list.Add(new ParallelLoading(branchIds[k], outage.LoadingPercent(k)));
        }
        return list;
    }
}
