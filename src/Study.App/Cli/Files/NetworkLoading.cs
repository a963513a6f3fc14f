// Shared steps of the study commands: read a network, refuse it when validation finds errors, pick a scenario.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.App.Cli.Files;

public static class NetworkLoading
{
    /// <summary>
    /// Reads and validates; errors become one InputException listing every problem. Warnings do not
    /// stop the study but are written to <paramref name="err"/>, so a likely mistake (sides swapped,
    /// kV typed as pu) is never solved in silence.
    /// </summary>
    /// <param name="clock">When given, the reading and the validation are timed as stages "read" and "validate".</param>
    public static Network ReadValid(string path, TextWriter err, StageClock? clock = null)
    {
        Network network = NetworkFile.Read(path);
        clock?.Lap("read");
        ValidationReport report = NetworkValidator.Validate(network);
        clock?.Lap("validate");
        if (report.HasErrors)
        {
            var errors = report.Problems.Where(p => p.Severity == Severity.Error).ToList();
            throw new InputException(
                $"{errors.Count} error(s) in the network; run 'study check {path}' for the full report:\n  "
                + string.Join("\n  ", errors.Take(10).Select(p => p.Describe()))
                + (errors.Count > 10 ? $"\n  ... and {errors.Count - 10} more" : ""));
        }
        var warnings = report.Problems.Where(p => p.Severity == Severity.Warning).ToList();
        foreach (Problem w in warnings.Take(5)) err.WriteLine(w.Describe());
        if (warnings.Count > 5) err.WriteLine($"... and {warnings.Count - 5} more warnings; run 'study check {path}' for all of them");
        return network;
    }

    /// <summary>The named scenario, or null (loads as entered) when none is asked for.</summary>
    public static Scenario? PickScenario(Network network, string? name)
    {
        if (name is null) return null;
        return network.FindScenario(name) ?? throw new UsageException(
            network.Scenarios.Count == 0
                ? $"scenario '{name}' not found: the network defines no scenarios"
                : $"scenario '{name}' not found; the network has: {string.Join(", ", network.Scenarios.Select(s => s.Name))}");
    }
}
