// The report of `study start`: the caution, the verdict per started motor, then every bus before and during.
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.Model;
using Study.Core.Studies;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Start;

public static class StartReport
{
    public static ReportDocument Build(string path, Network network, MotorStartResult r, MotorStartRequest request)
    {
        var doc = new ReportDocument($"Motor start: {string.Join(", ", r.Motors)} in {LoadFlowReport.Title(network, path)}") { Caution = r.Caution };
        doc.Input("file", path);
        if (!string.IsNullOrWhiteSpace(network.Name)) doc.Input("network", network.Name);
        doc.Input("scenario", request.Scenario is null ? "loads as entered" : $"scenario {request.Scenario}");
        doc.Input("motors started together", string.Join(", ", r.Motors));
        doc.Input("minimum terminal voltage", $"{Fixed(r.MinTerminalPu, 2)} pu");
        if (request.WatchBuses.Count > 0) doc.Input("watched buses", string.Join(", ", request.WatchBuses));

        string verdict = r.Ok
            ? $"every started motor gets at least {Fixed(r.MinTerminalPu, 2)} pu (lowest {Fixed(r.MotorTerminalPu, 4)} pu)"
            : $"{Marks.Low} a started motor gets {Fixed(r.MotorTerminalPu, 4)} pu, below the {Fixed(r.MinTerminalPu, 2)} pu it needs";
        var lines = new List<string>
        {
            "the instant of starting: supplies behind U_n²/S_k (scMvaMin, else scMvaMax), generators behind x''d, EMFs from the pre-start load flow",
            $"Finding: {verdict}",
        };
        lines.AddRange(r.Notes.Select(n => $"note: {n}"));
        doc.Text(lines.ToArray());
        doc.Heading("Started motors (terminal = the voltage at the motor's bus during the start)").Table(StartColumns.Motors(r.MinTerminalPu), r.Started);
        var watched = r.Buses.Where(b => b.Watched).ToList();
        if (watched.Count > 0)
            doc.Heading("Watched buses").Table(StartColumns.Buses, watched);
        return doc.Heading("Every bus (★ a started motor's bus, • watched)").Table(StartColumns.Buses, r.Buses);
    }
}
