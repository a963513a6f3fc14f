// The Markdown report of `study fault`: the inputs, the caution as its own paragraph, then the fault report as printed.
using Study.App.Cli.Reports;
using Study.App.Cli.Solve;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Cli.Faults;

/// <summary>
/// Wraps the plain-text fault report (built once, by <see cref="FaultReport"/>) in a report document,
/// so the Markdown file carries the inputs and states the caution before any number.
/// </summary>
public static class FaultMarkdown
{
    public static ReportDocument Build(string path, Network network, FaultResult result, FaultRequest request, string? scenario, string plainText)
    {
        var doc = new ReportDocument($"Fault levels: {LoadFlowReport.Title(network, path)}");
        doc.Input("file", path);
        if (!string.IsNullOrWhiteSpace(network.Name)) doc.Input("network", network.Name);
        doc.Input("scenario", scenario is null ? "loads as entered" : $"scenario {scenario}");
        doc.Input("method", result.Method == FaultMethod.Iec60909 ? "IEC 60909 equivalent voltage source" : "pre-fault voltages from the load flow");
        doc.Input("levels", result.Level == FaultLevel.Max ? "maximum (c_max, scMvaMax)" : "minimum (c_min, scMvaMin)");
        doc.Input("fault types", string.Join(", ", request.Kinds.Select(k => k.Code())));
        doc.Input("fault impedance", $"{Format.F(request.FaultImpedanceOhm.Real, 3)} + j{Format.F(request.FaultImpedanceOhm.Imaginary, 3)} ohm");
        doc.Input("buses", request.Buses is { Count: > 0 } buses ? string.Join(", ", buses) : "every bus");
        doc.Text($"CAUTION: {result.Caution}");
        string caution = $"CAUTION: {result.Caution}\n\n";
        return doc.Add(new ReportFigure(plainText.StartsWith(caution, StringComparison.Ordinal) ? plainText[caution.Length..] : plainText));
    }
}
