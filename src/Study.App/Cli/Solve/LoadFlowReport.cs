// The report of `study solve`: summary and violations first, then buses, branches and taps.
using Study.App.Reports;
using Study.Core.LoadFlow;
using Study.Core.Model;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Solve;

public static class LoadFlowReport
{
    public static ReportDocument Build(string path, Network network, LoadFlowResult r, PublishedComparison? published,
        LoadFlowOptions? options = null)
    {
        string scenario = r.Scenario is null ? "as entered" : $"scenario {r.Scenario}";
        var doc = new ReportDocument($"Load flow: {Title(network, path)} ({scenario})");
        AddInputs(doc, path, network, scenario, options ?? LoadFlowOptions.Default);
        if (!r.Converged)
            return doc.Text($"NOT CONVERGED after {r.Iterations} iterations: {r.Message}", Log(r));

        var t = r.Totals;
        var summary = new List<string>
        {
            $"converged in {r.Iterations} iterations, largest mismatch {Exponent(r.MaxMismatchPu)} pu",
            $"generation {Fixed(t.GenerationMw, 2)} MW {Fixed(t.GenerationMvar, 2)} Mvar   load {Fixed(t.LoadMw, 2)} MW {Fixed(t.LoadMvar, 2)} Mvar   "
            + $"losses {Fixed(t.LossMw, 3)} MW {Fixed(t.LossMvar, 3)} Mvar",
        };
        if (published is not null)
            summary.Add($"against the published solution ({published.Source}): largest |dV| {Fixed(published.MaxVoltageDifferencePu, 4)} pu at bus {published.MaxVoltageBus}, "
                      + $"largest |d angle| {Fixed(published.MaxAngleDifferenceDeg, 2)} deg at bus {published.MaxAngleBus}");
        if (r.BusesAtReactiveLimit.Count > 0)
            summary.Add($"at a reactive limit: {string.Join(", ", r.BusesAtReactiveLimit.Select(Labels.Limit))}");
        if (network.IsPerUnitOnly) summary.Add("kV not stated in this case: voltages and currents in per unit only");
        doc.Text(summary.ToArray());

        doc.Heading($"Violations ({r.Violations.Count})");
        doc.List(r.Violations.Count == 0 ? ["none: every bus inside its band, no branch above its rating"] : r.Violations.Select(Describe));

        var names = network.Buses.ToDictionary(b => b.Id, b => b.Name);
        doc.Heading($"Buses ({r.Buses.Count})   ▼ below vMin, ▲ above vMax").Table(LoadFlowColumns.Buses(id => names.GetValueOrDefault(id)), r.Buses);
        doc.Heading($"Branches ({r.Branches.Count})").Table(LoadFlowColumns.Branches, r.Branches);
        if (r.Taps.Count > 0) doc.Heading($"Taps ({r.Taps.Count})").Table(LoadFlowColumns.Taps, r.Taps);
        return doc.SpacedText(Log(r));
    }

    public static string Title(Network network, string path) =>
        string.IsNullOrWhiteSpace(network.Name) ? path : $"{network.Name} [{path}]";

    /// <summary>One violation as a sentence, e.g. "bus QE33: low 0.9412 pu (limit 0.950)".</summary>
    public static string Describe(Violation v) => v.Type == ViolationKind.Overload
        ? $"{v.Kind} {v.Element}: loaded {Fixed(v.Value, 1)} % of its rating"
        : $"bus {v.Element}: {(v.Type == ViolationKind.Low ? "low" : "high")} {Fixed(v.Value, 4)} pu (limit {Fixed(v.Limit, 3)})";

    /// <summary>The inputs every load-flow based report lists: file, network, scenario and solver options.</summary>
    public static void AddInputs(ReportDocument doc, string path, Network network, string scenario, LoadFlowOptions options)
    {
        doc.Input("file", path);
        if (!string.IsNullOrWhiteSpace(network.Name)) doc.Input("network", network.Name);
        doc.Input("scenario", scenario);
        doc.Input("options", Options(options));
    }

    public static string Options(LoadFlowOptions o) =>
        $"Newton-Raphson, tolerance {Exponent(o.TolerancePu)} pu, at most {o.MaxIterations} iterations; "
        + (o.EnforceQLimits ? "reactive limits enforced" : "reactive limits ignored") + "; "
        + (o.RegulateTaps ? "on-load taps regulate" : "taps fixed at their file positions");

    private static string Log(LoadFlowResult r) =>
        "Mismatch by iteration (pu): " + string.Join("  ", r.Log.Select(l => $"{l.Iteration}: {Exponent(l.MaxMismatchPu)}"));
}
