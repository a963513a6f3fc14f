// The report of `study profile`: the finding first, then the energy balance, the transformers and the buses.
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Profile;

public static class ProfileReport
{
    public static ReportDocument Build(string path, Network network, string profilePath, ProfileResult r, LoadFlowOptions options)
    {
        string scenario = r.Scenario is null ? "loads as entered" : $"scenario {r.Scenario}";
        var doc = new ReportDocument($"Profile: {LoadFlowReport.Title(network, path)} ({scenario} × {Path.GetFileName(profilePath)})");
        LoadFlowReport.AddInputs(doc, path, network, scenario, options);
        doc.Input("profile", $"{profilePath}: {r.Steps} steps, {Fixed(r.Hours, 2)} h");
        doc.Text(Findings(r).ToArray());
        if (r.StepsNotConverged > 0)
            doc.List([$"{r.StepsNotConverged} of {r.Steps} steps did not converge and count in no figure below; the first: {r.FirstFailure}"]);
        doc.Heading("Energy over the profile").Table(ProfileColumns.Energy, ProfileColumns.EnergyRows(r.Energy));
        doc.Heading($"Transformers ({r.Transformers.Count})").Table(ProfileColumns.Transformers, r.Transformers);
        doc.Heading($"Buses ({r.Buses.Count})   ▼ lowest below vMin, ▲ highest above vMax").Table(ProfileColumns.Buses, r.Buses);
        return doc;
    }

    /// <summary>The answers first: energy lost and how it splits, each on-load changer's operations, the buses out of band.</summary>
    public static IEnumerable<string> Findings(ProfileResult r)
    {
        double days = r.Hours / 24;
        yield return $"over {Fixed(r.Hours, 1)} h ({Fixed(days, 1)} days) the network lost {Fixed(r.Energy.LossMwh, 1)} MWh: "
            + $"{Fixed(r.Energy.LoadLossMwh, 1)} MWh load (I²R) loss and {Fixed(r.Energy.NoLoadLossMwh, 1)} MWh no-load loss, "
            + $"{Fixed(100 * r.Energy.LossMwh / Math.Max(r.Energy.ConsumedMwh, 1e-9), 2)} % of the {Fixed(r.Energy.ConsumedMwh, 0)} MWh consumed";
        foreach (ProfileTransformer t in r.Transformers)
        {
            string ops = t.OnLoad
                ? $"{t.TapOperations} tap operations ({Fixed(t.TapOperations / Math.Max(days, 1e-9), 1)} a day), positions {string.Join(", ", t.PositionsUsed.Select(Labels.Position))}"
                : "a fixed tap (no operations)";
            yield return $"{t.Id}: {Fixed(t.LossMwh, 1)} MWh lost ({Fixed(t.LoadLossMwh, 1)} load, {Fixed(t.NoLoadLossMwh, 1)} no-load), {ops}";
        }
        var outside = r.Buses.Where(b => b.HoursOutside > 0).OrderByDescending(b => b.HoursOutside).ToList();
        yield return outside.Count == 0
            ? "every bus stayed inside its band at every step"
            : "outside their band: " + string.Join(", ", outside.Select(b => $"{b.Id} {Fixed(b.HoursOutside, 1)} h"));
    }
}
