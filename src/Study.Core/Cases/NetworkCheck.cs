// A network read with its validation report, whether or not it can be studied: what `study check`,
// `study explain`, `study convert` and the editor need, since they work on networks with errors too.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Units;

namespace Study.Core.Cases;

/// <summary>A network and every problem validation found in it; <see cref="ToCase"/> turns it into a case to study.</summary>
public sealed record NetworkCheck(Network Network, ValidationReport Report)
{
    /// <summary>Reads either format (recognised by content) and validates.</summary>
    /// <exception cref="InputException">The file cannot be read, or is not a network file or Common Format case.</exception>
    public static NetworkCheck Read(string path)
    {
        Network network = NetworkFile.Read(path);
        return new NetworkCheck(network, NetworkValidator.Validate(network));
    }

    public static NetworkCheck Of(Network network) => new(network, NetworkValidator.Validate(network));

    /// <exception cref="InputException">Validation found errors (all listed in one message).</exception>
    public StudyCase ToCase(string? source = null) => StudyCase.Of(Network, source);

    /// <summary>One element traced from its data to the per-unit values the engine uses (<c>study explain</c>).</summary>
    /// <exception cref="InputException">No element has that id, the scenario is unknown, or its data cannot be converted.</exception>
    public ElementExplanation Explain(string id, string? scenario)
    {
        Scenario? chosen = scenario is null ? null : Network.FindScenario(scenario)
            ?? throw new InputException($"scenario '{scenario}' not found"
                + (Network.Scenarios.Count == 0 ? ": the network defines no scenarios" : $"; the network has: {string.Join(", ", Network.Scenarios.Select(s => s.Name))}"));
        return Explainer.Explain(Network, id, chosen);
    }
}
