// Tap-study results as text: the finding, the recommended positions, and positions × scenarios.
using System.Globalization;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Shell;
using Study.Core.Studies;

namespace Study.App.Tui.Taps;

/// <summary>Formats a <see cref="TapStudyResult"/> for the Tap study tab; nothing here is computed, only laid out.</summary>
public static class TapStudyTables
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string ScenarioName(string? scenario) => scenario ?? "as entered";

    /// <summary>The finding sentence, then the recommended positions with their worst-case margins.</summary>
    public static string Summary(TapStudyResult r)
    {
        var lines = new List<string>();
        if (r.Recommended.Count > 0)
            lines.Add($"{r.Transformer} recommended: " + string.Join(", ",
                r.Recommended.Take(5).Select(p => $"{Pos(p.Position)} (margin {p.MarginPu.ToString("0.0000", Inv)} pu)"))
                + $" · file {Pos(r.FilePosition)} · Alt+P sets {Pos(r.Recommended[0].Position)}");
        else if (r.Closest is { } c)
            lines.Add($"{r.Transformer}: none fits; closest {Pos(c.Position)}, outside by {(-c.MarginPu).ToString("0.0000", Inv)} pu · file {Pos(r.FilePosition)}");
        lines.Add($"Finding: {r.Finding}.");
        return string.Join("\n", lines);
    }

    public static string[] Headers(TapStudyResult r)
    {
        var headers = new List<string> { "Pos", "Ratio", "Fits", "Margin pu" };
        foreach (string? s in r.Scenarios)
            foreach (string bus in r.WatchBuses)
                headers.Add(r.Scenarios.Count == 1 ? bus : $"{bus} {ScenarioName(s)}");
        return [.. headers];
    }

    /// <summary>One row per position: whether it fits, the worst margin, then watched voltages per scenario with ▼/▲ (* marks the file position).</summary>
    public static TextTableSource Positions(TapStudyResult r)
    {
        var rows = new List<string[]>();
        var best = r.Recommended.Count > 0 ? r.Recommended[0].Position : (int?)null;
        foreach (IGrouping<int, TapStudyPoint> group in r.Points.GroupBy(p => p.Position).OrderBy(g => g.Key))
        {
            double margin = group.Min(p => p.MarginPu);
            var cells = new List<string>
            {
                Pos(group.Key) + (group.Key == r.FilePosition ? "*" : ""),
                group.First().Ratio.ToString("0.0000", Inv),
                margin >= 0 ? (group.Key == best ? "best" : "yes") : "no",
                double.IsFinite(margin) ? margin.ToString("+0.0000;-0.0000;0.0000", Inv) : "—",
            };
            foreach (string? s in r.Scenarios)
            {
                TapStudyPoint? p = group.FirstOrDefault(x => x.Scenario == s);
                foreach (string bus in r.WatchBuses)
                {
                    WatchedVoltage? w = p?.Watched.FirstOrDefault(x => x.Bus == bus);
                    cells.Add(p is null || !p.Converged ? "no conv." : w is null ? "—" : w.VPu.ToString("0.0000", Inv) + Mark(w));
                }
            }
            rows.Add([.. cells]);
        }
        return new TextTableSource(Headers(r), rows);
    }

    /// <summary>Signed position as the tap table names it: +2, 0, -3.</summary>
    public static string Pos(int position) => position > 0 ? "+" + position.ToString(Inv) : position.ToString(Inv);

    public static string Mark(WatchedVoltage w) =>
        w.VPu < w.LowPu ? ResultTables.LowMark : w.VPu > w.HighPu ? ResultTables.HighMark : " ";
}
