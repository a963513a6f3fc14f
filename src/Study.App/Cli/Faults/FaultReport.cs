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

        var lines = new List<string> { $"method {r.Method.Code()} ({method}), {level} levels; kappa by the equivalent frequency f_c (IEC 60909-0 method C)" };
        if (r.PerUnitOnly) lines.Add("kV not stated in this case: currents in per unit of the bus base current, ohm values not given");
        lines.AddRange(r.Notes.Select(note => $"note: {note}"));
        doc.Text(lines.ToArray());

        doc.Heading($"Faults ({r.Faults.Count}); Z0 'open' = no zero-sequence path to earth at the bus").Table(FaultColumns.Levels(r.PerUnitOnly), r.Faults);
        if (detail)
            foreach (ShortCircuitLevel f in r.Faults)
                doc.Heading($"{f.Kind.Code()} at {f.Bus}: phase voltages after the fault (pu)").Table(FaultColumns.Voltages, f.Voltages)
                    .Text("  branch contributions (fault-induced current at the faulted end, largest phase)")
                    .Table(FaultColumns.Contributions(f.Kv > 0), f.Contributions);

        doc.Heading($"Breaker duty ({r.Breakers.Count}): larger of I''k/interruptingKa and ip/peakKa; warning above 90 %, over above 100 %");
        return r.Breakers.Count == 0 ? doc.List(["no breakers at the faulted buses"]) : doc.Table(FaultColumns.Breakers, r.Breakers);
    }
}
