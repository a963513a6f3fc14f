// The --json shape of `study choose` (README, "Results as JSON").
using Study.Core.Cases;

namespace Study.App.Cli.Choose;

public sealed record CandidateJson(string Id, bool Feasible, IReadOnlyList<string> Reasons, int? BestTap, bool OnLoad, double? MarginPu,
    double? MaxDutyPercent, string? MaxDutyBreaker, double? N1WorstPct, string? N1WorstCase, double NoLoadLossKw, double LoadLossKw,
    double? PeakLoadLossKw, double? EnergyLossMwh, double Price, double CapitalisedLosses, double TotalOwningCost);

public sealed record ChooseJson(string Caution, string Transformer, IReadOnlyList<CandidateJson> Candidates, string? Recommended,
    double NoLoadRate, double LoadRate, double? LossLoadFactor, string? Profile, IReadOnlyList<string> Notes)
{
    public static ChooseJson From(BankChoiceResult r) => new(r.Caution, r.Transformer,
        r.Candidates.Select(c => new CandidateJson(c.Id, c.Feasible, c.Reasons.Select(x => x.Text).ToList(), c.BestTap, c.OnLoad, c.MarginPu, c.MaxDutyPercent,
            c.MaxDutyBreaker, c.N1WorstPct, c.N1WorstCase, c.NoLoadLossKw, c.LoadLossKw, c.PeakLoadLossKw, c.EnergyLossMwh, c.Price,
            c.CapitalisedLosses, c.TotalOwningCost)).ToList(),
        r.Recommended, r.NoLoadRate, r.LoadRate, r.LossLoadFactor, r.ProfileSource, r.Notes);
}
