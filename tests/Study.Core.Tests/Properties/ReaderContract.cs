// The promise every reader makes: a Network, or an InputException that says where — and nothing after it throws.
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Units;

namespace Study.Core.Tests.Properties;

internal static class ReaderContract
{
    /// <summary>
    /// Parse gives a Network or an InputException naming the file and a line (with column when given)
    /// or an element id; validation of what was read never throws; a network without errors is either
    /// built or refused by an InputException. Any other exception fails the property.
    /// </summary>
    public static ReaderOutcome Check(Func<string, string, Network> parse, string text, string fileName)
    {
        Network network;
        try
        {
            network = parse(text, fileName);
        }
        catch (InputException e)
        {
            RequireLocation(e, fileName);
            return ReaderOutcome.Refused;
        }
        if (network is null) throw new InvalidOperationException("the reader returned null instead of a network");
        RequireNamedEnums(network, "network");

        ValidationReport report = NetworkValidator.Validate(network);
        _ = report.Describe();
        if (report.HasErrors) return ReaderOutcome.Invalid;

        Scenario? scenario = network.Scenarios.Count > 0 ? network.Scenarios[0] : null;
        try
        {
            PerUnitModel.Build(network, scenario);
        }
        catch (InputException e)
        {
            if (string.IsNullOrWhiteSpace(e.Message)) throw new InvalidOperationException("an InputException with no message");
            return ReaderOutcome.BuildRefused;
        }
        return ReaderOutcome.Built;
    }

    /// <summary>Every enum in what was read is one of its named values (a number in the file is refused, not kept).</summary>
    private static void RequireNamedEnums(object? value, string path)
    {
        switch (value)
        {
            case null or string or double or int or bool:
                return;
            case Enum e:
                if (!Enum.IsDefined(e.GetType(), e)) throw new InvalidOperationException($"{path} holds {e.GetType().Name} {e}, which has no name");
                return;
            case System.Collections.IEnumerable list:
                int i = 0;
                foreach (object? item in list) RequireNamedEnums(item, $"{path}[{i++}]");
                return;
        }
        foreach (var p in value.GetType().GetProperties(System.Reflection.BindingFlags.Public | System.Reflection.BindingFlags.Instance))
        {
            // Only what the file holds: derived properties ([JsonIgnore]) are not read from it.
            if (p.GetIndexParameters().Length == 0 && !p.IsDefined(typeof(System.Text.Json.Serialization.JsonIgnoreAttribute), true))
                RequireNamedEnums(p.GetValue(value), $"{path}.{p.Name}");
        }
    }

    public static void RequireLocation(InputException e, string fileName)
    {
        if (string.IsNullOrWhiteSpace(e.Message))
            throw new InvalidOperationException("an InputException with no message");
        if (e.File != fileName)
            throw new InvalidOperationException($"InputException names file '{e.File}', not '{fileName}': {e.Message}");
        if (e.Line is null && string.IsNullOrWhiteSpace(e.ElementId))
            throw new InvalidOperationException($"InputException has neither a line nor an element id: {e.Describe()}");
        if (e.Line is < 1 || e.Column is < 1)
            throw new InvalidOperationException($"InputException location is not 1-based: {e.Describe()}");
        _ = e.Describe();
    }
}
