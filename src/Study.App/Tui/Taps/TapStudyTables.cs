// Tap-study results for the Taps tab: the finding, the recommended positions, and positions × scenarios (TapStudyColumns).
using Study.App.Reports;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Tui.Taps;

/// <summary>How the studied tap changer stands in the network now: what the heading needs beside the result.</summary>
/// <param name="Winding">The tapped winding, for the sign convention.</param>
/// <param name="Position">Its position in the network as edited now (null when the transformer is gone).</param>
/// <param name="HeldOtherTaps">Whether the study held the other on-load taps at their positions.</param>
public sealed record TapSetting(TapWinding Winding, int? Position, bool HeldOtherTaps);

/// <summary>Nothing here is computed, only laid out.</summary>
public static class TapStudyTables
{
    /// <summary>The recommendation, where the tap stands now, the sign convention, then the finding.</summary>
    public static string Summary(TapStudyResult r, TapSetting? setting = null)
    {
        var lines = new List<string>();
        int? now = setting?.Position;
        string stands = now is int p && p != r.FilePosition ? $"now at {Labels.Position(p)} (studied from {Labels.Position(r.FilePosition)})"
            : $"now at {Labels.Position(now ?? r.FilePosition)}";
        if (r.Recommended.Count > 0)
        {
            TapRecommendation best = r.Recommended[0];
            string also = r.Recommended.Count > 1
                ? "; also " + string.Join(", ", r.Recommended.Skip(1).Take(4).Select(x => $"{Labels.Position(x.Position)} ({Numbers.Fixed(x.MarginPu, 4)})"))
                : "";
            // On the recommended position now: set there since the study (Alt+P, or an edit), or on it already when studied.
            int current = now ?? r.FilePosition;
            string action = current != best.Position ? $"Alt+P sets {Labels.Position(best.Position)}"
                : r.FilePosition == best.Position ? "already on the recommended position: nothing to change"
                : "set to the recommended position (Alt+Z undoes)";
            lines.Add($"{r.Transformer} recommended {Labels.Position(best.Position)} (worst margin {Numbers.Fixed(best.MarginPu, 4)} pu){also} · {stands} · {action}");
        }
        else if (r.Closest is { } c)
            lines.Add($"{r.Transformer}: no position keeps every watched bus in band; closest {Labels.Position(c.Position)}, outside by {Numbers.Fixed(-c.MarginPu, 4)} pu · {stands}");
        lines.Add($"Finding: {r.Finding}.");
        if (setting is not null) lines.Add(Convention(setting, r.StepPercent));
        return string.Join("\n", lines);
    }

    /// <summary>
    /// Which way a position moves the voltage. The ratio factor on the tapped winding is 1 + position·step/100
    /// (README, Network files): a + position on the hv winding raises the turns ratio and lowers the lv
    /// voltage (buck); on the lv winding it raises the lv voltage (boost).
    /// </summary>
    public static string Convention(TapSetting setting, double stepPercent)
    {
        string step = $"{Numbers.UpTo(stepPercent, 3)} %";
        string sign = setting.Winding == TapWinding.Hv
            ? $"Sign: + adds hv turns, so each + step ({step}) lowers the lv voltage (buck), each − step raises it (boost)"
            : $"Sign: + adds {setting.Winding.ToString().ToLowerInvariant()} turns, so each + step ({step}) raises its voltage (boost), each − step lowers it (buck)";
        return sign + (setting.HeldOtherTaps ? " · other on-load taps held" : " · other on-load taps regulate");
    }

    /// <summary>One row per position: whether it fits, the worst margin, then watched voltages per scenario with ▼/▲ (* marks the file position).</summary>
    public static TextTableSource Positions(TapStudyResult r) => TextTableSource.Of(TapStudyColumns.ScreenPositions(r), TapStudyColumns.ByPosition(r));

    /// <summary>The row of the best recommended position (rows are positions in order), or null when none fits.</summary>
    public static int? BestRow(TapStudyResult r)
    {
        int row = TapStudyColumns.ByPosition(r).ToList().FindIndex(p => p.IsBest);
        return row >= 0 ? row : null;
    }
}
