// Load-flow results as text tables: buses with low/high markers, branches with flows and loading.
using System.Globalization;
using Study.App.Tui.Shell;
using Study.Core.LoadFlow;

namespace Study.App.Tui.LoadFlow;

/// <summary>Formats a <see cref="LoadFlowResult"/> for the Buses and Branches result tabs.</summary>
public static class ResultTables
{
    public const string LowMark = "▼";
    public const string HighMark = "▲";

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string[] BusHeaders { get; } =
        ["Bus", "Base kV", "V pu", "V kV", "Angle °", "Band pu", "P gen MW", "Q gen Mvar", "P load MW", "Q load Mvar"];

    public static string[] BranchHeaders { get; } =
        ["Branch", "Kind", "From", "To", "P from MW", "Q from Mvar", "P to MW", "Q to Mvar", "I from A", "Loading %", "Loss MW", "Loss Mvar"];

    /// <summary>The marker that makes a violation readable without colour.</summary>
    public static string Mark(ViolationKind v) => v switch
    {
        ViolationKind.Low => LowMark,
        ViolationKind.High or ViolationKind.Overload => HighMark,
        _ => " ",
    };

    public static TextTableSource Buses(LoadFlowResult r) => new(BusHeaders, r.Buses.Select(b => new[]
    {
        b.Id,
        b.Kv > 0 ? F(b.Kv, "0.###") : "—",
        F(b.VPu, "0.0000") + Mark(b.Violation),
        b.VKv is double kv ? F(kv, "0.000") : "—",
        F(b.AngleDeg, "0.00"),
        $"{F(b.VMin, "0.00")}–{F(b.VMax, "0.00")}",
        F(b.PGenMw, "0.000"),
        F(b.QGenMvar, "0.000"),
        F(b.PLoadMw, "0.000"),
        F(b.QLoadMvar, "0.000"),
    }).ToList());

    public static TextTableSource Branches(LoadFlowResult r) => new(BranchHeaders, r.Branches.Select(b => new[]
    {
        b.Id,
        b.Kind,
        b.From,
        b.To,
        F(b.PFromMw, "0.000"),
        F(b.QFromMvar, "0.000"),
        F(b.PToMw, "0.000"),
        F(b.QToMvar, "0.000"),
        b.IFromA is double a ? F(a, "0.0") : "—",
        b.LoadingPercent is double pct ? F(pct, "0.0") + (pct > 100 ? HighMark : " ") : "—",
        F(b.LossMw, "0.0000"),
        F(b.LossMvar, "0.0000"),
    }).ToList());

    private static string F(double v, string format) => v.ToString(format, Inv);
}
