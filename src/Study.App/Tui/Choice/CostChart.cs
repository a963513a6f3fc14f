// Total owning cost against max breaker duty or voltage margin, one point per candidate, as plain numbers.
using Study.App.Reports;
using Study.Core.Cases;

namespace Study.App.Tui.Choice;

/// <summary>What the cost chart's horizontal axis shows.</summary>
public enum CostAxis { Duty, Margin }

/// <summary>One candidate: its glyph (its rank, or × when it fails), x and the cost.</summary>
public sealed record CostPoint(string Id, char Glyph, double X, double Cost, bool Feasible);

/// <summary>
/// The chart's numbers. The chart's vertical axis sits at graph x = 0, so x is drawn from the left edge
/// of the range (<see cref="XOf"/>) and the labels give the value back. Candidates without the figure
/// (no breaker checked, no margin) are left out and named in the legend.
/// </summary>
public sealed record CostChart(CostAxis Axis, double XLow, double XHigh, double CostLow, double CostHigh, IReadOnlyList<CostPoint> Points,
    IReadOnlyList<string> Missing, double? Limit)
{
    public string XUnit => Axis == CostAxis.Duty ? "max duty %" : "margin pu";

    public float XOf(double x) => (float)(x - XLow);

    public double ValueOf(float x) => x + XLow;

    public static CostChart Of(BankChoiceResult r, CostAxis axis)
    {
        var points = new List<CostPoint>();
        var missing = new List<string>();
        for (int i = 0; i < r.Candidates.Count; i++)
        {
            CandidateAssessment c = r.Candidates[i];
            double? x = axis == CostAxis.Duty ? c.MaxDutyPercent : c.MarginPu;
            if (x is not double v)
            {
                missing.Add(c.Id);
                continue;
            }
            char glyph = !c.Feasible ? '×' : i < 9 ? (char)('1' + i) : '+';
            points.Add(new CostPoint(c.Id, glyph, v, c.TotalOwningCost, c.Feasible));
        }
        // The limit a point must keep to: 100 % duty, or no margin at all.
        double limit = axis == CostAxis.Duty ? 100 : 0;
        double lo = points.Count > 0 ? Math.Min(points.Min(p => p.X), limit) : limit, hi = points.Count > 0 ? Math.Max(points.Max(p => p.X), limit) : limit + 1;
        double pad = Math.Max((hi - lo) * 0.08, axis == CostAxis.Duty ? 1 : 0.001);
        double cLo = points.Count > 0 ? points.Min(p => p.Cost) : 0, cHi = points.Count > 0 ? points.Max(p => p.Cost) : 1;
        double cPad = Math.Max((cHi - cLo) * 0.1, Math.Max(1, Math.Abs(cHi) * 0.01));
        return new CostChart(axis, lo - pad, hi + pad, cLo - cPad, cHi + cPad, points, missing, limit);
    }

    /// <summary>"1 CQ-20-10 ★  2 CQ-20-10-LL  × fails: CQ-10-6, CQ-25-8 · ┆ 100 % duty · Alt+X: voltage margin" (the axes say cost and duty).</summary>
    public string Legend(string? recommended)
    {
        var parts = Points.Where(p => p.Feasible).Select(p => $"{p.Glyph} {p.Id}{(p.Id == recommended ? " ★" : "")}").ToList();
        var failing = Points.Where(p => !p.Feasible).Select(p => p.Id).ToList();
        if (failing.Count > 0) parts.Add("× fails: " + string.Join(", ", failing));
        string limit = Axis == CostAxis.Duty ? "┆ 100 % duty" : "┆ no margin";
        string missing = Missing.Count > 0 ? $" · not drawn (no figure): {string.Join(", ", Missing)}" : "";
        return string.Join("  ", parts) + $" · {limit}{missing} · Alt+X: {(Axis == CostAxis.Duty ? "voltage margin" : "max breaker duty")}";
    }

    /// <summary>A round step for an axis spanning <paramref name="span"/> in about <paramref name="ticks"/> ticks.</summary>
    public static double Step(double span, int ticks)
    {
        double raw = Math.Max(span, 1e-12) / Math.Max(1, ticks);
        double power = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        foreach (double m in new[] { 1, 2, 5, 10 })
            if (m * power >= raw) return m * power;
        return 10 * power;
    }

    /// <summary>Money in thousands or millions: "794k", "1.25M".</summary>
    public static string Money(double v) =>
        Math.Abs(v) >= 1e6 ? Numbers.UpTo(v / 1e6, 2) + "M" : Math.Abs(v) >= 1e3 ? Numbers.UpTo(v / 1e3, 0) + "k" : Numbers.UpTo(v, 0);
}
