// Motor-start results for the Start tab: the finding, the started motors and every bus (StartColumns).
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Tui.Start;

/// <summary>Nothing here is computed, only laid out. A motor below its minimum reads "▼ BELOW" without colour.</summary>
public static class StartTables
{
    public const string NotYet = "No motor start yet: Alt+M picks the motors to start.";

    public static string[] MotorHeaders => StartColumns.Motors(0.8).Headings;

    public static string[] BusHeaders => StartColumns.Buses.Headings;

    /// <summary>What was started, in which scenario, the finding, then every note.</summary>
    public static string Heading(MotorStartResult r)
    {
        string verdict = r.Ok
            ? $"every started motor gets at least {Numbers.Fixed(r.MinTerminalPu, 2)} pu (lowest {Numbers.Fixed(r.MotorTerminalPu, 4)} pu)"
            : $"{Marks.Low} a started motor gets {Numbers.Fixed(r.MotorTerminalPu, 4)} pu, below the {Numbers.Fixed(r.MinTerminalPu, 2)} pu it needs";
        StartBus? deepest = r.Buses.OrderByDescending(b => b.DipPercent).FirstOrDefault();
        var lines = new List<string>
        {
            $"Start of {string.Join(", ", r.Motors)} · {Labels.Scenario(r.Scenario)} · {verdict}"
                + (deepest is null ? "" : $" · deepest dip {Numbers.Fixed(deepest.DipPercent, 1)} % at {deepest.Id}"),
            "★ a started motor's bus · • watched · the instant of starting, supplies behind their short-circuit impedance",
        };
        lines.AddRange(r.Notes.Select(n => "Note: " + n));
        return string.Join("\n", lines);
    }

    public static TextTableSource Motors(MotorStartResult r) => TextTableSource.Of(StartColumns.Motors(r.MinTerminalPu), r.Started);

    /// <summary>Watched buses first, then the others, each group deepest dip first.</summary>
    public static IReadOnlyList<StartBus> BusOrder(MotorStartResult r) =>
        r.Buses.OrderByDescending(b => b.Watched || b.AtStartedMotor).ThenByDescending(b => b.DipPercent).ToList();

    public static TextTableSource Buses(MotorStartResult r) => TextTableSource.Of(StartColumns.Buses, BusOrder(r));
}
