// `--csv DIR` for the tap study: every position in every scenario, and the recommended positions.
using Study.App.Cli.Reports;
using Study.Core.Io;
using Study.Core.Studies;

namespace Study.App.Cli.Taps;

public static class TapStudyCsv
{
    public static void Write(TapStudyResult r, string dir)
    {
        Directory.CreateDirectory(dir);
        string[] header = ["position", "ratio", "scenario", "converged", .. r.WatchBuses.Select(b => $"{b}.vPu"),
            "vMinPu", "vMinBus", "vMaxPu", "vMaxBus", "lossMw", "violations", "marginPu"];
        var positions = new CsvTable(header);
        foreach (TapStudyPoint p in r.Points)
        {
            var cells = new List<object?> { p.Position, p.Ratio, p.Scenario, p.Converged };
            cells.AddRange(r.WatchBuses.Select(bus => p.Watched.FirstOrDefault(w => w.Bus == bus)?.VPu as object));
            cells.AddRange(p.Converged
                ? [p.VMinPu, p.VMinBus, p.VMaxPu, p.VMaxBus, p.LossMw, p.Violations, p.MarginPu]
                : [null, null, null, null, null, null, null]);
            positions.Row(cells.ToArray());
        }
        positions.Write(Path.Combine(dir, "positions.csv"));
        var recommended = new CsvTable("rank", "position", "marginPu");
        for (int i = 0; i < r.Recommended.Count; i++) recommended.Row(i + 1, r.Recommended[i].Position, r.Recommended[i].MarginPu);
        recommended.Write(Path.Combine(dir, "recommended.csv"));
    }
}
