// Tap study: solve every position of one transformer's tap in every scenario and rank the positions.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// For one transformer, every position from min to max is solved in each scenario (one compiled model
/// each), warm started from the neighbouring position. The studied tap is held at each position (its
/// own regulation, if any, is off); other on-load taps regulate unless asked to hold. A position is
/// recommended when every watched bus stays inside its band in every scenario; positions rank by the
/// worst margin.
/// A warm start can carry Newton-Raphson onto the low-voltage solution of the same load (the lower
/// branch of the P–V curve, which no system operates on) or fail where a flat start succeeds; a solve
/// that fails, or whose lowest voltage collapses, is therefore repeated from flat start
/// (<see cref="Checked"/>), and a solution left far below what a flat start gives is never used to
/// recommend a position.
/// </summary>
public static class TapStudy
{
    /// <param name="models">The network compiled for each scenario to solve (the loads as entered: one model without a scenario).</param>
    /// <exception cref="InputException">The transformer has no tap changer in the models, or a watched bus is not in them.</exception>
    public static TapStudyResult Run(IReadOnlyList<PerUnitModel> models, TapStudyRequest request, LoadFlowOptions? options = null,
        IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        options ??= LoadFlowOptions.Default;
        request.Validate();
        if (models.Count == 0) throw new ArgumentException("a tap study needs at least one model", nameof(models));
        PerUnitModel first = models[0];
        int tapIndex = TapIndex(first, request.TransformerId);
        PuTap tapChanger = first.Taps[tapIndex];
        long positions = (long)tapChanger.Max - tapChanger.Min + 1;
        if (positions > MostPositions)
            throw new InputException($"transformer {request.TransformerId} has {positions} tap positions ({tapChanger.Min}..{tapChanger.Max}): " +
                $"the tap study solves every one, and no tap changer has more than a few dozen; check tap.range (at most {MostPositions} are studied)",
                elementId: request.TransformerId);
        IReadOnlyList<string> watch = request.WatchBuses.Count > 0 ? request.WatchBuses : FedBuses(first, LvBus(first, tapChanger.Branch));
        foreach (string bus in watch)
            if (!first.BusIndex.ContainsKey(bus)) throw new InputException($"watched bus {bus} is not in the network (or is out of service)", elementId: bus);

        var points = new List<TapStudyPoint>();
        var notes = new List<string>();
        int total = models.Count * (tapChanger.Max - tapChanger.Min + 1), done = 0;
        var solveOptions = options with { RegulateTaps = options.RegulateTaps && !request.HoldOtherTaps };
        foreach (PerUnitModel scenarioModel in models)
        {
            int k = TapIndex(scenarioModel, request.TransformerId);
            var taps = scenarioModel.Taps.ToArray();
            taps[k] = taps[k] with { RegulatedBus = null };
            PerUnitModel model = scenarioModel with { Taps = taps };
            LoadFlowResult? previous = null;
            for (int position = tapChanger.Min; position <= tapChanger.Max; position++)
            {
                cancel.ThrowIfCancellationRequested();
                PerUnitModel at = model.WithTapPosition(k, position);
                Solved solved = Checked(at, solveOptions, previous, cancel);
                if (solved.Result.Converged && !solved.LowVoltage) previous = solved.Result;
                TapStudyPoint point = Point(at, k, position, scenarioModel.Scenario, solved.Result, watch, request.Band)
                    with { SolvedFromFlatStart = solved.FromFlatStart, LowVoltage = solved.LowVoltage };
                if (solved.LowVoltage) point = point with { MarginPu = double.NegativeInfinity };
                points.Add(point);
                if (solved.Note is string note) notes.Add($"position {position}{On(scenarioModel.Scenario, models.Count)}: {note}");
                progress?.Report(++done / (double)total);
            }
        }
        return Rank(request, tapChanger, watch, models.Select(m => m.Scenario).ToList(), points) with { Notes = notes };
    }

    /// <summary>More positions than any tap changer has by far: a range this wide is a slip, and would take hours to sweep.</summary>
    public const int MostPositions = 1000;

    /// <summary>Below this lowest voltage a solution is checked against a flat start: few networks run this low.</summary>
    private const double CheckBelowPu = 0.8;

    /// <summary>A fall of the lowest voltage by more than this from the neighbouring position is checked too: one step moves it a few percent.</summary>
    private const double CheckDropPu = 0.1;

    /// <summary>A warm-started solution this far below the flat-start one is the low-voltage solution.</summary>
    private const double FarBelowPu = 0.05;

    /// <summary>Without a flat-start solution to compare, a lowest voltage under this is taken for a collapse.</summary>
    private const double CollapsePu = 0.5;

    private sealed record Solved(LoadFlowResult Result, bool FromFlatStart, bool LowVoltage, string? Note);

    /// <summary>
    /// The warm-started solve, repeated from flat start when it failed or its lowest voltage collapsed;
    /// the flat-start result replaces it when it converges higher. A solution that stays suspicious with
    /// nothing to compare (the flat start fails too) and lies below <see cref="CollapsePu"/> is flagged.
    /// </summary>
    private static Solved Checked(PerUnitModel at, LoadFlowOptions options, LoadFlowResult? previous, CancellationToken cancel)
    {
        LoadFlowResult warm = LoadFlowSolver.Solve(at, options with { WarmStart = previous }, cancel);
        if (previous is null) return new Solved(warm, true, false, null);
        double? lowest = Lowest(warm);
        bool suspicious = lowest is not double v || v < CheckBelowPu || v < Lowest(previous)!.Value - CheckDropPu;
        if (!suspicious) return new Solved(warm, false, false, null);

        LoadFlowResult flat = LoadFlowSolver.Solve(at, options with { WarmStart = null }, cancel);
        double? flatLowest = Lowest(flat);
        if (lowest is null)
            return flatLowest is double f
                ? new Solved(flat, true, false, $"the warm start from the neighbouring position did not converge; solved from flat start (lowest {Pu(f)} at {LowestBus(flat)})")
                : new Solved(warm, false, false, null);
        if (flatLowest is double higher && higher > lowest.Value + FarBelowPu)
            return new Solved(flat, true, false,
                $"the warm start reached a low-voltage solution (lowest {Pu(lowest.Value)} at {LowestBus(warm)}); " +
                $"the flat-start solution is used (lowest {Pu(higher)} at {LowestBus(flat)})");
        if (flatLowest is null && lowest.Value < CollapsePu)
            return new Solved(warm, false, true,
                $"only a collapsed solution was found (lowest {Pu(lowest.Value)} at {LowestBus(warm)}; a flat start does not converge): " +
                "taken as no operating point");
        return new Solved(warm, false, false, null);
    }

    private static double? Lowest(LoadFlowResult r)
    {
        if (!r.Converged) return null;
        double lowest = double.PositiveInfinity;
        foreach (BusResult b in r.Buses) if (b.Energised && b.VPu < lowest) lowest = b.VPu;
        return double.IsFinite(lowest) ? lowest : null;
    }

    private static string LowestBus(LoadFlowResult r) => r.Buses.Where(b => b.Energised).MinBy(b => b.VPu)?.Id ?? "";

    private static string Pu(double v) => v.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture) + " pu";

    private static string On(Scenario? scenario, int scenarios) => scenarios > 1 ? $" in {scenario?.Name ?? "the loads as entered"}" : "";

    private static TapStudyPoint Point(PerUnitModel model, int tap, int position, Scenario? scenario,
        LoadFlowResult r, IReadOnlyList<string> watch, (double Low, double High)? band)
    {
        double ratio = model.Branches[model.Taps[tap].Branch].Ratio;
        if (!r.Converged)
            return new TapStudyPoint
            {
                Position = position, Ratio = ratio, Scenario = scenario?.Name, Converged = false, MarginPu = double.NegativeInfinity,
            };
        var byId = r.Buses.ToDictionary(b => b.Id);
        var watched = watch.Select(id =>
        {
            BusResult b = byId[id];
            return new WatchedVoltage(id, b.VPu, band?.Low ?? b.VMin, band?.High ?? b.VMax);
        }).ToList();
        var live = r.Buses.Where(b => b.Energised).ToList();
        BusResult low = live.MinBy(b => b.VPu)!, high = live.MaxBy(b => b.VPu)!;
        return new TapStudyPoint
        {
            Position = position, Ratio = ratio, Scenario = scenario?.Name, Converged = true, Watched = watched,
            VMinPu = low.VPu, VMinBus = low.Id, VMaxPu = high.VPu, VMaxBus = high.Id,
            LossMw = r.Totals.LossMw, Violations = r.Violations.Count,
            MarginPu = watched.Min(w => Math.Min(w.VPu - w.LowPu, w.HighPu - w.VPu)),
        };
    }

    private static TapStudyResult Rank(TapStudyRequest request, PuTap tap, IReadOnlyList<string> watch,
        IReadOnlyList<Scenario?> scenarios, List<TapStudyPoint> points)
    {
        var worst = points.GroupBy(p => p.Position)
            .Select(g => new TapRecommendation(g.Key, g.Min(p => p.MarginPu)))
            .ToList();
        var recommended = worst.Where(w => w.MarginPu >= 0)
            .OrderByDescending(w => w.MarginPu).ThenBy(w => Math.Abs(w.Position - tap.Position)).ToList();
        TapRecommendation? closest = recommended.Count > 0 ? null
            : worst.Where(w => double.IsFinite(w.MarginPu)).OrderByDescending(w => w.MarginPu).FirstOrDefault();
        string bandText = request.Band is { } b ? $"{b.Low:0.###}–{b.High:0.###} pu" : "their own vMin–vMax";
        string cases = scenarios.Count == 1 ? (scenarios[0]?.Name is string s ? $"scenario {s}" : "the case as entered")
            : $"all {scenarios.Count} scenarios";
        string finding = recommended.Count > 0
            ? (recommended.Count == 1 ? $"position {recommended[0].Position} keeps" : $"positions {string.Join(", ", recommended.Select(r => r.Position))} keep")
              + $" {string.Join(", ", watch)} inside {bandText} in {cases}; "
              + $"best is {recommended[0].Position} with {recommended[0].MarginPu:0.0000} pu margin at worst"
            : closest is null
                ? $"no position converges in {cases}: the load flow fails at every position"
                : $"no position keeps {string.Join(", ", watch)} inside {bandText} in {cases}; the closest is position {closest.Position}, "
                  + $"outside by {-closest.MarginPu:0.0000} pu at worst — the tap range alone cannot hold the band "
                  + "(look at the upstream voltage, the bank's impedance or a narrower load spread)";
        return new TapStudyResult
        {
            Transformer = request.TransformerId, Min = tap.Min, Max = tap.Max, StepPercent = tap.PercentPerStep,
            FilePosition = tap.Position, WatchBuses = watch, Band = request.Band,
            Scenarios = scenarios.Select(s => s?.Name).ToList(), Points = points,
            Recommended = recommended, Closest = closest, Finding = finding,
        };
    }

    private static int TapIndex(PerUnitModel model, string id)
    {
        for (int k = 0; k < model.Taps.Count; k++) if (model.Taps[k].Id == id) return k;
        throw new InputException($"transformer {id} has no tap changer in service: nothing to study", elementId: id);
    }

    /// <summary>The lv terminal of the tapped transformer: a two-winding bank's To bus, a three-winding bank's lv winding terminal.</summary>
    internal static int LvBus(PerUnitModel model, int branch)
    {
        PuBranch tapped = model.Branches[branch];
        if (tapped.Kind != BranchKind.ThreeWindingTransformer) return tapped.To;
        foreach (PuBranch b in model.Branches)
            if (b.Id == tapped.Id && b.Winding == "lv") return b.From;
        return tapped.From;
    }

    /// <summary>The lv bus and every bus reached from it through lines alone (its own voltage level).</summary>
    internal static IReadOnlyList<string> FedBuses(PerUnitModel model, int lvBus)
    {
        var neighbours = new List<int>[model.Buses.Count];
        foreach (PuBranch l in model.Branches)
        {
            if (l.Kind != BranchKind.Line) continue;
            (neighbours[l.From] ??= []).Add(l.To);
            (neighbours[l.To] ??= []).Add(l.From);
        }
        var seen = new List<string> { model.Buses[lvBus].Id };
        var visited = new bool[model.Buses.Count];
        visited[lvBus] = true;
        var queue = new Queue<int>([lvBus]);
        while (queue.Count > 0)
            foreach (int other in neighbours[queue.Dequeue()] ?? [])
                if (!visited[other])
                {
                    visited[other] = true;
                    seen.Add(model.Buses[other].Id);
                    queue.Enqueue(other);
                }
        return seen;
    }
}
