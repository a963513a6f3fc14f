// Tap-study results for the Tap study tab: the finding, the recommended positions, and positions × scenarios (TapStudyColumns).
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Tui.Taps;

/// <summary>Nothing here is computed, only laid out.</summary>
public static class TapStudyTables
{
    /// <summary>The finding sentence, then the recommended positions with their worst-case margins.</summary>
    public static string Summary(TapStudyResult r)
    {
        var lines = new List<string>();
        if (r.Recommended.Count > 0)
            lines.Add($"{r.Transformer} recommended: " + string.Join(", ",
                r.Recommended.Take(5).Select(p => $"{Labels.Position(p.Position)} (margin {Numbers.Fixed(p.MarginPu, 4)} pu)"))
                + $" · file {Labels.Position(r.FilePosition)} · Alt+P sets {Labels.Position(r.Recommended[0].Position)}");
        else if (r.Closest is { } c)
            lines.Add($"{r.Transformer}: none fits; closest {Labels.Position(c.Position)}, outside by {Numbers.Fixed(-c.MarginPu, 4)} pu · file {Labels.Position(r.FilePosition)}");
        lines.Add($"Finding: {r.Finding}.");
        return string.Join("\n", lines);
    }

    /// <summary>One row per position: whether it fits, the worst margin, then watched voltages per scenario with ▼/▲ (* marks the file position).</summary>
    public static TextTableSource Positions(TapStudyResult r) => TextTableSource.Of(TapStudyColumns.ScreenPositions(r), TapStudyColumns.ByPosition(r));
}
