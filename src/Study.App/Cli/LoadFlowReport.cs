// The readable report of `study solve`: summary and violations first, then buses, branches and taps.
using System.Text;
using Study.Core.LoadFlow;
using Study.Core.Model;
using static Study.App.Cli.Format;

namespace Study.App.Cli;

public static class LoadFlowReport
{
    public static string Render(string path, Network network, LoadFlowResult r, PublishedComparison? published)
    {
        var sb = new StringBuilder();
        string scenario = r.Scenario is null ? "loads as entered" : $"scenario {r.Scenario}";
        sb.Append($"Load flow: {Title(network, path)} ({scenario})\n");
        if (!r.Converged)
        {
            sb.Append($"NOT CONVERGED after {r.Iterations} iterations: {r.Message}\n");
            AppendLog(sb, r);
            return sb.ToString();
        }
        var t = r.Totals;
        sb.Append($"converged in {r.Iterations} iterations, largest mismatch {E(r.MaxMismatchPu)} pu\n");
        sb.Append($"generation {F(t.GenerationMw, 2)} MW {F(t.GenerationMvar, 2)} Mvar   load {F(t.LoadMw, 2)} MW {F(t.LoadMvar, 2)} Mvar   "
                + $"losses {F(t.LossMw, 3)} MW {F(t.LossMvar, 3)} Mvar\n");
        if (published is not null)
            sb.Append($"against the published solution ({published.Source}): largest |dV| {F(published.MaxVoltageDifferencePu, 4)} pu at bus {published.MaxVoltageBus}, "
                    + $"largest |d angle| {F(published.MaxAngleDifferenceDeg, 2)} deg at bus {published.MaxAngleBus}\n");
        if (r.BusesAtReactiveLimit.Count > 0)
            sb.Append($"at a reactive limit: {string.Join(", ", r.BusesAtReactiveLimit)}\n");
        if (network.IsPerUnitOnly) sb.Append("kV not stated in this case: voltages and currents in per unit only\n");

        sb.Append($"\nViolations ({r.Violations.Count})\n");
        if (r.Violations.Count == 0) sb.Append("  none: every bus inside its band, no branch above its rating\n");
        foreach (Violation v in r.Violations)
            sb.Append(v.Type == ViolationKind.Overload
                ? $"  {v.Kind} {v.Element}: loaded {F(v.Value, 1)} % of its rating\n"
                : $"  bus {v.Element}: {(v.Type == ViolationKind.Low ? "low" : "high")} {F(v.Value, 4)} pu (limit {F(v.Limit, 3)})\n");

        var names = network.Buses.ToDictionary(b => b.Id, b => b.Name);
        var buses = new TextTable().Left("bus").Left("name").Column("kV").Column("V pu").Left("").Column("V kV")
            .Column("angle deg").Column("Pgen MW").Column("Qgen Mvar").Column("Pload MW").Column("Qload Mvar");
        foreach (BusResult b in r.Buses)
            buses.Row(b.Id, names.GetValueOrDefault(b.Id) ?? "", b.Kv > 0 ? F(b.Kv, 1) : "-", b.Energised ? F(b.VPu, 4) : "dead",
                Marker(b.Violation), F(b.VKv, 2), F(b.AngleDeg, 2), Blank(b.PGenMw, 2), Blank(b.QGenMvar, 2),
                Blank(b.PLoadMw, 2), Blank(b.QLoadMvar, 2));
        sb.Append($"\nBuses ({r.Buses.Count})   ▼ below vMin, ▲ above vMax\n").Append(buses.Render("  "));

        var branches = new TextTable().Left("branch").Left("kind").Left("from").Left("to").Column("P from MW").Column("Q from Mvar")
            .Column("P to MW").Column("Q to Mvar").Column("I from A").Column("loss MW").Column("loss Mvar").Column("loading %");
        foreach (BranchResult b in r.Branches)
            branches.Row(b.Id, b.Kind, b.From, b.To, F(b.PFromMw, 2), F(b.QFromMvar, 2), F(b.PToMw, 2), F(b.QToMvar, 2),
                F(b.IFromA, 1), F(b.LossMw, 3), F(b.LossMvar, 3), F(b.LoadingPercent, 1) + (b.LoadingPercent > 100 ? " !" : ""));
        sb.Append($"\nBranches ({r.Branches.Count})\n").Append(branches.Render("  "));

        if (r.Taps.Count > 0)
        {
            var taps = new TextTable().Left("transformer").Column("position").Column("ratio").Left("control").Left("status");
            foreach (TapResult tap in r.Taps)
                taps.Row(tap.Id, I(tap.Position), F(tap.Ratio, 4),
                    tap.Regulating ? $"on-load, holds {tap.RegulatedBus}" : "fixed",
                    tap.AtLimit is null ? "" : $"at its {tap.AtLimit} limit: wants to move further");
            sb.Append($"\nTaps ({r.Taps.Count})\n").Append(taps.Render("  "));
        }
        sb.Append('\n');
        AppendLog(sb, r);
        return sb.ToString();
    }

    public static string Title(Network network, string path) =>
        string.IsNullOrWhiteSpace(network.Name) ? path : $"{network.Name} [{path}]";

    public static string Marker(ViolationKind v) => v switch
    {
        ViolationKind.Low => "▼",
        ViolationKind.High => "▲",
        _ => "",
    };

    private static string Blank(double value, int decimals) => Math.Abs(value) < 0.5e-6 ? "" : F(value, decimals);

    private static void AppendLog(StringBuilder sb, LoadFlowResult r)
    {
        sb.Append("Mismatch by iteration (pu): ");
        sb.Append(string.Join("  ", r.Log.Select(l => $"{l.Iteration}: {E(l.MaxMismatchPu)}")));
        sb.Append('\n');
    }
}
