// The report of `study choose`: the recommendation first, then every candidate ranked, then why each infeasible one fails.
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Model;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Choose;

public static class ChooseReport
{
    public static ReportDocument Build(string path, Network network, string candidatesPath, BankChoiceResult r)
    {
        var doc = new ReportDocument($"Bank choice: {r.Transformer} in {LoadFlowReport.Title(network, path)}") { Caution = r.Caution };
        doc.Input("network", path);
        doc.Input("candidates", $"{candidatesPath}: {r.Candidates.Count} banks");
        doc.Input("scenarios", r.Scenarios.Count == 0 ? "every scenario of the network" : string.Join(", ", r.Scenarios.Select(Labels.Scenario)));
        doc.Input("watched buses", r.WatchBuses.Count == 0 ? "the buses the bank feeds at its lv voltage" : string.Join(", ", r.WatchBuses));
        doc.Input("band", r.Band is { } b ? $"{Fixed(b.Low, 3)}–{Fixed(b.High, 3)} pu" : "each bus's vMin–vMax");
        doc.Input("loss rates", $"A = {Fixed(r.NoLoadRate, 0)} per kW no-load, B = {Fixed(r.LoadRate, 0)} per kW load loss at rated current");
        doc.Input("annual energy", r.ProfileSource is string p ? $"from the profile {p}" : $"loss-load factor {Fixed(r.LossLoadFactor, 2)}");
        doc.Text(Findings(r).ToArray());
        doc.Heading($"Candidates ({r.Candidates.Count}), feasible first by total owning cost = price + A·P0 + B·Pk")
            .Table(ChooseColumns.Candidates, ChooseColumns.Rows(r));
        var failing = r.Candidates.Where(c => !c.Feasible).ToList();
        if (failing.Count > 0)
        {
            doc.Heading("Why the others fail");
            doc.List(failing.SelectMany(c => c.Reasons.Select(reason => $"{c.Id}: {reason.Text}")));
        }
        if (r.Notes.Count > 0) doc.Heading("Notes").List(r.Notes);
        return doc;
    }

    public static IEnumerable<string> Findings(BankChoiceResult r)
    {
        CandidateAssessment? best = r.Candidates.FirstOrDefault(c => c.Feasible);
        if (best is null)
        {
            yield return $"no candidate meets every constraint in place of {r.Transformer}; the reasons are listed below";
            yield break;
        }
        string tap = best.OnLoad ? "its on-load changer regulating" : $"on tap {Labels.Position(best.BestTap ?? 0)}";
        yield return $"recommended: {best.Id}, {tap}, total owning cost {Fixed(best.TotalOwningCost, 0)} "
            + $"(price {Fixed(best.Price, 0)} + losses {Fixed(best.CapitalisedLosses, 0)})";
        string duty = best.MaxDutyPercent is double d ? $"its breakers at {Fixed(d, 1)} % duty at most ({Text(best.MaxDutyBreaker)}{(d > 100 ? ", over with the existing bank as well: see Notes" : "")})" : "no breaker duty checked";
        yield return $"it keeps the watched buses {Fixed(best.MarginPu, 4)} pu inside the band at worst, {duty}, "
            + $"and loses {Fixed(best.EnergyLossMwh, 1)} MWh " + (r.ProfileSource is null ? "a year" : "over the profile");
        int feasible = r.Candidates.Count(c => c.Feasible);
        yield return $"{feasible} of {r.Candidates.Count} candidates meet every constraint";
        if (r.Candidates.Where(c => c.Feasible).Skip(1).FirstOrDefault() is { } next)
            yield return $"the next, {next.Id}, costs {Fixed(next.TotalOwningCost - best.TotalOwningCost, 0)} more over its life";
    }
}
