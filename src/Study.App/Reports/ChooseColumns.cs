// The columns of the bank-choice result: one row per candidate, ranked.
using Study.Core.Cases;

namespace Study.App.Reports;

/// <summary>A candidate with its place in the ranking.</summary>
public sealed record RankedCandidate(int Rank, CandidateAssessment Candidate);

public static class ChooseColumns
{
    public static IReadOnlyList<RankedCandidate> Rows(BankChoiceResult r) =>
        r.Candidates.Select((c, i) => new RankedCandidate(i + 1, c)).ToList();

    public static ColumnSpec<RankedCandidate> Candidates { get; } = new ColumnSpec<RankedCandidate>()
        .Integer("rank", "rank", null, r => r.Rank)
        .Text("id", "candidate", r => r.Candidate.Id)
        .Words("feasible", "meets all", r => r.Candidate.Feasible, r => r.Candidate.Feasible ? "yes" : $"no ({r.Candidate.Reasons.Count})")
        .Words("bestTap", "tap", r => r.Candidate.BestTap,
            r => r.Candidate.OnLoad ? "on-load" : r.Candidate.BestTap is int p ? Labels.Position(p) : Numbers.Blank, Align.Right)
        .Number("marginPu", "margin", "pu", r => r.Candidate.MarginPu, 4, mark: r => r.Candidate.MarginPu < 0 ? Marks.Low : " ")
        .Number("maxDutyPercent", "max duty", "%", r => r.Candidate.MaxDutyPercent, 1,
            mark: r => r.Candidate.MaxDutyPercent > 100 ? Marks.Over : r.Candidate.MaxDutyPercent > 90 ? Marks.Near : " ")
        .Text("maxDutyBreaker", "at breaker", r => r.Candidate.MaxDutyBreaker)
        .Number("n1WorstPct", "N-1 worst", "%", r => r.Candidate.N1WorstPct, 1, mark: r => r.Candidate.N1WorstPct > 100 ? Marks.High : " ")
        .CsvOnly("n1WorstCase", r => r.Candidate.N1WorstCase)
        .Number("noLoadLossKw", "P0", "kW", r => r.Candidate.NoLoadLossKw, 1)
        .Number("loadLossKw", "Pk", "kW", r => r.Candidate.LoadLossKw, 1)
        .Number("peakLoadLossKw", "peak load loss", "kW", r => r.Candidate.PeakLoadLossKw, 1)
        .Number("energyLossMwh", "energy lost", "MWh", r => r.Candidate.EnergyLossMwh, 1)
        .Number("price", "price", null, r => r.Candidate.Price, 0)
        .Number("capitalisedLosses", "losses A·P0+B·Pk", null, r => r.Candidate.CapitalisedLosses, 0)
        .Number("totalOwningCost", "total owning cost", null, r => r.Candidate.TotalOwningCost, 0)
        .CsvOnly("reasons", r => string.Join("; ", r.Candidate.Reasons.Select(x => x.Text)));
}
