// The report of `study fault`: the caution first, then fault levels per bus, then breaker duty.
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Faults;

/// <summary>
/// One report document for the terminal and the Markdown note alike; the caution is the document's
/// own, so both state it before any number.
/// </summary>
public static class FaultReport
{
    /// <param name="detail">Also list post-fault voltages and branch contributions of every fault (for a few buses).</param>
    public static ReportDocument Build(string path, Network network, FaultResult r, FaultRequest request, string? scenario, bool detail = false)
    {
        string level = r.Level == FaultLevel.Max ? "maximum (c_max, scMvaMax)" : "minimum (c_min, scMvaMin)";
        string method = r.Method == FaultMethod.Iec60909 ? "IEC 60909 equivalent voltage source" : "pre-fault voltages from the load flow";
        var doc = new ReportDocument($"Fault levels: {LoadFlowReport.Title(network, path)}") { Caution = r.Caution };
        doc.Input("file", path);
        if (!string.IsNullOrWhiteSpace(network.Name)) doc.Input("network", network.Name);
        doc.Input("scenario", scenario is null ? "as entered" : $"scenario {scenario}");
        doc.Input("method", method);
        doc.Input("levels", level);
        doc.Input("fault types", string.Join(", ", request.Kinds.Select(k => k.Code())));
        doc.Input("fault impedance", $"{Fixed(request.FaultImpedanceOhm.Real, 3)} + j{Fixed(request.FaultImpedanceOhm.Imaginary, 3)} ohm");
        doc.Input("buses", request.Buses is { Count: > 0 } buses ? string.Join(", ", buses) : "every bus");
        string breaking = r.Breaking == BreakingCurrent.Decay ? "I_b with the decay of generators (μ) and motors (μ·q)" : "I_b = I''k (conservative)";
        doc.Input("breaking current", $"{breaking}, t_min {UpTo(r.TMinS, 3)} s (breakers with minTripS at their own)");
        doc.Input("thermal current", $"I_th for T_k = {UpTo(r.TkS, 3)} s");
        if (r.LineTemperatureC is double lineC) doc.Input("line resistance", $"at {UpTo(lineC, 1)} °C (minimum levels)");

        var lines = new List<string>
        {
            $"method {r.Method.Code()} ({method}), {level} levels; kappa by the equivalent frequency f_c (IEC 60909-0 method C)",
            $"{breaking} at t_min {UpTo(r.TMinS, 3)} s; i_DC with R/X at the equivalent frequency for f·t_min; I_th for T_k {UpTo(r.TkS, 3)} s (n = 1)",
        };
        if (r.PerUnitOnly) lines.Add("kV not stated in this case: currents in per unit of the bus base current, ohm values not given");
        lines.AddRange(r.Notes.Select(note => $"note: {note}"));
        doc.Text(lines.ToArray());

        doc.Heading($"Faults ({r.Faults.Count}); Z0 'open' = no zero-sequence path to earth at the bus").Table(FaultColumns.Levels(r.PerUnitOnly), r.Faults);
        doc.Heading($"Breaking and thermal currents: I_b, i_DC and I_b,asym at t_min {UpTo(r.TMinS, 3)} s, I_k steady state, I_th for {UpTo(r.TkS, 3)} s")
            .Table(FaultColumns.Duty(r.PerUnitOnly), r.Faults);
        if (detail)
            foreach (ShortCircuitLevel f in r.Faults)
            {
                doc.Heading($"{f.Kind.Code()} at {f.Bus}: phase voltages after the fault (pu)").Table(FaultColumns.Voltages, f.Voltages)
                    .Text("  branch contributions (fault-induced current at the faulted end, largest phase)")
                    .Table(FaultColumns.Contributions(f.Kv > 0), f.Contributions);
                if (f.Machines.Count > 0)
                    doc.Text($"  machines: own current and its decay by t_min {UpTo(r.TMinS, 3)} s (I_b = I''k − Σ decay)")
                        .Table(FaultColumns.Machines(r.TMinS), f.Machines);
            }

        doc.Heading($"Breaker duty ({r.Breakers.Count}): the worst of the checks below; warning above 90 %, over above 100 %");
        if (r.Breakers.Count == 0) return doc.List(["no breakers at the faulted buses"]);
        doc.Table(FaultColumns.Breakers, r.Breakers);
        doc.Heading("Breaker checks: breaking I_b vs interruptingKa; asymmetric √(I_b² + i_DC²) vs interruptingKa·√(1 + 2·(dcPercent/100)²); "
            + "making i_p vs peakKa; short-time I_th (referred to shortTimeS) vs shortTimeKa");
        doc.Table(FaultColumns.Checks, FaultColumns.CheckRows(r.Breakers));
        // A DC component above the rated percentage is covered when the asymmetric current is within the asymmetric rating.
        var aboveDc = r.Breakers.SelectMany(b => b.Checks.Where(c => c.Check == DutyCheckKind.BreakingAsym
                && c.DcPercent is double dc && c.RatedDcPercent is double rated && dc > rated).Select(c => (b, c))).ToList();
        if (aboveDc.Count > 0)
            doc.SpacedText("DC component above the rated percentage at contact separation (the asymmetric check decides):")
                .List(aboveDc.Select(x => $"{x.b.Id}: {Fixed(x.c.DcPercent, 1)} % against {Fixed(x.c.RatedDcPercent, 1)} % rated; "
                    + $"asymmetric current {Fixed(x.c.RequiredKa, 2)} kA is {Fixed(x.c.DutyPercent, 1)} % of {Fixed(x.c.RatedKa, 2)} kA"));
        return doc;
    }
}
