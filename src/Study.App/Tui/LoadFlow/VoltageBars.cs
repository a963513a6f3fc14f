// The bus-voltage bar chart as text: one bar per bus on a pu scale, with the band limits marked.
using Study.App.Reports;
using System.Globalization;
using System.Text;
using Study.Core.LoadFlow;

namespace Study.App.Tui.LoadFlow;

/// <summary>One line of the chart and the violation that decides its colour.</summary>
public sealed record VoltageBarLine(string Text, ViolationKind Violation);

/// <summary>
/// Lays out horizontal voltage bars. The scale spans at least 0.90–1.10 pu, widened to the extremes,
/// so a bar's length reads against the band marks (┆ at each bus's vMin and vMax).
/// </summary>
public static class VoltageBars
{
    private const int LabelWidth = 9;
    private const int ValueWidth = 8;
    private const double DeadBelowPu = 0.5;

    public static IReadOnlyList<VoltageBarLine> Layout(LoadFlowResult result, int width)
    {
        if (result.Buses.Count == 0) return [new VoltageBarLine("No solved buses: run a load flow (F5).", ViolationKind.None)];
        // A dead (unsupplied) bus solves to 0 pu; it is listed but does not stretch the scale.
        var live = result.Buses.Where(b => b.VPu > DeadBelowPu).ToList();
        double lo = Math.Min(0.90, live.Count == 0 ? 0.90 : live.Min(b => Math.Min(b.VPu, b.VMin)) - 0.01);
        double hi = Math.Max(1.10, live.Count == 0 ? 1.10 : live.Max(b => Math.Max(b.VPu, b.VMax)) + 0.01);
        int barWidth = Math.Max(10, width - LabelWidth - ValueWidth - 1);
        int Col(double v) => Math.Clamp((int)Math.Round((v - lo) / (hi - lo) * (barWidth - 1)), 0, barWidth - 1);

        var lines = new List<VoltageBarLine>();
        foreach (BusResult b in result.Buses)
        {
            var bar = new StringBuilder(new string(' ', barWidth));
            int end = b.VPu > DeadBelowPu ? Col(b.VPu) : -1;
            for (int i = 0; i <= end; i++) bar[i] = '█';
            foreach (int mark in new[] { Col(b.VMin), Col(b.VMax) })
                bar[mark] = mark <= end ? '╋' : '┆';
            string label = Fit(b.Id, LabelWidth - 1).PadRight(LabelWidth);
            string value = (b.VPu.ToString("0.0000", CultureInfo.InvariantCulture) + Marks.Padded(b.Violation)).PadRight(ValueWidth);
            lines.Add(new VoltageBarLine(label + value + bar, b.Violation));
        }
        lines.Add(new VoltageBarLine(Axis(lo, hi, barWidth, Col), ViolationKind.None));
        return lines;
    }

    private static string Axis(double lo, double hi, int barWidth, Func<double, int> col)
    {
        var axis = new StringBuilder(new string(' ', LabelWidth + ValueWidth + barWidth));
        string pu = "pu";
        axis.Insert(0, pu).Length = LabelWidth + ValueWidth + barWidth;
        int free = LabelWidth + ValueWidth;
        for (double tick = Math.Ceiling(lo * 20) / 20; tick <= hi + 1e-9; tick += 0.05)
        {
            string text = tick.ToString("0.00", CultureInfo.InvariantCulture);
            int at = LabelWidth + ValueWidth + col(tick) - text.Length / 2;
            if (at < free || at + text.Length > axis.Length) continue;
            for (int i = 0; i < text.Length; i++) axis[at + i] = text[i];
            free = at + text.Length + 1;
        }
        return axis.ToString();
    }

    private static string Fit(string s, int width) => s.Length <= width ? s : s[..(width - 1)] + "…";
}
