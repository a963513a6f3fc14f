// What a solved load flow says at a glance: its lowest and highest bus voltage and its most loaded branch.
using Study.Core.LoadFlow;

namespace Study.App.Reports;

public static class LoadFlowHighlights
{
    /// <summary>
    /// "lowest V 0.9606 pu at PS11 ▼ · highest V 1.0120 pu at WRB33 · most loaded GT1 87.3 % · loss 0.721 MW",
    /// over energised buses and rated branches; a load flow that did not converge says so instead.
    /// </summary>
    public static string Line(LoadFlowResult r)
    {
        if (!r.Converged) return $"NOT CONVERGED after {r.Iterations} iterations (worst bus {r.WorstBus ?? Numbers.Blank}): the values below are the last iterate, not a solution.";
        var live = r.Buses.Where(b => b.Energised).ToList();
        var parts = new List<string>();
        if (live.Count > 0)
        {
            BusResult low = live.MinBy(b => b.VPu)!, high = live.MaxBy(b => b.VPu)!;
            parts.Add($"lowest V {Numbers.Fixed(low.VPu, 4)} pu at {low.Id}{Mark(low)}");
            parts.Add($"highest V {Numbers.Fixed(high.VPu, 4)} pu at {high.Id}{Mark(high)}");
        }
        int dead = r.Buses.Count - live.Count;
        if (dead > 0) parts.Add($"{dead} bus(es) dead");
        BranchResult? loaded = r.Branches.Where(b => b.LoadingPercent is not null).MaxBy(b => b.LoadingPercent);
        parts.Add(loaded is null ? "no branch has a rating"
            : $"most loaded {loaded.Id} {Numbers.Fixed(loaded.LoadingPercent, 1)} %{(loaded.LoadingPercent > 100 ? " " + Marks.High : "")}");
        parts.Add($"loss {Numbers.Fixed(r.Totals.LossMw, 3)} MW");
        return string.Join(" · ", parts);
    }

    private static string Mark(BusResult b) => b.Violation == ViolationKind.None ? "" : " " + Marks.Of(b.Violation);
}
