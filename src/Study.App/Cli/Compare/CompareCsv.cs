// `--csv DIR` for a comparison: buses.csv, branches.csv, violations.csv (appeared or cleared) and totals.csv.
using Study.App.Cli.Reports;
using Study.App.Cli.Solve;
using Study.Core.Io;
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Cli.Compare;

public static class CompareCsv
{
    public static void Write(CaseComparisonResult r, string dir)
    {
        Directory.CreateDirectory(dir);
        var buses = new CsvTable("id", "kv", "membership", "beforePu", "afterPu", "deltaPu");
        foreach (BusChange b in r.Buses) buses.Row(b.Id, b.Kv, Name(b.Membership), b.BeforePu, b.AfterPu, b.DeltaPu);
        buses.Write(Path.Combine(dir, "buses.csv"));
        var branches = new CsvTable("id", "kind", "membership", "beforeMw", "afterMw", "deltaMw", "beforeLoadingPercent", "afterLoadingPercent");
        foreach (BranchChange b in r.Branches)
            branches.Row(b.Id, b.Kind, Name(b.Membership), b.BeforeMw, b.AfterMw, b.DeltaMw, b.BeforeLoadingPercent, b.AfterLoadingPercent);
        branches.Write(Path.Combine(dir, "branches.csv"));
        var violations = new CsvTable("change", "element", "kind", "type", "value", "limit");
        foreach (Violation v in r.ViolationsAppeared) violations.Row("appeared", v.Element, v.Kind, SolveJson.ViolationName(v.Type), v.Value, v.Limit);
        foreach (Violation v in r.ViolationsCleared) violations.Row("cleared", v.Element, v.Kind, SolveJson.ViolationName(v.Type), v.Value, v.Limit);
        violations.Write(Path.Combine(dir, "violations.csv"));
        var totals = new CsvTable("quantity", "before", "after");
        totals.Row("lossMw", r.LossBeforeMw, r.LossAfterMw);
        totals.Row("loadMw", r.LoadBeforeMw, r.LoadAfterMw);
        totals.Write(Path.Combine(dir, "totals.csv"));
    }

    private static string Name(CaseMembership m) => m switch
    {
        CaseMembership.Added => "added",
        CaseMembership.Removed => "removed",
        _ => "both",
    };
}
