// Tap study: solve every position of one transformer's tap in every scenario and rank the positions.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// For one transformer, every position from min to max is solved in each scenario, warm started
/// from the neighbouring position. The studied tap is held at each position (its own regulation,
/// if any, is off); other on-load taps regulate unless asked to hold. A position is recommended when
/// every watched bus stays inside its band in every scenario; positions rank by the worst margin.
/// </summary>
public static class TapStudy
{
    public static TapStudyResult Run(Network network, TapStudyRequest request, LoadFlowOptions? options = null,
        IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        options ??= LoadFlowOptions.Default;
        var (tapChanger, lvBus) = FindTap(network, request.TransformerId);
        if (request.Band is { } band && !(band.Low < band.High))
            throw new InputException($"the band {band.Low}..{band.High} is empty: give LO below HI, e.g. 0.97,1.03");
        IReadOnlyList<string> watch = request.WatchBuses.Count > 0 ? request.WatchBuses : FedBuses(network, lvBus);
        foreach (string bus in watch)
            if (network.FindBus(bus) is null) throw new InputException($"watched bus {bus} is not in the network", elementId: bus);

        IReadOnlyList<Scenario?> scenarios = request.Scenarios.Count > 0 ? request.Scenarios.ToList<Scenario?>() : [null];
        var points = new List<TapStudyPoint>();
        int total = scenarios.Count * (tapChanger.Max - tapChanger.Min + 1), done = 0;
        var solveOptions = options with { RegulateTaps = options.RegulateTaps && !request.HoldOtherTaps };
        foreach (Scenario? scenario in scenarios)
        {
            PerUnitModel model = PerUnitModel.Build(network, scenario);
            int k = TapIndex(model, request.TransformerId);
            var taps = model.Taps.ToArray();
            taps[k] = taps[k] with { RegulatedBus = null };
            model = model with { Taps = taps };
            LoadFlowResult? previous = null;
            for (int position = tapChanger.Min; position <= tapChanger.Max; position++)
            {
                cancel.ThrowIfCancellationRequested();
                PerUnitModel at = model.WithTapPosition(k, position);
                LoadFlowResult r = LoadFlowSolver.Solve(at, solveOptions with { WarmStart = previous }, cancel);
                if (r.Converged) previous = r;
                points.Add(Point(network, at, k, position, scenario, r, watch, request.Band));
                progress?.Report(++done / (double)total);
            }
        }
        return Rank(request, tapChanger, watch, scenarios, points);
    }

    private static TapStudyPoint Point(Network network, PerUnitModel model, int tap, int position, Scenario? scenario,
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

    private static TapStudyResult Rank(TapStudyRequest request, TapChanger tap, IReadOnlyList<string> watch,
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
        string cases = scenarios.Count == 1 ? (scenarios[0]?.Name is string s ? $"scenario {s}" : "the loads as entered")
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
            Transformer = request.TransformerId, Min = tap.Min, Max = tap.Max, StepPercent = tap.StepPercent,
            FilePosition = tap.Position, WatchBuses = watch, Band = request.Band,
            Scenarios = scenarios.Select(s => s?.Name).ToList(), Points = points,
            Recommended = recommended, Closest = closest, Finding = finding,
        };
    }

    private static (TapChanger Tap, string LvBus) FindTap(Network network, string id)
    {
        if (network.Transformers.FirstOrDefault(t => t.Id == id) is { } t)
            return (t.Tap ?? throw new InputException($"transformer {id} has no tap changer: there are no positions to study", elementId: id), t.Lv);
        if (network.ThreeWindingTransformers.FirstOrDefault(t => t.Id == id) is { } t3)
            return (t3.Tap ?? throw new InputException($"transformer {id} has no tap changer: there are no positions to study", elementId: id), t3.Lv);
        string known = string.Join(", ", network.Transformers.Where(x => x.Tap is not null).Select(x => x.Id)
            .Concat(network.ThreeWindingTransformers.Where(x => x.Tap is not null).Select(x => x.Id)));
        throw new InputException($"no transformer with id {id}" + (known.Length > 0 ? $" (transformers with taps: {known})" : ""), elementId: id);
    }

    private static int TapIndex(PerUnitModel model, string id)
    {
        for (int k = 0; k < model.Taps.Count; k++) if (model.Taps[k].Id == id) return k;
        throw new InputException($"transformer {id} is out of service (or on an out-of-service bus): nothing to study", elementId: id);
    }

    /// <summary>The lv bus and every bus reached from it through lines alone (its own voltage level).</summary>
    internal static IReadOnlyList<string> FedBuses(Network network, string lvBus)
    {
        var neighbours = new Dictionary<string, List<string>>();
        void Link(string a, string b)
        {
            if (!neighbours.TryGetValue(a, out var list)) neighbours[a] = list = [];
            list.Add(b);
        }
        foreach (Line l in network.Lines.Where(l => l.InService))
        {
            Link(l.From, l.To);
            Link(l.To, l.From);
        }
        var seen = new List<string> { lvBus };
        var visited = new HashSet<string> { lvBus };
        var queue = new Queue<string>([lvBus]);
        while (queue.Count > 0)
            foreach (string other in neighbours.GetValueOrDefault(queue.Dequeue()) ?? [])
                if (visited.Add(other))
                {
                    seen.Add(other);
                    queue.Enqueue(other);
                }
        return seen;
    }
}
