// The report of `study compare`: losses, the largest voltage change, then every bus and branch side by side.
using static Study.App.Cli.Format;
using Study.App.Cli.Reports;
using Study.App.Cli.Solve;
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Cli.Compare;

/// <summary>One side of a comparison as the reader should see it: "networks/a.study.json, scenario winter-peak".</summary>
public sealed record CompareSide(string Path, string NetworkName, string? Scenario)
{
    public string Label => $"{Path}, {(Scenario is null ? "loads as entered" : $"scenario {Scenario}")}";
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
        lines.Add($"losses {F(r.LossBeforeMw, 3)} MW → {F(r.LossAfterMw, 3)} MW ({Signed(r.LossAfterMw - r.LossBeforeMw, 3)} MW); "
                + $"load {F(r.LoadBeforeMw, 2)} MW → {F(r.LoadAfterMw, 2)} MW");
        lines.Add(Summary(r));
        doc.Text(lines.ToArray());

        var buses = new ReportTable().Left("bus").Column("kV").Column("before pu").Column("after pu").Column("change pu").Left("note");
        foreach (BusChange b in r.Buses)
            buses.Row(b.Id, b.Kv > 0 ? F(b.Kv, 1) : "-", F(b.BeforePu, 4), F(b.AfterPu, 4), b.DeltaPu is double d ? Signed(d, 4) : "",
                Note(b.Membership, b.BeforePu, b.AfterPu));
        doc.Heading($"Buses ({r.Buses.Count})").Add(buses);

        var branches = new ReportTable().Left("branch").Left("kind").Column("before MW").Column("after MW").Column("change MW")
            .Column("before loading %").Column("after loading %").Left("note");
        foreach (BranchChange b in r.Branches)
            branches.Row(b.Id, b.Kind, F(b.BeforeMw, 2), F(b.AfterMw, 2), b.DeltaMw is double d ? Signed(d, 2) : "",
                F(b.BeforeLoadingPercent, 1), F(b.AfterLoadingPercent, 1), Note(b.Membership, 0, 0));
        doc.Heading($"Branches ({r.Branches.Count})   P at the from end").Add(branches);

        var moved = r.Taps.Where(t => t.BeforePosition != t.AfterPosition).ToList();
        if (moved.Count > 0)
        {
            var taps = new ReportTable().Left("transformer").Column("before position").Column("after position");
            foreach (TapChange t in moved) taps.Row(t.Id, t.BeforePosition is int b ? I(b) : "-", t.AfterPosition is int a ? I(a) : "-");
            doc.Heading($"Taps that moved ({moved.Count})   a regulating bank that moves shifts every voltage it feeds").Add(taps);
        }

        doc.Heading($"Violations that appear ({r.ViolationsAppeared.Count})")
            .List(r.ViolationsAppeared.Count == 0 ? ["none"] : r.ViolationsAppeared.Select(LoadFlowReport.Describe));
        doc.Heading($"Violations that clear ({r.ViolationsCleared.Count})")
            .List(r.ViolationsCleared.Count == 0 ? ["none"] : r.ViolationsCleared.Select(LoadFlowReport.Describe));
        return doc;
    }

    private static string Summary(CaseComparisonResult r)
    {
        var shared = r.Buses.Where(b => b.DeltaPu is not null).ToList();
        int added = r.Buses.Count(b => b.Membership == CaseMembership.Added);
        int removed = r.Buses.Count(b => b.Membership == CaseMembership.Removed);
        string largest = shared.Count == 0 ? "no bus is live in both cases"
            : shared.MaxBy(b => Math.Abs(b.DeltaPu!.Value)) is { } m ? $"largest voltage change {Signed(m.DeltaPu!.Value, 4)} pu at {m.Id}" : "";
        return $"{largest}; {I(shared.Count)} buses in both, {I(added)} added, {I(removed)} removed";
    }

    private static string Note(CaseMembership membership, double? before, double? after) => membership switch
    {
        CaseMembership.Added => "added",
        CaseMembership.Removed => "removed",
        _ when before is null && after is null => "dead in both",
        _ when before is null => "dead before",
        _ when after is null => "dead after",
        _ => "",
    };

    private static string Describe(CompareSide s) =>
        (string.IsNullOrWhiteSpace(s.NetworkName) ? s.Path : $"{s.NetworkName} [{s.Path}]")
        + $" ({(s.Scenario is null ? "loads as entered" : $"scenario {s.Scenario}")})";

    /// <summary>"+0.0043", "-0.0120"; a change that rounds to nothing reads "+0.00", never "-0.00".</summary>
    private static string Signed(double value, int decimals)
    {
        double shown = Math.Round(value, decimals);
        if (shown == 0) shown = 0;
        return (shown >= 0 ? "+" : "") + F(shown, decimals);
    }
}
