// Fault results as text tables: levels per bus and kind, and breaker duty with ▲/△ markers and words.
using System.Globalization;
using Study.App.Tui.Shell;
using Study.Core.Faults;

namespace Study.App.Tui.Faults;

/// <summary>Formats a <see cref="FaultResult"/> for the Faults tab. Duty reads without colour: "▲ OVER", "△ near".</summary>
public static class FaultTables
{
    public const string OverMark = "▲";
    public const string WarningMark = "△";

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string[] LevelHeaders { get; } = ["Bus", "Fault", "I''k kA", "S''k MVA", "X/R", "κ", "i_p kA", "kV", "I''k pu"];

    /// <summary>Duty and status come first so that they show on a narrow screen.</summary>
    public static string[] BreakerHeaders { get; } = ["Breaker", "Duty %", "Status", "Bus", "I''k kA", "i_p kA", "Break kA", "Peak kA"];

    /// <summary>One line on how the faults were calculated, and the engine's notes.</summary>
    public static string Heading(FaultResult r)
    {
        string method = r.Method == FaultMethod.Iec60909 ? "IEC 60909" : "from load flow";
        string level = r.Level == Study.Core.Units.FaultLevel.Max ? "max" : "min";
        int buses = r.Faults.Select(f => f.Bus).Distinct().Count();
        int over = r.Breakers.Count(b => b.Status == DutyStatus.Over), near = r.Breakers.Count(b => b.Status == DutyStatus.Warning);
        string head = $"{method} {level} · {buses} bus(es) · breakers: {over} over {OverMark}, {near} near {WarningMark}"
            + (r.PerUnitOnly ? " · kV not stated: per unit only" : "");
        return r.Notes.Count == 0 ? head : head + "\nNotes: " + string.Join("; ", r.Notes);
    }

    /// <summary>One row per fault; the bus is named on the first row of its group only, so the groups read as one table per bus.</summary>
    public static TextTableSource Levels(FaultResult r) => new(LevelHeaders, r.Faults.Select((f, i) => new[]
    {
        i > 0 && r.Faults[i - 1].Bus == f.Bus ? "" : f.Bus,
        f.Kind.Code(),
        Ka(f.IkKa),
        F(f.SkMva, "0.0"),
        f.XOverR is double xr && double.IsFinite(xr) ? F(xr, "0.00") : "∞",
        F(f.Kappa, "0.000"),
        Ka(f.IpKa),
        f.Kv > 0 ? F(f.Kv, "0.###") : "—",
        F(f.IkPu, "0.000"),
    }).ToList());

    public static TextTableSource Breakers(FaultResult r) => new(BreakerHeaders, r.Breakers.Select(b => new[]
    {
        b.Id,
        b.DutyPercent is double d ? F(d, "0.0") + " " + Mark(b.Status) : "—",
        StatusText(b.Status),
        b.Bus,
        Ka(b.IkKa),
        Ka(b.IpKa),
        Ka(b.InterruptingKa),
        Ka(b.PeakKa),
    }).ToList());

    public static string Mark(DutyStatus s) => s switch
    {
        DutyStatus.Over => OverMark,
        DutyStatus.Warning => WarningMark,
        _ => " ",
    };

    /// <summary>Over-duty is in capitals with the marker so that the row stands out without colour.</summary>
    public static string StatusText(DutyStatus s) => s switch
    {
        DutyStatus.Over => OverMark + " OVER",
        DutyStatus.Warning => WarningMark + " near (>90 %)",
        _ => s.Code(),
    };

    private static string Ka(double? ka) => ka is double v ? F(v, "0.00") : "—";

    private static string F(double v, string format) => v.ToString(format, Inv);
}
