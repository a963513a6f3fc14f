// Bank choice: each candidate bank in place of the studied transformer, held to every constraint, ranked by total owning cost.
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.Core.Cases;

/// <summary>What the bank-choice study is asked: which transformer, the band to hold, and how losses are valued.</summary>
public sealed record BankChoiceRequest
{
    public required string TransformerId { get; init; }

    /// <summary>Buses that must stay in band; empty means the buses the bank feeds at its lv voltage.</summary>
    public IReadOnlyList<string> WatchBuses { get; init; } = [];

    /// <summary>The band, pu; null means each watched bus's own vMin..vMax.</summary>
    public (double Low, double High)? Band { get; init; }

    /// <summary>Scenario names to hold the band in; empty means every scenario (the loads as entered when there are none).</summary>
    public IReadOnlyList<string?> Scenarios { get; init; } = [];

    /// <summary>Capitalised value of one kW of no-load loss (A), money per kW.</summary>
    public double NoLoadRate { get; init; }

    /// <summary>Capitalised value of one kW of load loss at rated current (B), money per kW.</summary>
    public double LoadRate { get; init; }

    /// <summary>Ratio of average to peak load loss over a year, for the annual energy when no profile is given.</summary>
    public double? LossLoadFactor { get; init; }

    /// <exception cref="InputException">A rate is negative or not finite, the loss-load factor is outside (0, 1], or the band is wrong.</exception>
    public void Validate()
    {
        if (!(NoLoadRate >= 0) || !double.IsFinite(NoLoadRate) || !(LoadRate >= 0) || !double.IsFinite(LoadRate))
            throw new InputException("the loss rates are money per kW: give finite numbers, 0 or more");
        if (LossLoadFactor is double f && !(f > 0 && f <= 1))
            throw new InputException($"the loss-load factor {f.ToString("G4", System.Globalization.CultureInfo.InvariantCulture)} is outside 0..1 (0.2 to 0.5 is usual)");
        new TapStudyRequest { TransformerId = TransformerId, Band = Band }.Validate();
    }
}

/// <summary>One candidate held to every constraint, with its losses and cost.</summary>
public sealed record CandidateAssessment
{
    public required string Id { get; init; }
    public string? Description { get; init; }
    public bool Feasible => Reasons.Count == 0;
    /// <summary>Why the candidate fails, one reason per constraint broken, each with its sentence.</summary>
    public IReadOnlyList<CandidateReason> Reasons { get; init; } = [];
    /// <summary>The best fixed tap position; null for an on-load changer (it regulates) or when none holds the band.</summary>
    public int? BestTap { get; init; }
    public bool OnLoad { get; init; }
    /// <summary>The worst margin of a watched bus inside its band over the scenarios, pu (negative: outside).</summary>
    public double? MarginPu { get; init; }
    public double? MaxDutyPercent { get; init; }
    public string? MaxDutyBreaker { get; init; }
    /// <summary>The worst branch loading with the bank or a neighbour out, percent of rating.</summary>
    public double? N1WorstPct { get; init; }
    public string? N1WorstCase { get; init; }
    /// <summary>Guaranteed no-load loss of the bank (every unit), kW.</summary>
    public double NoLoadLossKw { get; init; }
    /// <summary>Guaranteed load loss of the bank at rated current (every unit), kW.</summary>
    public double LoadLossKw { get; init; }
    /// <summary>Series loss of the bank at the heaviest scenario, from the load flow, kW.</summary>
    public double? PeakLoadLossKw { get; init; }
    /// <summary>Energy the bank loses in a year (or over the profile), MWh.</summary>
    public double? EnergyLossMwh { get; init; }
    public double Price { get; init; }
    /// <summary>A·P0 + B·Pk, money.</summary>
    public double CapitalisedLosses { get; init; }
    /// <summary>Price + capitalised losses, money.</summary>
    public double TotalOwningCost { get; init; }
    /// <summary>What the assessment had to leave out (earth faults without zero-sequence data), for the result's notes.</summary>
    internal IReadOnlyList<string> Notes { get; init; } = [];
}

/// <summary>Every candidate bank judged in place of one transformer: feasible ones first by total owning cost, the recommendation, and the notes that hold whichever bank is bought.</summary>
public sealed record BankChoiceResult
{
    public required string Transformer { get; init; }
    /// <summary>The feasible candidates by total owning cost, cheapest first, then the infeasible ones.</summary>
    public IReadOnlyList<CandidateAssessment> Candidates { get; init; } = [];
    public string? Recommended { get; init; }
    public IReadOnlyList<string> WatchBuses { get; init; } = [];
    public (double Low, double High)? Band { get; init; }
    public IReadOnlyList<string?> Scenarios { get; init; } = [];
    public double NoLoadRate { get; init; }
    public double LoadRate { get; init; }
    public double? LossLoadFactor { get; init; }
    /// <summary>The profile the annual energy came from; null when it came from the loss-load factor.</summary>
    public string? ProfileSource { get; init; }
    public IReadOnlyList<string> Notes { get; init; } = [];
    public string Caution { get; init; } = FaultStudy.Caution;
}

/// <summary>
/// For each candidate: the network with the candidate in place of the transformer (voltages, vector group
/// and earthing kept), then the tap study over the scenarios (or, for an on-load changer, the regulated
/// load flow), the fault duty of the breakers at the bank's buses and at the buses it feeds, outages of the
/// bank and of the branches at its buses, and the losses: guaranteed P0 and Pk for the total owning cost
/// price + A·P0 + B·Pk (the usual utility loss evaluation), the energy from a profile or from the
/// loss-load factor, E = 8.76·(P0 + LLF·P_peak) MWh with P0 and P_peak in kW.
/// </summary>
internal static class BankChoice
{
    private const double HoursPerYear = 8760;

    public static BankChoiceResult Run(StudyCase study, BankChoiceRequest request, BankCandidates candidates, LoadProfile? profile,
        CancellationToken cancel)
    {
        Transformer original = study.Network.Transformers.FirstOrDefault(t => t.Id == request.TransformerId)
            ?? throw new InputException($"no two-winding transformer with id {request.TransformerId}"
                + $" (transformers: {string.Join(", ", study.Network.Transformers.Select(t => t.Id))})", elementId: request.TransformerId);
        double? hvKv = original.HvKv ?? study.Network.FindBus(original.Hv)?.Kv, lvKv = original.LvKv ?? study.Network.FindBus(original.Lv)?.Kv;
        if (hvKv is null || lvKv is null)
            throw new InputException("the bank to replace needs its nameplate voltages (hvKv, lvKv) or its buses' kV: a candidate takes them from it",
                elementId: original.Id);
        // A transformer given in per unit becomes a nameplate one: the candidate brings its impedance, the buses their kV.
        original = original with { HvKv = hvKv, LvKv = lvKv };
        if (candidates.Transformer is string named && named != original.Id)
            throw new InputException($"the candidates file is for transformer {named}, not {original.Id}", candidates.Source);
        if (profile is null && request.LossLoadFactor is null)
            throw new InputException("give a --profile CSV or a --loss-load-factor for the energy the banks lose in a year");

        var notes = new List<string>();
        // The outages with the existing bank: what fails with it fails whatever bank is bought, so it is a
        // note about the network, not a reason against a candidate.
        IReadOnlyList<string> elements = OutageElementsNear(study.Network, original);
        var reference = Contingencies(study, original, elements, request.Scenarios, cancel);
        var existing = new HashSet<string>(StringComparer.Ordinal);
        foreach (Contingency o in reference)
        {
            if (!o.Converged)
            {
                existing.Add(OutageKey(o.Scenario, o.Element));
                notes.Add($"with {o.Element} out the load flow does not converge {Case(o.Scenario)} with the existing {original.Id} as well");
                continue;
            }
            if (o.LostBuses.Count > 0)
                notes.Add($"with {o.Element} out {string.Join(", ", o.LostBuses)} {(o.LostBuses.Count == 1 ? "loses" : "lose")} supply ({Show(o.LostLoadMw, 1)} MW {Case(o.Scenario)}) whichever bank is bought");
            foreach ((string branch, double pct) in o.Overloads.Where(x => !o.Judged.ContainsKey(x.Key)))
                notes.Add($"with {o.Element} out {branch} is loaded {Show(pct, 0)} % {Case(o.Scenario)} whichever bank is bought: a limit of the network beyond the bank");
        }
        // The breaker checks over their rating with the existing bank: the switchgear falls short whichever
        // bank is bought, so they are notes too (each candidate's percentage stays in its row).
        var existingOver = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (BreakerDuty d in FaultsAt(study, AffectedBuses(study, original), [], cancel)?.Breakers ?? [])
            foreach (DutyCheck check in d.Checks.Where(x => x.Status == DutyStatus.Over && x.DutyPercent is not null))
            {
                existingOver[DutyKey(d, check)] = check.DutyPercent!.Value;
                notes.Add($"{d.Id} {CheckName(check.Check)} duty is {Show(check.DutyPercent!.Value, 0)} % with the existing {original.Id} as well: " +
                    "its switchgear falls short whichever bank is bought");
            }
        // Candidates are independent: each on its own core, the results in the file's order.
        var assessed = new CandidateAssessment[candidates.Candidates.Count];
        try
        {
            Parallel.For(0, assessed.Length, new ParallelOptions { CancellationToken = cancel }, k =>
                assessed[k] = Assess(study, original, candidates.Candidates[k], candidates, request, profile, elements, existing, existingOver, cancel));
        }
        catch (AggregateException e) when (e.InnerExceptions.FirstOrDefault(x => x is InputException or OperationCanceledException) is { } first)
        {
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Throw(first);
        }
        foreach (CandidateAssessment a in assessed) notes.AddRange(a.Notes);
        var ranked = assessed.Where(a => a.Feasible).OrderBy(a => a.TotalOwningCost).ThenBy(a => a.Id, StringComparer.Ordinal)
            .Concat(assessed.Where(a => !a.Feasible).OrderBy(a => a.Reasons.Count).ThenBy(a => a.TotalOwningCost).ThenBy(a => a.Id, StringComparer.Ordinal))
            .ToList();
        return new BankChoiceResult
        {
            Transformer = original.Id, Candidates = ranked, Recommended = ranked.FirstOrDefault(a => a.Feasible)?.Id,
            WatchBuses = request.WatchBuses, Band = request.Band, Scenarios = request.Scenarios,
            NoLoadRate = request.NoLoadRate, LoadRate = request.LoadRate, LossLoadFactor = request.LossLoadFactor,
            ProfileSource = profile?.Source, Notes = notes.Distinct().ToList(),
        };
    }

    private static CandidateAssessment Assess(StudyCase study, Transformer original, BankCandidate c, BankCandidates file,
        BankChoiceRequest request, LoadProfile? profile, IReadOnlyList<string> elements, HashSet<string> existing, Dictionary<string, double> existingOver, CancellationToken cancel)
    {
        double p0 = (c.NoLoad?.P0Kw ?? 0) * c.Units, pk = c.LoadLossKw * c.Units;
        double capitalised = request.NoLoadRate * p0 + request.LoadRate * pk;
        var assessment = new CandidateAssessment
        {
            Id = c.Id, Description = c.Description, NoLoadLossKw = p0, LoadLossKw = pk, Price = c.Price,
            CapitalisedLosses = capitalised, TotalOwningCost = c.Price + capitalised, OnLoad = c.Tap?.Regulate is not null,
        };
        var reasons = new List<CandidateReason>();
        var notes = new List<string>();
        string where = file.Lines.TryGetValue(c.Id, out int line) && line > 0 ? $"{file.Source}:{line}: " : "";

        // The candidate's own data, as the network's rules see it in place of the transformer.
        if (CandidateProblem(c) is string problem) return assessment with { Reasons = [new(BankConstraint.CandidateData, $"{where}{problem}")] };
        Transformer bank = original with
        {
            Mva = c.Mva, Units = c.Units, ZPercent = c.ZPercent, Xr = c.Xr ?? XOverRFromLoadLoss(c), Z0Percent = null,
            Tap = c.Tap, NoLoad = c.NoLoad, RatingMva = null, RPu = null, XPu = null, BPu = null, Ratio = null,
        };
        Network network = study.Network with { Transformers = study.Network.Transformers.Select(t => t.Id == original.Id ? bank : t).ToList() };
        StudyCase candidate;
        try
        {
            candidate = StudyCase.Of(network, study.Source);
        }
        catch (InputException e)
        {
            return assessment with { Reasons = [new(BankConstraint.CandidateData, $"{where}the candidate's data: {e.Message.Replace("\n  ", "; ")}")] };
        }

        // 1. Voltage band: the tap study, or the regulated load flow for an on-load changer.
        var scenarios = candidate.Scenarios(request.Scenarios);
        int? bestTap = null;
        double? margin;
        if (c.Tap is { Regulate: null } && c.Tap.Range.Highest > c.Tap.Range.Lowest)
        {
            TapStudyResult taps = candidate.Taps(new TapStudyRequest
            {
                TransformerId = original.Id, WatchBuses = request.WatchBuses.Count > 0 ? request.WatchBuses : Fed(candidate, original),
                Band = request.Band, Scenarios = request.Scenarios,
            }, cancel: cancel);
            if (taps.Recommended.Count > 0)
            {
                bestTap = taps.Recommended[0].Position;
                margin = taps.Recommended[0].MarginPu;
            }
            else
            {
                margin = taps.Closest?.MarginPu;
                reasons.Add(new(BankConstraint.VoltageBand, BandReason(taps, request)));
            }
            if (bestTap is int p && p != c.Tap.Position)
            {
                network = network with
                {
                    Transformers = network.Transformers.Select(t => t.Id == original.Id ? t with { Tap = t.Tap! with { Position = p } } : t).ToList(),
                };
                candidate = StudyCase.Of(network, study.Source);
            }
        }
        else
        {
            (string, string) holder = c.Tap?.Regulate is not null ? ("the on-load changer cannot hold", "in") : ("with no tap range the bank leaves", "outside");
            (margin, string? failure) = RegulatedMargin(candidate, request, scenarios, original, holder, cancel);
            if (failure is not null) reasons.Add(new(BankConstraint.VoltageBand, failure));
        }

        // 2. Loading and losses of the bank in each scenario at its chosen position.
        double? peakLossKw = null, intactWorst = null;
        var intactOver = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (Scenario? s in scenarios)
        {
            LoadFlowResult r = candidate.Solve(new SolveRequest { Scenario = s?.Name }, cancel);
            if (!r.Converged) continue;
            BranchResult flow = r.Branches.Single(b => b.Id == original.Id);
            BusResult hv = r.Buses.Single(b => b.Id == original.Hv);
            double magnetisingKw = (c.NoLoad?.P0Kw ?? 0) * c.Units * Math.Pow(hv.VPu * hv.Kv / original.HvKv!.Value, 2);
            peakLossKw = Math.Max(peakLossKw ?? 0, flow.LossMw * 1000 - magnetisingKw);
            if (flow.LoadingPercent is double pct && pct > (intactWorst ?? double.NegativeInfinity)) intactWorst = pct;
            if (flow.LoadingPercent > 100)
                intactOver[s?.Name ?? ""] = flow.LoadingPercent.Value;
            if (flow.LoadingPercent > 100)
                reasons.Add(new(BankConstraint.Loading, $"{original.Id} loaded {Show(flow.LoadingPercent.Value, 0)} % of its {Show(c.Mva * c.Units, 1)} MVA {Case(s)}"));
        }

        // 3. Fault duty at the bank's buses and at the buses it feeds.
        IReadOnlyList<string> affected = AffectedBuses(candidate, original);
        (double? duty, string? dutyBreaker) = (null, null);
        FaultResult? faults = FaultsAt(candidate, affected, notes, cancel);
        if (faults?.Failure is string failed) notes.Add($"fault duty not checked: {failed}");
        foreach (BreakerDuty d in faults?.Breakers.Where(b => affected.Contains(b.Bus)) ?? [])
        {
            if (d.DutyPercent is not double pct) continue;
            if (duty is null || pct > duty) (duty, dutyBreaker) = (pct, d.Id);
            foreach (DutyCheck check in d.Checks.Where(x => x.Status == DutyStatus.Over && x.DutyPercent is not null))
                if (!existingOver.ContainsKey(DutyKey(d, check)))
                    reasons.Add(new(BankConstraint.BreakerDuty, $"{d.Id} {CheckName(check.Check)} duty {Show(check.DutyPercent!.Value, 0)} %"));
        }

        // 4. Outages of the bank and of the branches at its buses: the bank, its parallel units and the lines it feeds stay within rating.
        (double? n1, string? n1Case) = (intactWorst, intactWorst is null ? null : "intact");
        foreach (Contingency o in Contingencies(candidate, original, elements, request.Scenarios, cancel))
        {
            if (!o.Converged)
            {
                if (!existing.Contains(OutageKey(o.Scenario, o.Element)))
                    reasons.Add(new(BankConstraint.Outage, $"with {o.Element} out the load flow does not converge {Case(o.Scenario)}"));
                continue;
            }
            foreach ((string branch, double pct) in o.Judged)
            {
                if (pct > (n1 ?? double.NegativeInfinity)) (n1, n1Case) = (pct, $"{o.Element} out, {branch} {Case(o.Scenario)}");
                bool alreadyIntact = branch == original.Id && intactOver.TryGetValue(o.Scenario ?? "", out double before) && pct <= before + 1;
                if (pct > 100 && !alreadyIntact) reasons.Add(new(BankConstraint.Outage, $"with {o.Element} out {branch} is loaded {Show(pct, 0)} % {Case(o.Scenario)}"));
            }
        }

        // 5. Energy lost in a year (or over the profile).
        double? energy = null;
        if (profile is not null)
        {
            ProfileResult p = candidate.Profile(new ProfileRequest { Scenario = scenarios.Count == 1 ? scenarios[0]?.Name : null }, profile, cancel: cancel);
            energy = p.Transformers.Single(t => t.Id == original.Id).LossMwh;
        }
        else if (peakLossKw is double peak)
            energy = HoursPerYear / 1000 * (p0 + request.LossLoadFactor!.Value * peak);

        return assessment with
        {
            Reasons = reasons.Distinct().ToList(), BestTap = bestTap, MarginPu = margin, MaxDutyPercent = duty, MaxDutyBreaker = dutyBreaker,
            N1WorstPct = n1, N1WorstCase = n1Case, PeakLoadLossKw = peakLossKw, EnergyLossMwh = energy, Notes = notes,
        };
    }

    /// <summary>One outage in one scenario: whether it solved, the load it cuts off, and the loadings that matter.</summary>
    private sealed record Contingency(string? Scenario, string Element, bool Converged, IReadOnlyList<string> LostBuses, double LostLoadMw,
        IReadOnlyDictionary<string, double> Judged, IReadOnlyDictionary<string, double> Overloads);

    /// <summary>
    /// Each element out in turn in each scenario. Judged: the loading of the bank, of units in parallel with it and
    /// of the lines among the buses it feeds; Overloads: every branch above its rating.
    /// </summary>
    private static List<Contingency> Contingencies(StudyCase study, Transformer bank, IReadOnlyList<string> elements,
        IReadOnlyList<string?> scenarioNames, CancellationToken cancel)
    {
        var fed = Fed(study, bank).ToHashSet(StringComparer.Ordinal);
        bool IsJudged(BranchResult b) => b.Id == bank.Id
            || (b.Kind == BranchKind.Transformer && ((b.From == bank.Hv && b.To == bank.Lv) || (b.From == bank.Lv && b.To == bank.Hv)))
            || (b.Kind == BranchKind.Line && fed.Contains(b.From) && fed.Contains(b.To));
        var list = new List<Contingency>();
        foreach (Scenario? s in study.Scenarios(scenarioNames))
        {
            PerUnitModel intactModel = study.Model(s);
            LoadFlowResult intact = LoadFlowSolver.Solve(intactModel, LoadFlowOptions.Default, cancel);
            var energised = intact.Buses.Where(b => b.Energised).Select(b => b.Id).ToHashSet(StringComparer.Ordinal);
            foreach (string element in elements)
            {
                cancel.ThrowIfCancellationRequested();
                LoadFlowResult r = LoadFlowSolver.Solve(intactModel.WithoutBranch(element),
                    LoadFlowOptions.Default with { WarmStart = intact.Converged ? intact : null }, cancel);
                if (!r.Converged)
                {
                    list.Add(new Contingency(s?.Name, element, false, [], 0, new Dictionary<string, double>(), new Dictionary<string, double>()));
                    continue;
                }
                var lost = r.Buses.Where(b => !b.Energised && energised.Contains(b.Id)).Select(b => b.Id).ToList();
                double lostMw = intact.Buses.Where(b => lost.Contains(b.Id)).Sum(b => b.PLoadMw);
                var loaded = r.Branches.Where(b => b.LoadingPercent is not null && b.Id != element).ToList();
                list.Add(new Contingency(s?.Name, element, true, lost, lostMw,
                    loaded.Where(IsJudged).GroupBy(b => b.Id).ToDictionary(g => g.Key, g => g.Max(b => b.LoadingPercent!.Value)),
                    loaded.Where(b => b.LoadingPercent > 100).GroupBy(b => b.Id).ToDictionary(g => g.Key, g => g.Max(b => b.LoadingPercent!.Value))));
            }
        }
        return list;
    }

    /// <summary>What the network's rules cannot see: the figures only a candidate has.</summary>
    private static string? CandidateProblem(BankCandidate c)
    {
        if (!(c.Mva > 0) || !double.IsFinite(c.Mva)) return $"candidate {c.Id}: mva {Show(c.Mva, 3)} must be above 0";
        if (!(c.ZPercent > 0) || !double.IsFinite(c.ZPercent)) return $"candidate {c.Id}: zPercent {Show(c.ZPercent, 3)} must be above 0";
        if (c.Units < 1) return $"candidate {c.Id}: units {c.Units} must be 1 or more";
        if (!(c.Price >= 0) || !double.IsFinite(c.Price)) return $"candidate {c.Id}: price {Show(c.Price, 0)} must be 0 or more";
        if (!(c.LoadLossKw > 0) || !double.IsFinite(c.LoadLossKw)) return $"candidate {c.Id}: loadLossKw {Show(c.LoadLossKw, 3)} must be above 0";
        double r = c.LoadLossKw / 1000 / c.Mva;
        if (r >= c.ZPercent / 100)
            return $"candidate {c.Id}: a load loss of {Show(c.LoadLossKw, 1)} kW on {Show(c.Mva, 1)} MVA is a resistance of {Show(100 * r, 2)} %, above its impedance {Show(c.ZPercent, 2)} %";
        if (c.Xr is double xr)
        {
            if (!(xr > 0) || !double.IsFinite(xr)) return $"candidate {c.Id}: xr {Show(xr, 3)} must be above 0";
            double fromLoss = XOverRFromLoadLoss(c);
            if (Math.Abs(xr - fromLoss) > 0.1 * fromLoss)
                return $"candidate {c.Id}: xr {Show(xr, 2)} disagrees with its load loss, which gives X/R {Show(fromLoss, 2)}: check loadLossKw, zPercent and xr";
        }
        return null;
    }

    /// <summary>R = Pk / S_r on the unit's own base, X = √(z² − r²) (common practice).</summary>
    private static double XOverRFromLoadLoss(BankCandidate c)
    {
        double z = c.ZPercent / 100, r = c.LoadLossKw / 1000 / c.Mva;
        return Math.Sqrt(Math.Max(z * z - r * r, 0)) / r;
    }

    /// <summary>"no tap position holds CS11 in 0.97–1.03 at summer-night": the bus and scenario that bind at the closest position.</summary>
    private static string BandReason(TapStudyResult taps, BankChoiceRequest request)
    {
        string band = request.Band is { } b ? $"{Show(b.Low, 2)}–{Show(b.High, 2)}" : "its own band";
        if (taps.Closest is not { } closest) return "no tap position converges";
        TapStudyPoint worst = taps.Points.Where(p => p.Position == closest.Position && p.Converged).MinBy(p => p.MarginPu)!;
        WatchedVoltage bus = worst.Watched.MinBy(w => Math.Min(w.VPu - w.LowPu, w.HighPu - w.VPu))!;
        return $"no tap position holds {bus.Bus} in {band} {Case(worst.Scenario)} (best {Labels(closest.Position)}: {Show(bus.VPu, 4)} pu)";
    }

    private static string Labels(int position) => position > 0 ? $"+{position}" : position.ToString(System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>For an on-load changer or a bank without taps: the load flow of every scenario, and the worst watched margin.</summary>
    private static (double? Margin, string? Failure) RegulatedMargin(StudyCase candidate, BankChoiceRequest request,
        IReadOnlyList<Scenario?> scenarios, Transformer bank, (string Verb, string Where) holder, CancellationToken cancel)
    {
        var watch = request.WatchBuses.Count > 0 ? request.WatchBuses : Fed(candidate, bank);
        double? worst = null;
        string? failure = null;
        foreach (Scenario? s in scenarios)
        {
            LoadFlowResult r = candidate.Solve(new SolveRequest { Scenario = s?.Name }, cancel);
            if (!r.Converged)
            {
                failure ??= $"the load flow does not converge {Case(s)}";
                continue;
            }
            foreach (string id in watch)
            {
                BusResult b = r.Buses.Single(x => x.Id == id);
                double low = request.Band?.Low ?? b.VMin, high = request.Band?.High ?? b.VMax;
                double m = Math.Min(b.VPu - low, high - b.VPu);
                if (worst is null || m < worst) worst = m;
                if (m < 0) failure ??= $"{holder.Verb} {id} {holder.Where} {Show(low, 2)}–{Show(high, 2)} {Case(s)} ({Show(b.VPu, 4)} pu)";
            }
        }
        return (worst, failure);
    }

    /// <summary>The bank and every line or transformer at its hv or lv bus: the outages the bank's N-1 looks at.</summary>
    private static IReadOnlyList<string> OutageElementsNear(Network network, Transformer bank) =>
        OutageElements.InService(network)
            .Where(e => e.Id == bank.Id || e.Terminals.Contains(bank.Hv) || e.Terminals.Contains(bank.Lv))
            .Select(e => e.Id).ToList();

    private static string OutageKey(string? scenario, string outaged) => $"{scenario}\u0001{outaged}";

    private static IReadOnlyList<string> AffectedBuses(StudyCase candidate, Transformer bank) =>
        new[] { bank.Hv }.Concat(Fed(candidate, bank)).Distinct().ToList();

    /// <summary>
    /// The buses the bank feeds: its lv bus and those reached from it through lines alone; just the lv bus
    /// when lines lead back to the hv bus (a bank inside a mesh feeds no part of the network of its own).
    /// </summary>
    private static IReadOnlyList<string> Fed(StudyCase study, Transformer bank)
    {
        IReadOnlyList<string> fed = study.FedBuses(bank.Id);
        return fed.Contains(bank.Hv) ? [bank.Lv] : fed;
    }

    /// <summary>Three-phase and earth faults at the buses; three-phase only when the network lacks zero-sequence data, with a note.</summary>
    private static FaultResult? FaultsAt(StudyCase candidate, IReadOnlyList<string> buses, List<string> notes, CancellationToken cancel)
    {
        var request = new FaultRequest { Buses = buses, IncludeVoltages = false, IncludeContributions = false };
        if (!candidate.Network.Breakers.Any(b => b.InService && buses.Contains(b.Bus)))
        {
            notes.Add(buses.Count <= 6 ? $"no breaker at {string.Join(", ", buses)}: fault duty not checked"
                : $"no breaker at the bank's hv bus or the {buses.Count - 1} buses it feeds: fault duty not checked");
            return null;
        }
        try
        {
            return candidate.Fault(request, cancel);
        }
        catch (InputException earth)
        {
            try
            {
                FaultResult threePhase = candidate.Fault(request with { Kinds = [FaultKind.ThreePhase] }, cancel);
                notes.Add($"earth faults left out of the duty: {earth.Message}");
                return threePhase;
            }
            catch (InputException e)
            {
                notes.Add($"fault duty not checked: {e.Message}");
                return null;
            }
        }
    }

    private static string DutyKey(BreakerDuty d, DutyCheck check) => $"{d.Id}\n{check.Check}";

    /// <summary>"breaking", "asymmetric breaking", "making", "short-time": the checks as a reason reads them.</summary>
    private static string CheckName(DutyCheckKind check) => check switch
    {
        DutyCheckKind.Breaking => "breaking",
        DutyCheckKind.BreakingAsym => "asymmetric breaking",
        DutyCheckKind.Making => "making",
        _ => "short-time",
    };

    private static string Case(Scenario? s) => Case(s?.Name);

    private static string Case(string? scenario) => scenario is null ? "with the loads as entered" : $"at {scenario}";

    private static string Show(double v, int decimals) => v.ToString("F" + decimals, System.Globalization.CultureInfo.InvariantCulture);
}
