// The --json shape of `study start` (README, "Results as JSON").
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Cli.Start;

public sealed record StartBusJson(string Id, double BeforePu, double DuringPu, double DipPercent);

public sealed record StartMotorJson(string Motor, string Bus, string Starter, double TerminalPu, double? CurrentKa, double CurrentPerRated,
    bool CurrentLimited, bool Ok);

/// <summary>motorTerminalPu is the lowest terminal voltage of the started motors; ok when each gets at least minTerminalPu.</summary>
public sealed record StartJson(string Caution, IReadOnlyList<string> Motors, IReadOnlyList<StartBusJson> Buses, double MotorTerminalPu,
    bool Ok, double MinTerminalPu, IReadOnlyList<StartMotorJson> Starts, IReadOnlyList<string> Notes)
{
    public static StartJson From(MotorStartResult r) => new(
        r.Caution,
        r.Motors,
        r.Buses.Select(b => new StartBusJson(b.Id, b.BeforePu, b.DuringPu, b.DipPercent)).ToList(),
        r.MotorTerminalPu,
        r.Ok,
        r.MinTerminalPu,
        r.Started.Select(m => new StartMotorJson(m.Id, m.Bus, StartColumns.StarterName(m.Starter), m.TerminalPu, m.CurrentKa,
            m.CurrentPerRated, m.CurrentLimited, m.Ok)).ToList(),
        r.Notes);
}
