// The columns of the comparison result records: buses, branches and taps side by side, violations that change, totals.
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Reports;

/// <summary>A violation that appeared in the after case or cleared from the before case.</summary>
public sealed record ViolationChange(string Change, Violation Violation);

/// <summary>A system total in the two cases.</summary>
public sealed record TotalChange(string Quantity, double Before, double After, int Decimals);

public static class CompareColumns
{
    public static ColumnSpec<BusChange> Buses { get; } = new ColumnSpec<BusChange>()
        .Text("id", "bus", b => b.Id)
        .Number("kv", "", "kV", b => b.Kv, 1, reads: b => LoadFlowColumns.BaseKv(b.Kv))
        .CsvOnly("membership", b => Membership(b.Membership))
        .Number("beforePu", "before", "pu", b => b.BeforePu, 4)
        .Number("afterPu", "after", "pu", b => b.AfterPu, 4)
        .Number("deltaPu", "change", "pu", b => b.DeltaPu, 4, reads: b => Numbers.Signed(b.DeltaPu, 4))
        .Shown("note", b => Note(b.Membership, b.BeforePu, b.AfterPu));

    /// <summary>Branches by their active power at the from end and their loading.</summary>
    public static ColumnSpec<BranchChange> Branches { get; } = new ColumnSpec<BranchChange>()
        .Text("id", "branch", b => b.Id)
        .Text("kind", "kind", b => Labels.Kind(b.Kind))
        .CsvOnly("membership", b => Membership(b.Membership))
        .Number("beforeMw", "before", "MW", b => b.BeforeMw, 2)
        .Number("afterMw", "after", "MW", b => b.AfterMw, 2)
        .Number("deltaMw", "change", "MW", b => b.DeltaMw, 2, reads: b => Numbers.Signed(b.DeltaMw, 2))
        .Number("beforeLoadingPercent", "before loading", "%", b => b.BeforeLoadingPercent, 1)
        .Number("afterLoadingPercent", "after loading", "%", b => b.AfterLoadingPercent, 1)
        .Shown("note", b => Note(b.Membership, 0, 0));

    public static ColumnSpec<TapChange> Taps { get; } = new ColumnSpec<TapChange>()
        .Text("id", "transformer", t => t.Id)
        .Integer("beforePosition", "before position", null, t => t.BeforePosition)
        .Integer("afterPosition", "after position", null, t => t.AfterPosition);

    public static ColumnSpec<ViolationChange> Violations { get; } = new ColumnSpec<ViolationChange>()
        .Text("change", "change", v => v.Change)
        .Include(LoadFlowColumns.Violations, v => v.Violation);

    public static ColumnSpec<TotalChange> Totals { get; } = new ColumnSpec<TotalChange>()
        .Text("quantity", "quantity", t => t.Quantity)
        .Number("before", "before", null, t => t.Before, 3, reads: t => Numbers.Fixed(t.Before, t.Decimals))
        .Number("after", "after", null, t => t.After, 3, reads: t => Numbers.Fixed(t.After, t.Decimals));

    public static IEnumerable<ViolationChange> ViolationChanges(CaseComparisonResult r) =>
        r.ViolationsAppeared.Select(v => new ViolationChange("appeared", v)).Concat(r.ViolationsCleared.Select(v => new ViolationChange("cleared", v)));

    public static IEnumerable<TotalChange> TotalChanges(CaseComparisonResult r) =>
        [new("lossMw", r.LossBeforeMw, r.LossAfterMw, 3), new("loadMw", r.LoadBeforeMw, r.LoadAfterMw, 2)];

    private static string Membership(CaseMembership m) => m switch
    {
        CaseMembership.Added => "added",
        CaseMembership.Removed => "removed",
        _ => "both",
    };

    private static string Note(CaseMembership membership, double? before, double? after) => membership switch
    {
        CaseMembership.Added => "added",
        CaseMembership.Removed => "removed",
        _ when before is null && after is null => "dead in both",
        _ when before is null => "dead before",
        _ when after is null => "dead after",
        _ => "",
    };
}
