// `study fault FILE`: IEC 60909 (or load-flow based) fault levels at every bus, and breaker duty.
using System.Numerics;
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Cli.Faults;

public sealed class FaultCommand : CliCommand
{
    public override string Name => "fault";
    public override string Summary => "fault levels (I''k, S''k, i_p, I_b, i_DC, I_th) at buses and breaker duty, by IEC 60909 or from a solved load flow";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Many("bus", "ID", "fault these buses only (default: every bus)")
        .Flag("all", "fault every bus (the default)")
        .Many("type", "3ph,slg,ll,dlg", "fault types (default 3ph,slg)")
        .Value("zf", "R,X", "fault impedance in ohm (default 0,0: a bolted fault)")
        .Value("method", "iec60909|loadflow", "iec60909 (equivalent source c·Un/√3, default) or loadflow (pre-fault voltages from the load flow)")
        .Flag("min", "minimum levels: c_min, each supply's scMvaMin, no motors, lines at --line-temp")
        .Value("tmin", "S", "minimum time delay t_min for I_b and i_DC, s (default 0.1; breakers with minTripS use theirs)")
        .Value("duration", "S", "fault duration T_k for the thermal current I_th, s (default 1)")
        .Value("ib", "decay|conservative", "breaking current: decay of generators and motors by mu and q (default), or I_b = I''k")
        .Value("line-temp", "C", "minimum levels: line conductor temperature at the end of the fault, °C (default 80)")
        .Value("scenario", "NAME", "scale loads as the named scenario does (matters for --method loadflow)")
        .Flag("json", "machine-readable result")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs and the caution, to attach to a study note")
        .Flag("timings", "report the time of each stage (read, validate, build, faults, report)");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        IReadOnlyList<string> buses = args.Values("bus");
        if (buses.Count > 0 && args.Has("all")) throw new UsageException("give --bus or --all, not both");
        var kinds = new List<FaultKind>();
        foreach (string code in args.Values("type"))
        {
            FaultKind kind = code switch
            {
                "3ph" => FaultKind.ThreePhase,
                "slg" => FaultKind.LineToEarth,
                "ll" => FaultKind.LineToLine,
                "dlg" => FaultKind.LineLineToEarth,
                _ => throw new UsageException($"--type knows 3ph, slg, ll, dlg; got '{code}'"),
            };
            if (!kinds.Contains(kind)) kinds.Add(kind);
        }
        FaultMethod method = args.Value("method") switch
        {
            null or "iec60909" => FaultMethod.Iec60909,
            "loadflow" => FaultMethod.LoadFlow,
            string other => throw new UsageException($"--method is iec60909 or loadflow, got '{other}'"),
        };
        var zf = args.Pair("zf") is (double r, double x) ? new Complex(r, x) : Complex.Zero;
        BreakingCurrent breaking = args.Value("ib") switch
        {
            null or "decay" => BreakingCurrent.Decay,
            "conservative" => BreakingCurrent.Conservative,
            string other => throw new UsageException($"--ib is decay or conservative, got '{other}'"),
        };
        if (args.Value("line-temp") is not null && !args.Has("min"))
            throw new UsageException("--line-temp sets the line temperature of minimum levels: give it with --min");

        var request = new FaultRequest
        {
            Buses = buses.Count > 0 ? buses : null,
            Kinds = kinds.Count > 0 ? kinds : FaultRequest.Default.Kinds,
            FaultImpedanceOhm = zf,
            Method = method,
            Level = args.Has("min") ? FaultLevel.Min : FaultLevel.Max,
            Scenario = args.Value("scenario"),
            TMinS = args.Number("tmin") ?? FaultRequest.Default.TMinS,
            DurationS = args.Number("duration") ?? FaultRequest.Default.DurationS,
            Breaking = breaking,
            LineTemperatureC = args.Number("line-temp") ?? FaultRequest.Default.LineTemperatureC,
        };
        request.Validate();

        StageClock? clock = args.Has("timings") ? new StageClock() : null;
        StudyCase study = NetworkLoading.Open(path, context.Err, clock);
        Network network = study.Network;
        study.Model(study.Scenario(request.Scenario));
        clock?.Lap("build");
        FaultResult result = study.Fault(request);
        if (!result.Completed)
        {
            context.Err.WriteLine($"error: {path}: {result.Failure}");
            return ExitCode.NoConvergence;
        }
        clock?.Lap("faults");
        bool json = args.Has("json");
        string? markdown = args.Value("markdown");
        // The readable report is built only when something shows it: --json alone never does.
        ReportDocument? report = !json || markdown is not null
            ? FaultReport.Build(path, network, result, request, request.Scenario, detail: buses.Count > 0)
            : null;
        if (markdown is not null && report is not null)
            ReportFiles.WriteMarkdown(markdown, report);
        clock?.Lap("report");
        if (json) CliJson.Write(context, FaultJson.From(result) with { Timings = clock?.ToJson() });
        else if (report is not null) context.Out.Write(PlainTextReport.Render(report) + clock?.Render());
        return ExitCode.Done;
    }
}
