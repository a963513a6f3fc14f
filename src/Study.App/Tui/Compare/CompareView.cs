// The Compare tab: what was compared with what, the totals and violations that change, then buses and branches side by side.
using Study.App.Cli.Compare;
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Studies;
using Terminal.Gui.ViewBase;
using static Study.App.Reports.Numbers;

namespace Study.App.Tui.Compare;

/// <summary>
/// The heading names both cases and gives losses, load, the largest voltage change and the violations
/// that appear or clear; the bus and branch tables (<see cref="CompareColumns"/>) share the rest, the
/// focused one taking two thirds.
/// </summary>
public sealed class CompareView : View
{
    private const string NotYet = "No comparison yet: Alt+C compares two scenarios, or the network before a change with this one.";
    private readonly TextPane heading = new() { CanFocus = false, Content = NotYet };
    private readonly ResultTable buses = new(CompareColumns.Buses.Headings);
    private readonly ResultTable branches = new(CompareColumns.Branches.Headings);

    public CompareView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        heading.Height = Dim.Func(_ => Math.Min(Math.Max(2, Viewport.Height / 3), TextPane.Wrap(heading.Content, Math.Max(1, Viewport.Width)).Count));
        buses.Y = Pos.Bottom(heading);
        Add(heading, buses, branches);
        FocusSplit.Stack(this, buses, branches, () => Viewport.Height - heading.Frame.Height);
    }

    public CaseComparisonResult? Result { get; private set; }

    /// <summary>Shows a comparison; the labels say what each side was ("harbour-estate-before.study.json, as entered").</summary>
    public void Show(CaseComparisonResult? r, string beforeLabel = "", string afterLabel = "")
    {
        Result = r;
        heading.Content = r is null ? NotYet : Heading(r, beforeLabel, afterLabel);
        buses.Source = r is null ? TextTableSource.Empty(CompareColumns.Buses.Headings) : TextTableSource.Of(CompareColumns.Buses, r.Buses);
        branches.Source = r is null ? TextTableSource.Empty(CompareColumns.Branches.Headings) : TextTableSource.Of(CompareColumns.Branches, r.Branches);
        SetNeedsLayout();
    }

    public static string Heading(CaseComparisonResult r, string beforeLabel, string afterLabel)
    {
        var lines = new List<string> { $"before: {beforeLabel} → after: {afterLabel}" };
        if (!r.BeforeConverged) lines.Add($"the before case does not converge: {r.BeforeMessage}");
        if (!r.AfterConverged) lines.Add($"the after case does not converge: {r.AfterMessage}");
        if (!r.BeforeConverged || !r.AfterConverged) return string.Join("\n", lines);
        lines.Add($"losses {Fixed(r.LossBeforeMw, 3)} → {Fixed(r.LossAfterMw, 3)} MW ({Signed(r.LossAfterMw - r.LossBeforeMw, 3)}) · "
            + $"load {Fixed(r.LoadBeforeMw, 2)} → {Fixed(r.LoadAfterMw, 2)} MW · {CompareReport.Summary(r)}");
        var moved = r.Taps.Where(t => t.BeforePosition != t.AfterPosition).ToList();
        if (moved.Count > 0)
            lines.Add("taps that moved: " + string.Join(", ", moved.Select(t => $"{t.Id} {Integer(t.BeforePosition)} → {Integer(t.AfterPosition)}")));
        lines.Add($"violations that appear ({r.ViolationsAppeared.Count}): {Violations(r.ViolationsAppeared)} · "
            + $"that clear ({r.ViolationsCleared.Count}): {Violations(r.ViolationsCleared)}");
        return string.Join("\n", lines);
    }

    private static string Violations(IReadOnlyList<Study.Core.LoadFlow.Violation> list) =>
        list.Count == 0 ? "none" : string.Join("; ", list.Take(6).Select(Study.App.Cli.Solve.LoadFlowReport.Describe)) + (list.Count > 6 ? $"; … {list.Count - 6} more" : "");
}
