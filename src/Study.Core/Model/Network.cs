// The whole network as the engineer entered it: engineering units, immutable.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;

namespace Study.Core.Model;

/// <summary>
/// A network in engineering units, as read from a network file or an imported case. Immutable:
/// edits make a new instance with a <c>with</c> expression.
/// </summary>
public sealed record Network
{
    public Network() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal Network(
        string format = FormatName,
        int version = CurrentVersion,
        string name = "",
        double baseMva = 100,
        double frequencyHz = 50,
        IReadOnlyList<Bus>? buses = null,
        IReadOnlyList<Supply>? supplies = null,
        IReadOnlyList<Generator>? generators = null,
        IReadOnlyList<Load>? loads = null,
        IReadOnlyList<Shunt>? shunts = null,
        IReadOnlyList<Line>? lines = null,
        IReadOnlyList<Transformer>? transformers = null,
        IReadOnlyList<ThreeWindingTransformer>? threeWindingTransformers = null,
        IReadOnlyList<Motor>? motors = null,
        IReadOnlyList<Breaker>? breakers = null,
        IReadOnlyList<Scenario>? scenarios = null,
        PublishedSolution? publishedSolution = null)
    {
        Format = format;
        Version = version;
        Name = name;
        BaseMva = baseMva;
        FrequencyHz = frequencyHz;
        Buses = buses ?? [];
        Supplies = supplies ?? [];
        Generators = generators ?? [];
        Loads = loads ?? [];
        Shunts = shunts ?? [];
        Lines = lines ?? [];
        Transformers = transformers ?? [];
        ThreeWindingTransformers = threeWindingTransformers ?? [];
        Motors = motors ?? [];
        Breakers = breakers ?? [];
        Scenarios = scenarios ?? [];
        PublishedSolution = publishedSolution;
    }

    public const string FormatName = "study-network";
    public const int CurrentVersion = 2;

    public string Format { get; init; } = FormatName;
    public int Version { get; init; } = CurrentVersion;
    public string Name { get; init; } = "";
    public double BaseMva { get; init; } = 100;
    public double FrequencyHz { get; init; } = 50;

    public IReadOnlyList<Bus> Buses { get; init; } = [];
    public IReadOnlyList<Supply> Supplies { get; init; } = [];
    public IReadOnlyList<Generator> Generators { get; init; } = [];
    public IReadOnlyList<Load> Loads { get; init; } = [];
    public IReadOnlyList<Shunt> Shunts { get; init; } = [];
    public IReadOnlyList<Line> Lines { get; init; } = [];
    public IReadOnlyList<Transformer> Transformers { get; init; } = [];
    public IReadOnlyList<ThreeWindingTransformer> ThreeWindingTransformers { get; init; } = [];
    public IReadOnlyList<Motor> Motors { get; init; } = [];
    public IReadOnlyList<Breaker> Breakers { get; init; } = [];
    public IReadOnlyList<Scenario> Scenarios { get; init; } = [];

    /// <summary>For imported cases: the solution printed with the case.</summary>
    public PublishedSolution? PublishedSolution { get; init; }

    /// <summary>Where each element came from in its file (not written back); see <see cref="SourceMap"/>.</summary>
    [JsonIgnore]
    public SourceMap Source { get; init; } = SourceMap.Empty;

    /// <summary>True when no bus states its base kV: a per-unit-only case (several archive cases).</summary>
    [JsonIgnore]
    /// <remarks>Null entries (which the validator reports) are skipped, so this never throws on a parsed file.</remarks>
    public bool IsPerUnitOnly => Buses.Any(b => b is not null) && Buses.All(b => b is null || b.Kv == 0);

    public Bus? FindBus(string id) => Buses.FirstOrDefault(b => b?.Id == id);

    public Scenario? FindScenario(string name) =>
        Scenarios.FirstOrDefault(s => s is not null && string.Equals(s.Name, name, StringComparison.OrdinalIgnoreCase));
}
