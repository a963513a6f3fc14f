// Profile study: a load flow per time step, on-load tap changers acting between solves as a real changer
// would, and the statistics planners ask of a day, a week or a year: hours out of band, tap operations, energy lost.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// Each step is solved warm started from the one before, with the taps where it left them (the first from
/// the file's positions). While a regulated bus lies outside vTarget ± bandPu/2 its changer moves one
/// position toward the band, within its range, and the step is solved again; several moves in one step
/// are allowed, each one operation; changers regulating one bus move together. A changer whose next move
/// would undo its last one in the same step (a band narrower than a step) stays where it is. Statistics
/// read each step's settled state; a step that does not converge counts in none of them.
/// </summary>
public static class ProfileStudy
{
    /// <param name="model">The network compiled for the scenario the profile scales.</param>
    /// <param name="watch">Buses whose voltage every step is kept for charts (the series).</param>
    /// <exception cref="InputException">A profile column names a load that is not in the model.</exception>
    public static ProfileResult Run(PerUnitModel model, LoadProfile profile, IReadOnlyList<string> watch,
        LoadFlowOptions? options = null, IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        options ??= LoadFlowOptions.Default;
        var solveOptions = options with { RegulateTaps = false };
        int[] scaleColumn = ScaleColumns(model, profile);
        int[] watched = watch.Select(id => model.BusIndex.TryGetValue(id, out int i) ? i
            : throw new InputException($"watched bus {id} is not in the network (or is out of service)", elementId: id)).ToArray();
        var groups = model.Taps.Select((t, k) => (t, k)).Where(x => x.t.RegulatedBus is not null && options.RegulateTaps)
            .GroupBy(x => x.t.RegulatedBus!.Value).Select(g => (Bus: g.Key, Taps: g.Select(x => x.k).ToArray())).ToList();

        var stats = new Accumulator(model);
        var series = new SeriesBuilder(profile.Steps.Count, watched.Length, model.Taps.Count);
        PerUnitModel current = model;
        LoadFlowResult? previous = null;
        // Every step and every tap move solves a network of the same branches: one symbolic analysis serves all.
        var solver = new StepSolver(solveOptions, cancel);
        int failed = 0;
        string? firstFailure = null;
        for (int s = 0; s < profile.Steps.Count; s++)
        {
            cancel.ThrowIfCancellationRequested();
            ProfileStep step = profile.Steps[s];
            current = current with { Loads = Scaled(model.Loads, step, scaleColumn) };
            LoadFlowResult r = solver.Solve(current, previous);
            if (r.Converged && groups.Count > 0) (current, r) = Regulate(current, r, groups, stats, solver);
            if (r.Converged)
            {
                previous = r;
                stats.Add(current, r, step.Hours);
            }
            else
            {
                failed++;
                firstFailure ??= $"step {s + 1}{(step.Time is { } t ? $" ({t.UtcDateTime:yyyy-MM-ddTHH:mm})" : "")}: {r.Message}";
            }
            series.Add(step, r, current, watched);
            progress?.Report((s + 1) / (double)profile.Steps.Count);
        }
        return new ProfileResult
        {
            Scenario = model.Scenario?.Name, Steps = profile.Steps.Count, Hours = profile.Hours,
            StepsNotConverged = failed, FirstFailure = firstFailure,
            Buses = stats.Buses(), Transformers = stats.Transformers(model, options.RegulateTaps), Energy = stats.Energy(),
            Series = series.Build(watch, model.Taps.Select(t => t.Id).ToList()),
        };
    }

    /// <summary>For each load of the model, the profile column that scales it; −1 for a load the columns leave at scale 1.</summary>
    private static int[] ScaleColumns(PerUnitModel model, LoadProfile profile)
    {
        var column = new int[model.Loads.Count];
        if (profile.LoadIds is not { } ids) return column; // one "scale" column: column 0 for every load
        Array.Fill(column, -1);
        for (int i = 0; i < model.Loads.Count; i++) column[i] = IndexOf(ids, model.Loads[i].Id);
        return column;
    }

    private static int IndexOf(IReadOnlyList<string> ids, string id)
    {
        for (int k = 0; k < ids.Count; k++) if (ids[k] == id) return k;
        return -1;
    }

    private static PuLoad[] Scaled(IReadOnlyList<PuLoad> loads, ProfileStep step, int[] column)
    {
        var scaled = new PuLoad[loads.Count];
        for (int i = 0; i < loads.Count; i++)
        {
            double k = column[i] < 0 ? 1.0 : step.Scales[column[i]];
            scaled[i] = k == 1.0 ? loads[i] : loads[i] with { P = loads[i].P * k, Q = loads[i].Q * k };
        }
        return scaled;
    }

    /// <summary>The tap rule of one step: one position at a time toward the band, re-solving after each round of moves.</summary>
    /// <summary>Warm-started solves of one network's steps, sharing the symbolic analysis of the first.</summary>
    private sealed class StepSolver(LoadFlowOptions options, CancellationToken cancel)
    {
        private Numerics.LuSymbolic? symbolic;

        public LoadFlowResult Solve(PerUnitModel model, LoadFlowResult? warm)
        {
            LoadFlowResult r = LoadFlowSolver.Solve(model, options with { WarmStart = warm }, cancel, out NewtonRaphson nr, symbolic);
            symbolic ??= nr.JacobianSize > 0 ? nr.Symbolic : null;
            return r;
        }
    }

    private static (PerUnitModel, LoadFlowResult) Regulate(PerUnitModel model, LoadFlowResult r, List<(int Bus, int[] Taps)> groups,
        Accumulator stats, StepSolver solver)
    {
        var lastMove = new int[groups.Count];
        var done = new bool[groups.Count];
        var voltage = new Dictionary<string, double>();
        // Each round moves every out-of-band changer one position; a changer can cross its whole range at most once.
        int rounds = 2 + model.Taps.Select(t => t.Max - t.Min).DefaultIfEmpty(0).Max();
        for (int round = 0; round < rounds; round++)
        {
            voltage.Clear();
            foreach (BusResult b in r.Buses) voltage[b.Id] = b.VPu;
            bool moved = false;
            for (int g = 0; g < groups.Count; g++)
            {
                if (done[g]) continue;
                PuTap lead = model.Taps[groups[g].Taps[0]];
                double v = voltage[model.Buses[groups[g].Bus].Id];
                double low = lead.VTarget - lead.BandPu / 2, high = lead.VTarget + lead.BandPu / 2;
                int want = v < low ? 1 : v > high ? -1 : 0; // +1: raise the regulated voltage
                if (want == 0) continue;
                if (lastMove[g] != 0 && want != lastMove[g])
                {
                    done[g] = true; // the band is narrower than one step: stay rather than hunt
                    continue;
                }
                bool groupMoved = false;
                foreach (int k in groups[g].Taps)
                {
                    PuTap tap = model.Taps[k];
                    int target = Math.Clamp(tap.Position + want * VoltageDirection(model, tap, groups[g].Bus), tap.Min, tap.Max);
                    if (target == tap.Position) continue;
                    model = model.WithTapPosition(k, target);
                    stats.Operation(k, target);
                    groupMoved = true;
                }
                if (groupMoved) lastMove[g] = want;
                else done[g] = true; // at the end of its range
                moved |= groupMoved;
            }
            if (!moved) break;
            r = solver.Solve(model, r);
            if (!r.Converged) break;
        }
        return (model, r);
    }

    /// <summary>+1 when raising the position raises the regulated bus voltage, −1 when it lowers it (the ratio sits at the From end).</summary>
    private static int VoltageDirection(PerUnitModel model, PuTap tap, int regulatedBus)
    {
        int ratioSign = tap.RatioAt(tap.Position + 1) > tap.RatioAt(tap.Position) ? 1 : -1;
        return model.Branches[tap.Branch].From == regulatedBus ? ratioSign : -ratioSign;
    }

    /// <summary>Sums every settled step into the per-bus, per-transformer and network statistics.</summary>
    private sealed class Accumulator
    {
        private readonly Dictionary<string, (double Min, double Max, double Hours, double Low, double High)> buses = new();
        private readonly List<string> busOrder = [];
        private readonly Dictionary<string, (double Load, double NoLoad, double? Peak)> transformers = new();
        private readonly List<string> transformerOrder = [];
        private readonly int[] operations;
        private readonly SortedSet<int>[] positions;
        private readonly bool[] supplyBus;
        private readonly double[] scheduledGenerationMw;
        private double delivered, generated, consumed, loss, noLoad;

        public Accumulator(PerUnitModel model)
        {
            operations = new int[model.Taps.Count];
            positions = model.Taps.Select(t => new SortedSet<int> { t.Position }).ToArray();
            supplyBus = new bool[model.Buses.Count];
            scheduledGenerationMw = new double[model.Buses.Count];
            foreach (PuSource src in model.Sources)
            {
                if (src.Kind == ElementKind.Supply) supplyBus[src.Bus] = true;
                else if (src.Mode != GeneratorMode.Slack) scheduledGenerationMw[src.Bus] += src.P * model.BaseMva;
            }
            foreach (PuBranch b in model.Branches)
                if (b.Kind != BranchKind.Line && !transformers.ContainsKey(b.Id))
                {
                    transformers[b.Id] = (0, 0, null);
                    transformerOrder.Add(b.Id);
                }
        }

        public void Operation(int tap, int position)
        {
            operations[tap]++;
            positions[tap].Add(position);
        }

        public void Add(PerUnitModel model, LoadFlowResult r, double hours)
        {
            var v = new Dictionary<string, double>(r.Buses.Count);
            double supplyMw = 0;
            foreach (BusResult b in r.Buses)
            {
                v[b.Id] = b.VPu;
                if (!b.Energised) continue;
                if (model.BusIndex.TryGetValue(b.Id, out int i) && supplyBus[i]) supplyMw += b.PGenMw - scheduledGenerationMw[i];
                if (!buses.TryGetValue(b.Id, out var s))
                {
                    busOrder.Add(b.Id);
                    s = (double.PositiveInfinity, double.NegativeInfinity, 0, b.VMin, b.VMax);
                }
                bool outside = b.VPu < b.VMin || b.VPu > b.VMax;
                buses[b.Id] = (Math.Min(s.Min, b.VPu), Math.Max(s.Max, b.VPu), s.Hours + (outside ? hours : 0), s.Low, s.High);
            }
            double stepNoLoad = 0;
            for (int k = 0; k < model.Branches.Count; k++)
            {
                PuBranch b = model.Branches[k];
                BranchResult f = r.Branches[k];
                double vFrom = v.TryGetValue(model.Buses[b.From].Id, out double vf) ? vf : 1.0;
                double magnetisingMw = b.MagnetisingY.Real * vFrom * vFrom * model.BaseMva;
                stepNoLoad += magnetisingMw;
                if (b.Kind == BranchKind.Line) continue;
                var t = transformers[b.Id];
                double? peak = f.LoadingPercent is double pct ? Math.Max(t.Peak ?? 0, pct) : t.Peak;
                transformers[b.Id] = (t.Load + (f.LossMw - magnetisingMw) * hours, t.NoLoad + magnetisingMw * hours, peak);
            }
            LoadFlowTotals totals = r.Totals;
            delivered += supplyMw * hours;
            generated += (totals.GenerationMw - supplyMw) * hours;
            consumed += (totals.LoadMw + totals.ShuntMw) * hours;
            loss += totals.LossMw * hours;
            noLoad += stepNoLoad * hours;
            for (int k = 0; k < model.Taps.Count; k++) positions[k].Add(model.Taps[k].Position);
        }

        public IReadOnlyList<ProfileBus> Buses() =>
            busOrder.Select(id => buses[id]).Zip(busOrder, (s, id) => new ProfileBus(id, s.Min, s.Max, s.Hours, s.Low, s.High)).ToList();

        public IReadOnlyList<ProfileTransformer> Transformers(PerUnitModel model, bool regulate) => transformerOrder.Select(id =>
        {
            var t = transformers[id];
            int tap = -1;
            for (int k = 0; k < model.Taps.Count; k++) if (model.Taps[k].Id == id) tap = k;
            return new ProfileTransformer
            {
                Id = id, OnLoad = tap >= 0 && regulate && model.Taps[tap].RegulatedBus is not null,
                TapOperations = tap >= 0 ? operations[tap] : 0,
                PositionsUsed = tap >= 0 ? positions[tap].ToList() : [],
                PeakPctOfRating = t.Peak, LoadLossMwh = t.Load, NoLoadLossMwh = t.NoLoad,
            };
        }).ToList();

        public ProfileEnergy Energy() => new(delivered, generated, consumed, loss, loss - noLoad, noLoad);
    }

    private sealed class SeriesBuilder(int steps, int watched, int taps)
    {
        private readonly List<DateTimeOffset?> times = new(steps);
        private readonly List<double> hours = new(steps);
        private readonly List<bool> converged = new(steps);
        private readonly List<double> loss = new(steps);
        private readonly List<double[]> voltages = new(steps);
        private readonly List<int[]> positions = new(steps);

        public void Add(ProfileStep step, LoadFlowResult r, PerUnitModel model, int[] watch)
        {
            times.Add(step.Time);
            hours.Add(step.Hours);
            converged.Add(r.Converged);
            loss.Add(r.Converged ? r.Totals.LossMw : double.NaN);
            var v = new double[watched];
            for (int w = 0; w < watched; w++)
                v[w] = r.Converged ? r.Buses.First(b => b.Id == model.Buses[watch[w]].Id).VPu : double.NaN;
            voltages.Add(v);
            var p = new int[taps];
            for (int k = 0; k < taps; k++) p[k] = model.Taps[k].Position;
            positions.Add(p);
        }

        public ProfileSeries Build(IReadOnlyList<string> watch, IReadOnlyList<string> tapIds) => new()
        {
            Times = times, Hours = hours, Converged = converged, LossMw = loss,
            WatchedBuses = watch, Voltages = voltages, Taps = tapIds, Positions = positions,
        };
    }
}
