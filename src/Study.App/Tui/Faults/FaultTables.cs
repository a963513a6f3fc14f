// Fault results for the Faults tab: a heading, then levels and breaker duty through their column specs (FaultColumns).
using Study.App.Reports;
using Study.Core.Faults;
using Study.Core.Model;

namespace Study.App.Tui.Faults;

/// <summary>Duty reads without colour: "▲ OVER", "△ near"; one breaker row per check.</summary>
public static class FaultTables
{
    public static string[] LevelHeaders => FaultColumns.ScreenFaults(false).Headings;

    /// <summary>The levels' columns for a result: without Z0 when the zero sequence was not built (it would read "open").</summary>
    private static ColumnSpec<Study.Core.Faults.ShortCircuitLevel> LevelColumns(FaultResult r)
    {
        var spec = FaultColumns.ScreenFaults(r.PerUnitOnly);
        if (r.LeftOut.Count == 0) return spec;
        string[] keep = spec.Columns.Where(c => c.IsReadable && c.Header != "Z0").Select(c => c.Key ?? c.Header!).ToArray();
        return spec.Select(keep);
    }

    public static string[] BreakerHeaders => FaultColumns.Checks.Headings;

    /// <summary>The line above the tables: method, level, buses studied and how many breakers are over or near.</summary>
    public static string Summary(FaultResult r)
    {
        string method = r.Method == FaultMethod.Iec60909 ? "IEC 60909" : "from load flow";
        string level = r.Level == Study.Core.Units.FaultLevel.Max ? "max" : "min";
        int buses = r.Faults.Select(f => f.Bus).Distinct().Count();
        int over = r.Breakers.Count(b => b.Status == DutyStatus.Over), near = r.Breakers.Count(b => b.Status == DutyStatus.Warning);
        return $"{method} {level} · {buses} bus(es) · breakers: {over} over {Marks.Over}, {near} near {Marks.Near}"
            + (r.PerUnitOnly ? " · kV not stated: per unit only" : "");
    }

    /// <summary>How the time-dependent currents were taken, then every note and missing datum in full (<see cref="FaultNotes"/>).</summary>
    public static string Notes(FaultResult r, Network? network = null)
    {
        string how = $"I_b, i_DC, I_b,asym at t_min {Numbers.UpTo(r.TMinS, 3)} s (each breaker at its own opening time) · I_k with the motors left out (far from generators) · I_th for T_k {Numbers.UpTo(r.TkS, 3)} s";
        IReadOnlyList<string> notes = FaultNotes.Lines(r, network ?? new Network());
        return notes.Count == 0 ? how : how + "\n" + string.Join("\n", notes);
    }

    /// <summary>One row per fault; the bus is named on the first row of its group only, so the groups read as one table per bus.</summary>
    public static TextTableSource Levels(FaultResult r) => TextTableSource.Of(LevelColumns(r), r.Faults);

    /// <summary>Every check of every breaker as its own row (breaking, asymmetric breaking, making, short-time), with its status and worst side.</summary>
    public static TextTableSource Breakers(FaultResult r) => TextTableSource.Of(FaultColumns.Checks, FaultColumns.CheckRows(r.Breakers));

    /// <summary>The check behind each breaker row, in the same order, for row colours.</summary>
    public static IReadOnlyList<DutyCheck> Checks(FaultResult r) => FaultColumns.CheckRows(r.Breakers).Select(x => x.Check).ToList();
}
