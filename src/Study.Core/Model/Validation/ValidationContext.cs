// The state one validation pass shares between rule files: the network, a bus index and the findings.
namespace Study.Core.Model.Validation;

/// <summary>Collects problems, attaching the file and line of the element each one is about.</summary>
internal sealed class ValidationContext
{
    private readonly List<Problem> problems = [];

    public ValidationContext(Network network)
    {
        Network = network;
        var buses = new Dictionary<string, Bus>(StringComparer.Ordinal);
        foreach (Bus? bus in Items(network.Buses))
        {
            if (bus is not null && !string.IsNullOrEmpty(bus.Id)) buses.TryAdd(bus.Id, bus);
        }
        BusesById = buses;
    }

    public Network Network { get; }

    /// <summary>Buses by id; with duplicate ids the first one wins (the duplicate is reported by IdRules).</summary>
    public IReadOnlyDictionary<string, Bus> BusesById { get; }

    public IReadOnlyList<Problem> Problems => problems;

    public ElementScope At(ElementKind kind, string? id) => new(this, kind, id);

    public void Add(Severity severity, ElementKind? kind, string? id, string? field, string message)
    {
        int? line = kind is ElementKind k && !string.IsNullOrEmpty(id)
            ? Network.Source.LineOf(ElementKinds.FamilyOf(k), id)
            : null;
        problems.Add(new Problem(severity, kind, id, field, message, Network.Source.File, line));
    }

    /// <summary>
    /// A list from the model, tolerating what a hand-edited file can still deliver through the
    /// reader: <c>"buses": null</c> gives a null list, <c>[null]</c> a null entry.
    /// </summary>
    public static IReadOnlyList<T?> Items<T>(IReadOnlyList<T>? list) where T : class => list ?? [];
}
