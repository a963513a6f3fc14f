// The report of `study compare`: losses, the largest voltage change, then every bus and branch side by side.
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.LoadFlow;
using Study.Core.Studies;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Compare;

/// <summary>One side of a comparison as the reader should see it: "networks/a.study.json, scenario winter-peak".</summary>
public sealed record CompareSide(string Path, string NetworkName, string? Scenario)
{
    public string Label => $"{Path}, {(Scenario is null ? "as entered" : $"scenario {Scenario}")}";
}

public static class CompareReport
{
    public static ReportDocument Build(CompareSide before, CompareSide after, CaseComparisonResult r, LoadFlowOptions options)
    {
        var doc = new ReportDocument($"Compare: {before.Label} → {after.Label}");
        doc.Input("before", Describe(before)).Input("after", Describe(after)).Input("options", LoadFlowReport.Options(options));
        var lines = new List<string> { $"before: {Describe(before)}", $"after:  {Describe(after)}" };
        if (!r.BeforeConverged || !r.AfterConverged)
        {
            if (!r.BeforeConverged) lines.Add($"the before case does not converge: {r.BeforeMessage}");
            if (!r.AfterConverged) lines.Add($"the after case does not converge: {r.AfterMessage}");
            return doc.Text(lines.ToArray());
        }
        lines.Add($"losses {Fixed(r.LossBeforeMw, 3)} MW → {Fixed(r.LossAfterMw, 3)} MW ({Signed(r.LossAfterMw - r.LossBeforeMw, 3)} MW); "
                + $"load {Fixed(r.LoadBeforeMw, 2)} MW → {Fixed(r.LoadAfterMw, 2)} MW");
        lines.Add(Summary(r));
        doc.Text(lines.ToArray());

        doc.Heading($"Buses ({r.Buses.Count})").Table(CompareColumns.Buses, r.Buses);
        doc.Heading($"Branches ({r.Branches.Count})   P at the from end").Table(CompareColumns.Branches, r.Branches);
        var moved = r.Taps.Where(t => t.BeforePosition != t.AfterPosition).ToList();
        if (moved.Count > 0)
            doc.Heading($"Taps that moved ({moved.Count})   a regulating bank that moves shifts every voltage it feeds").Table(CompareColumns.Taps, moved);

        doc.Heading($"Violations that appear ({r.ViolationsAppeared.Count})")
            .List(r.ViolationsAppeared.Count == 0 ? ["none"] : r.ViolationsAppeared.Select(LoadFlowReport.Describe));
        doc.Heading($"Violations that clear ({r.ViolationsCleared.Count})")
            .List(r.ViolationsCleared.Count == 0 ? ["none"] : r.ViolationsCleared.Select(LoadFlowReport.Describe));
        return doc;
    }

    /// <summary>The largest voltage change and how many buses the two cases share, add and remove (also the TUI's Compare tab).</summary>
    public static string Summary(CaseComparisonResult r)
    {
        var shared = r.Buses.Where(b => b.DeltaPu is not null).ToList();
        int added = r.Buses.Count(b => b.Membership == CaseMembership.Added);
        int removed = r.Buses.Count(b => b.Membership == CaseMembership.Removed);
        string largest = shared.Count == 0 ? "no bus is live in both cases"
            : shared.MaxBy(b => Math.Abs(b.DeltaPu!.Value)) is { } m ? $"largest voltage change {Signed(m.DeltaPu!.Value, 4)} pu at {m.Id}" : "";
        return $"{largest}; {Integer(shared.Count)} buses in both, {Integer(added)} added, {Integer(removed)} removed";
    }

    private static string Describe(CompareSide s) =>
        (string.IsNullOrWhiteSpace(s.NetworkName) ? s.Path : $"{s.NetworkName} [{s.Path}]")
        + $" ({(s.Scenario is null ? "as entered" : $"scenario {s.Scenario}")})";
}
