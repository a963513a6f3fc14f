// Bank-choice results for the Bank tab: the findings and notes, and one row per candidate with its binding constraint.
using Study.App.Cli.Choose;
using Study.App.Reports;
using Study.Core.Cases;

namespace Study.App.Tui.Choice;

/// <summary>
/// Nothing here is computed, only laid out. Each row says in words what binds it ("FAILS breaker duty",
/// "tightest voltage band") and the cell of that constraint carries "◀", so the binding constraint reads
/// without colour; the recommended bank's rank reads "1 ★".
/// </summary>
public static class ChoiceTables
{
    public const string NotYet = "No bank choice yet: Alt+B weighs candidate banks for a transformer.";
    public const string BindingMark = " ◀";

    /// <summary>The candidates' columns with the binding constraint in words after "meets all".</summary>
    public static ColumnSpec<(RankedCandidate Row, Binding Binding)> Columns { get; } = Build();

    public static string[] Headers => Columns.Headings;

    public static string Heading(BankChoiceResult r)
    {
        var lines = new List<string> { $"Bank choice for {r.Transformer} · total owning cost = price + A·P0 + B·Pk (A {Numbers.Fixed(r.NoLoadRate, 0)}, B {Numbers.Fixed(r.LoadRate, 0)} per kW)" };
        lines.AddRange(ChooseReport.Findings(r));
        lines.Add("◀ the binding constraint: what a bank fails, or where one that meets all has least headroom · ★ recommended");
        foreach (CandidateAssessment c in r.Candidates.Where(c => !c.Feasible))
            lines.AddRange(c.Reasons.Select(reason => $"{c.Id} fails: {reason.Text}"));
        lines.AddRange(r.Notes.Select(n => "Note: " + n));
        return string.Join("\n", lines);
    }

    public static IReadOnlyList<(RankedCandidate Row, Binding Binding)> Rows(BankChoiceResult r) =>
        ChooseColumns.Rows(r).Select(row => (row, ChooseBinding.Of(row.Candidate, r))).ToList();

    /// <summary>The table: the binding cell of each row marked, the recommended rank starred.</summary>
    public static TextTableSource Candidates(BankChoiceResult r)
    {
        var rows = Rows(r);
        string[] keys = Columns.Readable.Select(c => c.Key ?? c.Header!).ToArray();
        List<string[]> cells = Columns.ReadableRows(rows, blankRepeats: false);
        for (int i = 0; i < rows.Count; i++)
        {
            if (rows[i].Binding.ColumnKey is { } key && Array.IndexOf(keys, key) is int at and >= 0) cells[i][at] += BindingMark;
            if (rows[i].Row.Candidate.Id == r.Recommended) cells[i][0] += " ★";
        }
        return new TextTableSource(Headers, cells);
    }

    private static ColumnSpec<(RankedCandidate Row, Binding Binding)> Build()
    {
        var all = new ColumnSpec<(RankedCandidate Row, Binding Binding)>()
            .Include(ChooseColumns.Candidates, x => x.Row)
            .Words("binding", "binding", x => x.Binding.Constraint.ToString(), x => x.Binding.Words);
        return all.Select("rank", "id", "feasible", "binding", "totalOwningCost", "marginPu", "maxDutyPercent", "n1WorstPct", "bestTap",
            "maxDutyBreaker", "price", "capitalisedLosses", "noLoadLossKw", "loadLossKw", "peakLoadLossKw", "energyLossMwh");
    }
}
