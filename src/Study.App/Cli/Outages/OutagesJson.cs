// The --json shape of `study outages` (README, "Results as JSON"): one object per scenario.
using System.Text.Json.Serialization;
using Study.App.Cli.Solve;
using Study.Core.Studies;

using Study.App.Reports;

namespace Study.App.Cli.Outages;

/// <summary>A new violation: the element, its kind ("bus" or the branch kind), the limit broken ("low", "high", "overload").</summary>
public sealed record OutageViolationJson(string Element, string Kind, string? Type, double Value, double Limit, double? IntactValue);

public sealed record ParallelLoadingJson(string Element, double? LoadingPercent);

public sealed record OutageJson(string Element, string Kind, bool Converged, IReadOnlyList<string> IslandedBuses, double LostLoadMw,
    IReadOnlyList<OutageViolationJson> NewViolations, double? WorstVPu, double? WorstLoadingPercent, double Severity)
{
    public string? WorstVBus { get; init; }
    public string? WorstLoadingElement { get; init; }
    /// <summary>Branches left between the same two buses (for a bank: the remaining bank) and their loading.</summary>
    public IReadOnlyList<ParallelLoadingJson> ParallelLoadings { get; init; } = [];
    public double LostGenerationMw { get; init; }

    /// <summary>Only when the load flow did not converge with the element out: why.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)]
    public string? Message { get; init; }
}

public sealed record OutagesJson(string? Scenario, IReadOnlyList<OutageJson> Outages)
{
    /// <summary>The result as `outages --json` prints it: one object, or an array when there are several scenarios.</summary>
    public static void Write(CommandContext context, OutageScreeningResult result)
    {
        var json = result.Scenarios.Select(From).ToList();
        if (json.Count == 1) CliJson.Write(context, json[0]);
        else CliJson.Write(context, json);
    }

    /// <summary>Says on <paramref name="err"/> which intact cases did not converge; the exit code that follows.</summary>
    public static int ReportIntactFailures(OutageScreeningResult result, string path, TextWriter err)
    {
        var failed = result.Scenarios.Where(s => !s.IntactConverged).ToList();
        foreach (ScenarioScreening s in failed)
            err.WriteLine($"error: {path}: the intact case ({s.Scenario ?? "loads as entered"}) did not converge: {s.IntactMessage}");
        return failed.Count > 0 ? ExitCode.NoConvergence : ExitCode.Done;
    }

    /// <summary>Only when the intact case itself did not converge (nothing to judge the outages against).</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)]
    public string? IntactMessage { get; init; }

    public static OutagesJson From(ScenarioScreening s) => new(s.Scenario, s.Outages.Select(o =>
        new OutageJson(o.Element, Labels.Kind(o.Kind), o.Converged, o.IslandedBuses, o.LostLoadMw,
            o.NewViolations.Select(v => new OutageViolationJson(v.Element, Labels.Kind(v.Kind), SolveJson.ViolationName(v.Type), v.Value, v.Limit, v.IntactValue)).ToList(),
            o.WorstVPu, o.WorstLoadingPercent, o.Severity)
        {
            WorstVBus = o.WorstVBus, WorstLoadingElement = o.WorstLoadingElement, Message = o.Message,
            ParallelLoadings = o.ParallelLoadings.Select(p => new ParallelLoadingJson(p.Element, p.LoadingPercent)).ToList(),
            LostGenerationMw = o.LostGenerationMw,
        }).ToList())
    {
        IntactMessage = s.IntactConverged ? null : s.IntactMessage ?? "the intact case did not converge",
    };
}
