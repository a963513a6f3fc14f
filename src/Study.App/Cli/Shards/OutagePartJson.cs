// The part a shard of an outage screening prints (`study outages --shard K/N --json`) and
// `study merge` reads: every figure of its outages, exactly, and the bookkeeping a merge checks.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.App.Cli.Shards;

/// <summary>
/// One shard's result (README, "Sharding and merging"). <see cref="Part"/> says what was screened, on
/// which network, with which options, and which slice this is; <see cref="Scenarios"/> hold the intact
/// case of each scenario and this shard's outages with every figure the merged result shows, plus
/// each outage's number in the whole screening (<see cref="OutagePartOutageJson.Order"/>) and its
/// stress, the keys that order ties. Numbers are written in shortest round-trip form, so a merge
/// reads back exactly what the shard computed.
/// </summary>
public sealed record OutagePartJson(OutagePartHeaderJson Part, IReadOnlyList<OutagePartScenarioJson> Scenarios);

/// <param name="Format">Always <see cref="FormatName"/>: tells a part from other JSON.</param>
/// <param name="Network">The network file as the shard was given it (for messages only).</param>
/// <param name="NetworkSha256">SHA-256 of the network file's bytes: every shard must have read the same file.</param>
/// <param name="OutageCount">Outages in the whole screening (elements × scenarios).</param>
/// <param name="Elements">Every element taken out, in the screening's order.</param>
public sealed record OutagePartHeaderJson(string Format, int Shard, int Shards, string Network, string NetworkSha256,
    OutagePartOptionsJson Options, int OutageCount, IReadOnlyList<string> Elements)
{
    public const string FormatName = "study-outages-part";
}

/// <summary>What the screening was asked (elements and scenarios as named, empty for all) and the load-flow options.</summary>
public sealed record OutagePartOptionsJson(IReadOnlyList<string> Elements, IReadOnlyList<string?> Scenarios,
    double TolerancePu, int MaxIterations, int MaxControlRounds, bool EnforceQLimits, bool RegulateTaps)
{
    public static OutagePartOptionsJson Of(OutageScreeningRequest request, LoadFlowOptions options) => new(
        request.ElementIds, request.Scenarios, options.TolerancePu, options.MaxIterations, options.MaxControlRounds,
        options.EnforceQLimits, options.RegulateTaps);

    /// <summary>Equal when every option is: two parts with different options are not shards of one screening.</summary>
    public bool SameAs(OutagePartOptionsJson other) =>
        Elements.SequenceEqual(other.Elements, StringComparer.Ordinal) && Scenarios.SequenceEqual(other.Scenarios)
        && TolerancePu.Equals(other.TolerancePu) && MaxIterations == other.MaxIterations && MaxControlRounds == other.MaxControlRounds
        && EnforceQLimits == other.EnforceQLimits && RegulateTaps == other.RegulateTaps;
}

public sealed record OutagePartViolationJson(string Element, string Kind, string Type, double Value, double Limit);

public sealed record OutagePartScenarioJson(string? Scenario, bool IntactConverged, string? IntactMessage, double IntactLoadMw,
    IReadOnlyList<OutagePartViolationJson> IntactViolations, IReadOnlyList<OutagePartOutageJson> Outages);

public sealed record OutagePartNewViolationJson(string Element, string Kind, string Type, double Value, double Limit, double? IntactValue);

public sealed record OutagePartParallelJson(string Element, double? LoadingPercent);

/// <param name="Order">The outage's number in the whole screening (scenario by scenario, elements in order).</param>
public sealed record OutagePartOutageJson(int Order, string Element, string Kind, bool Converged, string? Message,
    IReadOnlyList<string> IslandedBuses, double LostLoadMw, double LostGenerationMw, IReadOnlyList<OutagePartNewViolationJson> NewViolations,
    double? WorstVPu, string? WorstVBus, double? WorstLoadingPercent, string? WorstLoadingElement,
    IReadOnlyList<OutagePartParallelJson> ParallelLoadings, double StressPercent, double Severity);

/// <summary>Result records to the part's JSON and back, every figure unchanged.</summary>
public static class OutagePartRecords
{
    public static OutagePartScenarioJson From(ScenarioScreening s) => new(s.Scenario, s.IntactConverged, s.IntactMessage, s.IntactLoadMw,
        s.IntactViolations.Select(v => new OutagePartViolationJson(v.Element, ElementName(v.Kind), TypeName(v.Type), v.Value, v.Limit)).ToList(),
        s.Outages.Select(From).ToList());

    private static OutagePartOutageJson From(OutageCase o) => new(o.Order, o.Element, BranchName(o.Kind), o.Converged, o.Message,
        o.IslandedBuses, o.LostLoadMw, o.LostGenerationMw,
        o.NewViolations.Select(v => new OutagePartNewViolationJson(v.Element, ElementName(v.Kind), TypeName(v.Type), v.Value, v.Limit, v.IntactValue)).ToList(),
        o.WorstVPu, o.WorstVBus, o.WorstLoadingPercent, o.WorstLoadingElement,
        o.ParallelLoadings.Select(p => new OutagePartParallelJson(p.Element, p.LoadingPercent)).ToList(), o.StressPercent, o.Severity);

    /// <summary>The shard's result as the engine gave it.</summary>
    /// <exception cref="InputException">A kind or type is not one the program writes.</exception>
    public static OutageScreeningResult ToResult(OutagePartJson part, string file) => new()
    {
        Elements = part.Part.Elements,
        OutageCount = part.Part.OutageCount,
        Shard = new OutageShard(part.Part.Shard, part.Part.Shards),
        Scenarios = part.Scenarios.Select(s => new ScenarioScreening
        {
            Scenario = s.Scenario, IntactConverged = s.IntactConverged, IntactMessage = s.IntactMessage, IntactLoadMw = s.IntactLoadMw,
            IntactViolations = s.IntactViolations.Select(v => new Violation
            {
                Element = v.Element, Kind = ElementOf(v.Kind, file), Type = TypeOf(v.Type, file), Value = v.Value, Limit = v.Limit,
            }).ToList(),
            Outages = s.Outages.Select(o => ToCase(o, s.Scenario, file)).ToList(),
        }).ToList(),
    };

    private static OutageCase ToCase(OutagePartOutageJson o, string? scenario, string file) => new()
    {
        Element = o.Element, Kind = BranchOf(o.Kind, file), Scenario = scenario, Order = o.Order, Converged = o.Converged, Message = o.Message,
        IslandedBuses = o.IslandedBuses, LostLoadMw = o.LostLoadMw, LostGenerationMw = o.LostGenerationMw,
        NewViolations = o.NewViolations.Select(v => new OutageViolation
        {
            Element = v.Element, Kind = ElementOf(v.Kind, file), Type = TypeOf(v.Type, file), Value = v.Value, Limit = v.Limit, IntactValue = v.IntactValue,
        }).ToList(),
        WorstVPu = o.WorstVPu, WorstVBus = o.WorstVBus, WorstLoadingPercent = o.WorstLoadingPercent, WorstLoadingElement = o.WorstLoadingElement,
        ParallelLoadings = o.ParallelLoadings.Select(p => new ParallelLoading(p.Element, p.LoadingPercent)).ToList(),
        StressPercent = o.StressPercent, Severity = o.Severity,
    };

    private static readonly (BranchKind Kind, string Name)[] Branches =
        [(BranchKind.Line, "line"), (BranchKind.Transformer, "transformer"), (BranchKind.ThreeWindingTransformer, "three-winding")];

    private static readonly (ElementKind Kind, string Name)[] Elements =
        [(ElementKind.Bus, "bus"), (ElementKind.Line, "line"), (ElementKind.Transformer, "transformer"), (ElementKind.ThreeWindingTransformer, "three-winding")];

    private static readonly (ViolationKind Kind, string Name)[] Types =
        [(ViolationKind.Low, "low"), (ViolationKind.High, "high"), (ViolationKind.Overload, "overload")];

    private static string BranchName(BranchKind kind) => Branches.First(b => b.Kind == kind).Name;

    private static string ElementName(ElementKind kind) => Elements.First(e => e.Kind == kind).Name;

    private static string TypeName(ViolationKind kind) => Types.First(t => t.Kind == kind).Name;

    private static BranchKind BranchOf(string name, string file) =>
        Branches.FirstOrDefault(b => b.Name == name) is { Name: not null } b ? b.Kind : throw Unknown("an outage kind", name, file);

    private static ElementKind ElementOf(string name, string file) =>
        Elements.FirstOrDefault(e => e.Name == name) is { Name: not null } e ? e.Kind : throw Unknown("a violation's element kind", name, file);

    private static ViolationKind TypeOf(string name, string file) =>
        Types.FirstOrDefault(t => t.Name == name) is { Name: not null } t ? t.Kind : throw Unknown("a violation type", name, file);

    private static InputException Unknown(string what, string name, string file) =>
        new($"'{name}' is not {what} a part holds: the file was not written by 'study outages --shard'", file);
}
