// The columns of the motor-start result records: buses before and during the start, and the started motors.
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Reports;

public static class StartColumns
{
    /// <summary>Every bus: voltage before and during the start, the dip; ★ marks the started motors' buses, • the watched ones.</summary>
    public static ColumnSpec<StartBus> Buses { get; } = new ColumnSpec<StartBus>()
        .Words("id", "bus", b => b.Id, b => b.Id + (b.AtStartedMotor ? " ★" : b.Watched ? " •" : ""))
        .Number("kv", "base", "kV", b => LoadFlowColumns.Stated(b.Kv), 3, reads: b => LoadFlowColumns.BaseKv(b.Kv))
        .Number("beforePu", "before", "pu", b => b.BeforePu, 4)
        .Number("duringPu", "during", "pu", b => b.DuringPu, 4)
        .Number("dipPercent", "dip", "%", b => b.DipPercent, 2)
        .CsvOnly("watched", b => b.Watched).CsvOnly("atStartedMotor", b => b.AtStartedMotor);

    /// <summary>Each started motor: the voltage at its bus against the minimum, and the current it draws.</summary>
    public static ColumnSpec<StartedMotor> Motors(double minPu) => new ColumnSpec<StartedMotor>()
        .Text("motor", "motor", m => m.Id)
        .Text("bus", "bus", m => m.Bus)
        .Words("starter", "starter", m => StarterName(m.Starter), m => StarterName(m.Starter) + (m.CurrentLimited ? " (at its limit)" : ""))
        .Number("terminalPu", "terminal", "pu", m => m.TerminalPu, 4, mark: m => m.Ok ? " " : Marks.Low)
        .Words("ok", "verdict", m => m.Ok, m => m.Ok ? $"ok (≥ {Numbers.Fixed(minPu, 2)})" : $"{Marks.Low} BELOW {Numbers.Fixed(minPu, 2)}")
        .Number("currentKa", "current", "kA", m => m.CurrentKa, 3)
        .Number("currentPerRated", "current", "× rated", m => m.CurrentPerRated, 2);

    public static string StarterName(StarterMethod method) => method switch
    {
        StarterMethod.Direct => "direct",
        StarterMethod.StarDelta => "starDelta",
        StarterMethod.Autotransformer => "autotransformer",
        _ => "softStarter",
    };
}
