// The columns of the tap-study result records: every position in every scenario, and the recommended positions.
using Study.Core.Studies;

namespace Study.App.Reports;

/// <summary>A recommended position with its rank, best first.</summary>
public sealed record RankedTap(int Rank, TapRecommendation Tap);

/// <summary>One position across the scenarios of a study (the TUI's table): the points in the study's scenario order.</summary>
public sealed record TapPositionRow(int Position, double Ratio, double MarginPu, bool IsFilePosition, bool IsBest,
    IReadOnlyList<TapStudyPoint?> Points);

public static class TapStudyColumns
{
    public static ColumnSpec<RankedTap> Recommended { get; } = new ColumnSpec<RankedTap>()
        .Integer("rank", "rank", null, t => t.Rank)
        .Integer("position", "position", null, t => t.Tap.Position)
        .Number("marginPu", "worst margin", "pu", t => t.Tap.MarginPu, 4);

    public static IEnumerable<RankedTap> Ranked(TapStudyResult r) => r.Recommended.Select((t, i) => new RankedTap(i + 1, t));

    /// <summary>Every position in every scenario, a column per watched bus (▼ below the band, ▲ above); a point that did not converge has no values.</summary>
    public static ColumnSpec<TapStudyPoint> Points(TapStudyResult r)
    {
        var spec = new ColumnSpec<TapStudyPoint>()
            .Integer("position", "position", null, p => p.Position)
            .Number("ratio", "ratio", null, p => p.Ratio, 4)
            .Text("scenario", "scenario", p => p.Scenario)
            .CsvOnly("converged", p => p.Converged)
            .CsvOnly("solvedFromFlatStart", p => p.SolvedFromFlatStart)
            .CsvOnly("lowVoltage", p => p.LowVoltage);
        foreach (string bus in r.WatchBuses)
            spec.Number($"{bus}.vPu", bus, "pu", p => Watched(p, bus)?.VPu, 4,
                reads: p => p.Converged && Watched(p, bus) is { } w ? Numbers.Fixed(w.VPu, 4) + Marks.Band(w.VPu, w.LowPu, w.HighPu) : Numbers.Blank);
        return spec
            .Number("vMinPu", "system min", "pu", p => Solved(p, p.VMinPu), 4, reads: p => p.Converged ? Numbers.Fixed(p.VMinPu, 4) : "no convergence")
            .Text("vMinBus", "at", p => p.Converged ? p.VMinBus : null)
            .Number("vMaxPu", "system max", "pu", p => Solved(p, p.VMaxPu), 4)
            .Text("vMaxBus", "at", p => p.Converged ? p.VMaxBus : null)
            .Number("lossMw", "loss", "MW", p => Solved(p, p.LossMw), 3)
            .Integer("violations", "violations", null, p => p.Converged ? p.Violations : null)
            .Number("marginPu", "margin", "pu", p => Solved(p, p.MarginPu), 4);
    }

    /// <summary>
    /// The Tap study tab: one row per position (* marks the file position) with whether it fits in
    /// every scenario and its worst margin, then the watched voltages of each scenario.
    /// </summary>
    public static ColumnSpec<TapPositionRow> ScreenPositions(TapStudyResult r)
    {
        var spec = new ColumnSpec<TapPositionRow>()
            .Words("position", "Pos", p => p.Position, p => Labels.Position(p.Position) + (p.IsFilePosition ? "*" : ""))
            .Number("ratio", "Ratio", null, p => p.Ratio, 4)
            .Words("fits", "Fits", p => p.MarginPu >= 0, p => p.MarginPu >= 0 ? (p.IsBest ? "best" : "yes") : "no")
            .Number("marginPu", "Margin", "pu", p => Finite(p.MarginPu), 4, reads: p => Numbers.Signed(Finite(p.MarginPu), 4));
        for (int s = 0; s < r.Scenarios.Count; s++)
        {
            int scenario = s;
            foreach (string bus in r.WatchBuses)
                spec.Number(r.Scenarios.Count == 1 ? $"{bus}.vPu" : $"{bus}.{Labels.Scenario(r.Scenarios[s])}.vPu",
                    r.Scenarios.Count == 1 ? bus : $"{bus} {Labels.Scenario(r.Scenarios[s])}", null,
                    p => p.Points[scenario] is { Converged: true } point ? Watched(point, bus)?.VPu : null, 4,
                    reads: p => p.Points[scenario] is not { Converged: true } point ? "no conv."
                        : Watched(point, bus) is { } w ? Numbers.Fixed(w.VPu, 4) + Marks.Band(w.VPu, w.LowPu, w.HighPu) : Numbers.Blank);
        }
        return spec;
    }

    /// <summary>The points grouped by position, in position order, each position's worst margin over the scenarios.</summary>
    public static IReadOnlyList<TapPositionRow> ByPosition(TapStudyResult r)
    {
        int? best = r.Recommended.Count > 0 ? r.Recommended[0].Position : null;
        return r.Points.GroupBy(p => p.Position).OrderBy(g => g.Key)
            .Select(g => new TapPositionRow(g.Key, g.First().Ratio, g.Min(p => p.MarginPu), g.Key == r.FilePosition, g.Key == best,
                r.Scenarios.Select(s => g.FirstOrDefault(p => p.Scenario == s)).ToList()))
            .ToList();
    }

    private static WatchedVoltage? Watched(TapStudyPoint p, string bus) => p.Watched.FirstOrDefault(w => w.Bus == bus);

    private static double? Solved(TapStudyPoint p, double value) => p.Converged ? value : null;

    /// <summary>A point that did not converge has margin -∞: no margin to show, not an unbounded one.</summary>
    private static double? Finite(double value) => double.IsFinite(value) ? value : null;
}
