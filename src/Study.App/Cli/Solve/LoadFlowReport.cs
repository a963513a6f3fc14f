// The report of `study solve`: summary and violations first, then buses, branches and taps.
using Study.App.Cli.Reports;
using Study.Core.LoadFlow;
using Study.Core.Model;
using static Study.App.Cli.Format;

namespace Study.App.Cli.Solve;

public static class LoadFlowReport
{
    public static ReportDocument Build(string path, Network network, LoadFlowResult r, PublishedComparison? published,
        LoadFlowOptions? options = null)
    {
        string scenario = r.Scenario is null ? "loads as entered" : $"scenario {r.Scenario}";
        var doc = new ReportDocument($"Load flow: {Title(network, path)} ({scenario})");
        AddInputs(doc, path, network, scenario, options ?? LoadFlowOptions.Default);
        if (!r.Converged)
            return doc.Text($"NOT CONVERGED after {r.Iterations} iterations: {r.Message}", Log(r));

        var t = r.Totals;
        var summary = new List<string>
        {
            $"converged in {r.Iterations} iterations, largest mismatch {E(r.MaxMismatchPu)} pu",
            $"generation {F(t.GenerationMw, 2)} MW {F(t.GenerationMvar, 2)} Mvar   load {F(t.LoadMw, 2)} MW {F(t.LoadMvar, 2)} Mvar   "
            + $"losses {F(t.LossMw, 3)} MW {F(t.LossMvar, 3)} Mvar",
        };
        if (published is not null)
            summary.Add($"against the published solution ({published.Source}): largest |dV| {F(published.MaxVoltageDifferencePu, 4)} pu at bus {published.MaxVoltageBus}, "
                      + $"largest |d angle| {F(published.MaxAngleDifferenceDeg, 2)} deg at bus {published.MaxAngleBus}");
        if (r.BusesAtReactiveLimit.Count > 0)
            summary.Add($"at a reactive limit: {string.Join(", ", r.BusesAtReactiveLimit)}");
        if (network.IsPerUnitOnly) summary.Add("kV not stated in this case: voltages and currents in per unit only");
        doc.Text(summary.ToArray());

        doc.Heading($"Violations ({r.Violations.Count})");
        doc.List(r.Violations.Count == 0 ? ["none: every bus inside its band, no branch above its rating"] : r.Violations.Select(Describe));

        var names = network.Buses.ToDictionary(b => b.Id, b => b.Name);
        var buses = new ReportTable().Left("bus").Left("name").Column("kV").Column("V pu").Left("").Column("V kV")
            .Column("angle deg").Column("Pgen MW").Column("Qgen Mvar").Column("Pload MW").Column("Qload Mvar");
        foreach (BusResult b in r.Buses)
            buses.Row(b.Id, names.GetValueOrDefault(b.Id) ?? "", b.Kv > 0 ? F(b.Kv, 1) : "-", b.Energised ? F(b.VPu, 4) : "dead",
                Marker(b.Violation), F(b.VKv, 2), F(b.AngleDeg, 2), Blank(b.PGenMw, 2), Blank(b.QGenMvar, 2),
                Blank(b.PLoadMw, 2), Blank(b.QLoadMvar, 2));
        doc.Heading($"Buses ({r.Buses.Count})   ▼ below vMin, ▲ above vMax").Add(buses);

        var branches = new ReportTable().Left("branch").Left("kind").Left("from").Left("to").Column("P from MW").Column("Q from Mvar")
            .Column("P to MW").Column("Q to Mvar").Column("I from A").Column("loss MW").Column("loss Mvar").Column("loading %");
        foreach (BranchResult b in r.Branches)
            branches.Row(b.Id, b.Kind, b.From, b.To, F(b.PFromMw, 2), F(b.QFromMvar, 2), F(b.PToMw, 2), F(b.QToMvar, 2),
                F(b.IFromA, 1), F(b.LossMw, 3), F(b.LossMvar, 3), F(b.LoadingPercent, 1) + (b.LoadingPercent > 100 ? " !" : ""));
        doc.Heading($"Branches ({r.Branches.Count})").Add(branches);

        if (r.Taps.Count > 0)
        {
            var taps = new ReportTable().Left("transformer").Column("position").Column("ratio").Left("control").Left("status");
            foreach (TapResult tap in r.Taps)
                taps.Row(tap.Id, I(tap.Position), F(tap.Ratio, 4),
                    tap.Regulating ? $"on-load, holds {tap.RegulatedBus}" : "fixed",
                    tap.AtLimit is null ? "" : $"at its {tap.AtLimit} limit: wants to move further");
            doc.Heading($"Taps ({r.Taps.Count})").Add(taps);
        }
        return doc.SpacedText(Log(r));
    }

    public static string Title(Network network, string path) =>
        string.IsNullOrWhiteSpace(network.Name) ? path : $"{network.Name} [{path}]";

    public static string Marker(ViolationKind v) => v switch
    {
        ViolationKind.Low => "▼",
        ViolationKind.High => "▲",
        _ => "",
    };

    /// <summary>One violation as a sentence, e.g. "bus QE33: low 0.9412 pu (limit 0.950)".</summary>
    public static string Describe(Violation v) => v.Type == ViolationKind.Overload
        ? $"{v.Kind} {v.Element}: loaded {F(v.Value, 1)} % of its rating"
        : $"bus {v.Element}: {(v.Type == ViolationKind.Low ? "low" : "high")} {F(v.Value, 4)} pu (limit {F(v.Limit, 3)})";

    /// <summary>The inputs every load-flow based report lists: file, network, scenario and solver options.</summary>
    public static void AddInputs(ReportDocument doc, string path, Network network, string scenario, LoadFlowOptions options)
    {
        doc.Input("file", path);
        if (!string.IsNullOrWhiteSpace(network.Name)) doc.Input("network", network.Name);
        doc.Input("scenario", scenario);
        doc.Input("options", Options(options));
    }

    public static string Options(LoadFlowOptions o) =>
        $"Newton-Raphson, tolerance {E(o.TolerancePu)} pu, at most {o.MaxIterations} iterations; "
        + (o.EnforceQLimits ? "reactive limits enforced" : "reactive limits ignored") + "; "
        + (o.RegulateTaps ? "on-load taps regulate" : "taps fixed at their file positions");

    private static string Blank(double value, int decimals) => Math.Abs(value) < 0.5e-6 ? "" : F(value, decimals);

    private static string Log(LoadFlowResult r) =>
        "Mismatch by iteration (pu): " + string.Join("  ", r.Log.Select(l => $"{l.Iteration}: {E(l.MaxMismatchPu)}"));
}
