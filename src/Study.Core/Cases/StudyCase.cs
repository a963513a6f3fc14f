// The application layer: a network read, validated and compiled once per scenario, and every study
// asked of it. The command line and the terminal UI call only this, so both refuse the same networks
// with the same words and run every study the same way.
using System.Collections.Concurrent;
using Study.Core.Faults;
using Study.Core.Io;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.Core.Cases;

/// <summary>
/// A network that passed validation (errors stop; warnings travel with the case), with its per-unit
/// model per scenario built on first use and kept. Each study method checks its request against the
/// network (scenario names, element and bus ids), compiles what it needs and calls the engine; an
/// expected outcome such as a load flow that does not converge is a result with a reason, not an
/// exception. Thread-safe: studies may run on other threads while the case is read.
/// </summary>
public sealed class StudyCase
{
    /// <summary>How many errors the refusal message lists before "and N more".</summary>
    private const int ListedErrors = 10;

    private readonly ConcurrentDictionary<string, PerUnitModel> models = new(StringComparer.Ordinal);

    private StudyCase(Network network, string? source, ValidationReport validation)
    {
        Network = network;
        Source = source;
        Validation = validation;
    }

    /// <summary>The network as read (engineering units).</summary>
    public Network Network { get; }

    /// <summary>The file the network came from, for messages; null for a network held in memory.</summary>
    public string? Source { get; }

    /// <summary>What validation found: warnings only, since a network with errors never becomes a case.</summary>
    public ValidationReport Validation { get; }

    public IReadOnlyList<Problem> Warnings => Validation.Warnings.ToList();

    /// <summary>Reads a network file or an IEEE Common Format case and validates it.</summary>
    /// <param name="stage">Called with "read" after reading and "validate" after validating (stage timings).</param>
    /// <exception cref="InputException">The file cannot be read or parsed, or validation finds errors (all listed in one message).</exception>
    public static StudyCase Open(string path, Action<string>? stage = null)
    {
        Network network = NetworkFile.Read(path);
        stage?.Invoke("read");
        StudyCase study = Of(network, path);
        stage?.Invoke("validate");
        return study;
    }

    /// <summary>Validates a network held in memory (the terminal UI's edits, a generated grid).</summary>
    /// <param name="source">The file to name in messages; defaults to the file the network was read from.</param>
    /// <exception cref="InputException">Validation finds errors (all listed in one message).</exception>
    public static StudyCase Of(Network network, string? source = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        ValidationReport report = NetworkValidator.Validate(network);
        source ??= network.Source.File;
        if (report.HasErrors) throw Refusal(report);
        return new StudyCase(network, source, report);
    }

    /// <summary>
    /// The one message for a network that cannot be studied: every error (the first ten, then a count),
    /// each with its file line and element, and where to see them all.
    /// </summary>
    public static InputException Refusal(ValidationReport report)
    {
        var errors = report.Errors.ToList();
        string more = errors.Count > ListedErrors ? $"\n  ... and {errors.Count - ListedErrors} more" : "";
        return new InputException(
            $"{errors.Count} error(s) in the network; 'study check' lists every problem:\n  "
            + string.Join("\n  ", errors.Take(ListedErrors).Select(p => p.Describe())) + more);
    }

    /// <summary>The named scenario (names match without regard to case), or null for the loads as entered.</summary>
    /// <exception cref="InputException">No scenario has that name.</exception>
    public Scenario? Scenario(string? name)
    {
        if (name is null) return null;
        return Network.FindScenario(name) ?? throw new InputException(
            Network.Scenarios.Count == 0
                ? $"scenario '{name}' not found: the network defines no scenarios"
                : $"scenario '{name}' not found; the network has: {string.Join(", ", Network.Scenarios.Select(s => s.Name))}");
    }

    /// <summary>
    /// The named scenarios (a null name: the loads as entered); none named means every scenario, or the
    /// loads as entered when the network has none.
    /// </summary>
    /// <exception cref="InputException">A name matches no scenario, or a name is given twice.</exception>
    public IReadOnlyList<Scenario?> Scenarios(IReadOnlyList<string?> names)
    {
        if (names.Count == 0) return Network.Scenarios.Count > 0 ? Network.Scenarios.ToList<Scenario?>() : [null];
        var chosen = new List<Scenario?>();
        foreach (string? name in names)
        {
            Scenario? s = Scenario(name);
            if (chosen.Contains(s)) throw new InputException($"scenario '{name ?? "as entered"}' is named twice");
            chosen.Add(s);
        }
        return chosen;
    }

    /// <summary>The network compiled for one scenario (null: the loads as entered), built once and kept.</summary>
    /// <exception cref="InputException">Data the per-unit conversion needs is missing or unusable.</exception>
    public PerUnitModel Model(Scenario? scenario) =>
        models.GetOrAdd(scenario?.Name ?? "", _ => PerUnitModel.Build(Network, scenario));

    /// <summary>For an imported case: how far a solved load flow sits from the solution published with it (null when none).</summary>
    public PublishedComparison? CompareWithPublished(LoadFlowResult result) => PublishedComparison.Compare(Network, result);

    /// <summary>The load flow of one scenario.</summary>
    /// <exception cref="InputException">The request is out of bounds or names an unknown scenario.</exception>
    public LoadFlowResult Solve(SolveRequest request, CancellationToken cancel = default)
    {
        request.Validate();
        PerUnitModel model = Model(Scenario(request.Scenario));
        return LoadFlowSolver.Solve(model, request.Options, cancel);
    }

    /// <summary>
    /// Fault levels and breaker duty. With the load-flow method the pre-fault load flow is solved here;
    /// when it does not converge the result says so (<see cref="FaultResult.Failure"/>) and holds no faults.
    /// </summary>
    /// <exception cref="InputException">The request is invalid, names an unknown bus or scenario, or fault data is missing.</exception>
    public FaultResult Fault(FaultRequest request, CancellationToken cancel = default)
    {
        request.Validate();
        return FaultStudy.Run(Model(Scenario(request.Scenario)), request, cancel);
    }

    /// <summary>Every tap position of one transformer in each scenario asked for, ranked.</summary>
    /// <exception cref="InputException">The request is invalid, or names an unknown transformer, bus or scenario.</exception>
    public TapStudyResult Taps(TapStudyRequest request, IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        request.Validate();
        CheckTapped(request.TransformerId);
        foreach (string bus in request.WatchBuses)
            if (Network.FindBus(bus) is null)
                throw new InputException($"watched bus {bus} is not in the network", elementId: bus);
        var scenarioModels = Scenarios(request.Scenarios).Select(Model).ToList();
        return TapStudy.Run(scenarioModels, request, LoadFlowOptions.Default, progress, cancel);
    }

    /// <summary>Each line and transformer asked for out in turn, in each scenario asked for, ranked by severity.</summary>
    /// <exception cref="InputException">The request is invalid, or names an element that is not an in-service line or transformer.</exception>
    public OutageScreeningResult Outages(OutageScreeningRequest request, IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        request.Validate();
        IReadOnlyList<OutageElement> elements = OutageElements.Pick(Network, request.ElementIds);
        var scenarioModels = Scenarios(request.Scenarios).Select(Model).ToList();
        return OutageScreening.Run(scenarioModels, elements, LoadFlowOptions.Default, request.MaxParallelism, progress, cancel, request.Shard);
    }

    /// <summary>
    /// A load flow per step of a profile, with on-load tap changers acting between steps; the statistics of
    /// the whole profile. The watched buses default to the buses the on-load changers regulate.
    /// </summary>
    /// <exception cref="InputException">The request is invalid, or a profile column or watched bus names nothing in the network.</exception>
    public ProfileResult Profile(ProfileRequest request, LoadProfile profile, IProgress<double>? progress = null, CancellationToken cancel = default)
    {
        request.Validate();
        if (profile.LoadIds is { } ids)
            for (int k = 0; k < ids.Count; k++)
                if (!Network.Loads.Any(l => l.Id == ids[k]) && !Network.Motors.Any(m => m.Id == ids[k]))
                    throw new InputException($"column '{ids[k]}' names no load or motor of the network"
                        + (IdHint(ids[k], Network.Loads.Select(l => l.Id).Concat(Network.Motors.Select(m => m.Id))) is { } near ? $": did you mean '{near}'?" : ""),
                        profile.Source, 1, profile.LoadColumns?[k]);
        foreach (string bus in request.WatchBuses)
            if (Network.FindBus(bus) is null) throw new InputException($"watched bus {bus} is not in the network", elementId: bus);
        PerUnitModel model = Model(Scenario(request.Scenario));
        IReadOnlyList<string> watch = request.WatchBuses.Count > 0 ? request.WatchBuses
            : model.Taps.Where(t => t.RegulatedBus is not null).Select(t => model.Buses[t.RegulatedBus!.Value].Id).Distinct().ToList();
        return ProfileStudy.Run(model, profile, watch, request.Options, progress, cancel);
    }

    /// <summary>The lv bus of a transformer and every bus reached from it through lines alone (the buses it feeds).</summary>
    /// <exception cref="InputException">No in-service transformer has the id.</exception>
    public IReadOnlyList<string> FedBuses(string transformerId)
    {
        PerUnitModel model = Model(null);
        for (int k = 0; k < model.Branches.Count; k++)
        {
            PuBranch b = model.Branches[k];
            if (b.Id == transformerId && b.Kind is BranchKind.Transformer or BranchKind.ThreeWindingTransformer)
                return TapStudy.FedBuses(model, TapStudy.LvBus(model, k));
        }
        throw new InputException($"no transformer in service with id {transformerId}", elementId: transformerId);
    }

    /// <summary>
    /// Each candidate bank in place of one transformer, held to the voltage band, loading, fault duty and
    /// outages, then ranked by total owning cost. The annual energy comes from the profile when given.
    /// </summary>
    /// <exception cref="InputException">The request is invalid or names an unknown transformer, bus or scenario.</exception>
    public BankChoiceResult Choose(BankChoiceRequest request, BankCandidates candidates, LoadProfile? profile = null,
        CancellationToken cancel = default)
    {
        request.Validate();
        foreach (string bus in request.WatchBuses)
            if (Network.FindBus(bus) is null) throw new InputException($"watched bus {bus} is not in the network", elementId: bus);
        Scenarios(request.Scenarios);
        return BankChoice.Run(this, request, candidates, profile, cancel);
    }

    private static string? IdHint(string id, IEnumerable<string> known) => IdSuggestion.Closest(id, known);

    /// <summary>The instant one or more motors start: every bus before and during, each started motor's terminal voltage.</summary>
    /// <exception cref="InputException">The request is invalid, or names a motor or watched bus that is not in the network.</exception>
    public MotorStartResult Start(MotorStartRequest request, CancellationToken cancel = default)
    {
        request.Validate();
        foreach (string id in request.Motors)
            if (!Network.Motors.Any(m => m.Id == id))
                throw new InputException($"no motor with id {id}"
                    + (IdHint(id, Network.Motors.Select(m => m.Id)) is { } near ? $": did you mean '{near}'?"
                        : Network.Motors.Count == 0 ? " (the network has no motors)" : $" (motors: {string.Join(", ", Network.Motors.Select(m => m.Id))})"),
                    elementId: id);
        foreach (string bus in request.WatchBuses)
            if (Network.FindBus(bus) is null) throw new InputException($"watched bus {bus} is not in the network", elementId: bus);
        return MotorStart.Run(Model(Scenario(request.Scenario)), request, cancel);
    }

    /// <summary>
    /// The load flow of one scenario with one line or transformer out: what an outage of a screening
    /// leaves, bus by bus and branch by branch. Solved as the screening solves it (warm started from the
    /// intact case when that converges), so it agrees with the screening's row.
    /// </summary>
    /// <exception cref="InputException">The request is out of bounds, names an unknown scenario, or the element is not an in-service line or transformer.</exception>
    public LoadFlowResult SolveWithout(string elementId, SolveRequest request, CancellationToken cancel = default)
    {
        request.Validate();
        OutageElements.Pick(Network, [elementId]);
        PerUnitModel intact = Model(Scenario(request.Scenario));
        LoadFlowResult before = LoadFlowSolver.Solve(intact, request.Options, cancel);
        return LoadFlowSolver.Solve(intact.WithoutBranch(elementId), request.Options with { WarmStart = before.Converged ? before : null }, cancel);
    }

    /// <summary>Two cases (two networks, or two scenarios of one) solved alike and compared bus by bus and branch by branch.</summary>
    /// <exception cref="InputException">A scenario name matches no scenario of its network.</exception>
    public static CaseComparisonResult Compare(StudyCase before, string? beforeScenario, StudyCase after, string? afterScenario,
        LoadFlowOptions? options = null, CancellationToken cancel = default)
    {
        options ??= LoadFlowOptions.Default;
        options.Validate();
        PerUnitModel b = before.Model(before.Scenario(beforeScenario));
        PerUnitModel a = after.Model(after.Scenario(afterScenario));
        return CaseComparison.Compare(LoadFlowSolver.Solve(b, options, cancel), LoadFlowSolver.Solve(a, options, cancel));
    }

    /// <summary>The transformer must exist, have a tap changer and be in service with its buses.</summary>
    private void CheckTapped(string id)
    {
        TapChanger? tap = Network.Transformers.FirstOrDefault(t => t.Id == id)?.Tap;
        bool found = tap is not null || Network.Transformers.Any(t => t.Id == id);
        if (!found)
        {
            tap = Network.ThreeWindingTransformers.FirstOrDefault(t => t.Id == id)?.Tap;
            found = tap is not null || Network.ThreeWindingTransformers.Any(t => t.Id == id);
        }
        if (found && tap is null)
            throw new InputException($"transformer {id} has no tap changer: there are no positions to study", elementId: id);
        if (!found)
        {
            string known = string.Join(", ", Network.Transformers.Where(x => x.Tap is not null).Select(x => x.Id)
                .Concat(Network.ThreeWindingTransformers.Where(x => x.Tap is not null).Select(x => x.Id)));
            throw new InputException($"no transformer with id {id}" + (known.Length > 0 ? $" (transformers with taps: {known})" : ""), elementId: id);
        }
        if (!Model(null).Taps.Any(t => t.Id == id))
            throw new InputException($"transformer {id} is out of service (or on an out-of-service bus): nothing to study", elementId: id);
    }
}

/// <summary>A profile study asked for: the scenario whose loads the profile scales, the buses to chart, the solver options.</summary>
public sealed record ProfileRequest
{
    /// <summary>Scenario name; null for the loads as entered.</summary>
    public string? Scenario { get; init; }

    /// <summary>Buses whose voltage is kept for every step; empty means the buses the on-load tap changers regulate.</summary>
    public IReadOnlyList<string> WatchBuses { get; init; } = [];

    public LoadFlowOptions Options { get; init; } = LoadFlowOptions.Default;

    /// <exception cref="InputException">An option is out of bounds.</exception>
    public void Validate() => Options.Validate();
}

/// <summary>A load flow asked for: which scenario, with which solver options.</summary>
public sealed record SolveRequest
{
    /// <summary>Scenario name; null for the loads as entered.</summary>
    public string? Scenario { get; init; }

    public LoadFlowOptions Options { get; init; } = LoadFlowOptions.Default;

    /// <exception cref="InputException">An option is out of bounds.</exception>
    public void Validate() => Options.Validate();
}
