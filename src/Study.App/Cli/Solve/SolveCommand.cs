// `study solve FILE`: Newton-Raphson load flow, as readable tables or the JSON shape in README, "Results as JSON".
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;

namespace Study.App.Cli.Solve;

public sealed class SolveCommand : CliCommand
{
    public override string Name => "solve";
    public override string Summary => "solve the load flow (Newton-Raphson) and report voltages, flows, losses and violations";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Value("scenario", "NAME", "scale loads as the named scenario does (default: as entered)")
        .Flag("json", "machine-readable result")
        .Value("csv", "DIR", "write buses.csv, branches.csv, taps.csv, violations.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note")
        .Value("tolerance", "X", "largest P/Q mismatch accepted, pu (default 1e-8; 1e-13 to 1e-3)")
        .Value("max-iterations", "N", "Newton-Raphson iterations per solve (default 30)")
        .Flag("no-q-limits", "do not switch PV buses to PQ at their reactive limits")
        .Flag("fixed-taps", "hold on-load tap changers at the positions in the file")
        .Value("export-jacobian", "FILE", "write the Jacobian of the last iteration (Matrix Market)")
        .Flag("timings", "report the time of each stage (read, validate, build, solve, report)");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        var options = new LoadFlowOptions
        {
            TolerancePu = args.Number("tolerance") ?? LoadFlowOptions.Default.TolerancePu,
            MaxIterations = args.Integer("max-iterations") ?? LoadFlowOptions.Default.MaxIterations,
            EnforceQLimits = !args.Has("no-q-limits"),
            RegulateTaps = !args.Has("fixed-taps"),
            CaptureJacobian = args.Value("export-jacobian") is not null,
        };
        var request = new SolveRequest { Scenario = args.Value("scenario"), Options = options };
        request.Validate();

        StageClock? clock = args.Has("timings") ? new StageClock() : null;
        StudyCase study = NetworkLoading.Open(path, context.Err, clock);
        Network network = study.Network;
        study.Model(study.Scenario(request.Scenario));
        clock?.Lap("build");
        LoadFlowResult result = study.Solve(request);
        clock?.Lap("solve");
        if (clock is not null && result.Timings is LoadFlowTimings t)
        {
            clock.Detail("solve.admittance", t.AdmittanceMs);
            clock.Detail("solve.analyse", t.AnalyseMs);
            clock.Detail("solve.jacobian", t.JacobianMs);
            clock.Detail("solve.factor", t.FactorMs);
            clock.Detail("solve.substitution", t.SolveMs);
        }
        var comparison = study.CompareWithPublished(result);

        if (args.Value("export-jacobian") is string jacobianPath && result.Jacobian is not null)
            MatrixMarket.Write(result.Jacobian, jacobianPath,
                $"load-flow Jacobian at the {(result.Converged ? "converged" : "last")} state of {network.Name}\n"
                + "rows: dP then dQ (dV for PV buses) of the unknown buses; columns: angle then |V|");
        // A load flow that did not converge has no tables: the previous set stays as it was.
        if (args.Value("csv") is string dir && result.Converged)
            LoadFlowCsv.Write(result, dir);
        else if (args.Value("csv") is string kept)
            context.Err.WriteLine($"note: no tables written to {kept}: the load flow did not converge (any earlier tables there are left as they were)");
        bool json = args.Has("json");
        string? markdown = args.Value("markdown");
        // The readable report is built only when something shows it: --json alone never does.
        ReportDocument? report = !json || markdown is not null
            ? LoadFlowReport.Build(path, network, result, comparison, options)
            : null;
        if (markdown is not null && report is not null)
            ReportFiles.WriteMarkdown(markdown, report);
        clock?.Lap("report");
        if (json)
            CliJson.Write(context, SolveJson.From(result, comparison) with { Timings = clock?.ToJson() });
        else if (report is not null)
            context.Out.Write(PlainTextReport.Render(report) + clock?.Render());
        if (!result.Converged)
        {
            context.Err.WriteLine($"error: {path}: the load flow did not converge: {result.Message}");
            return ExitCode.NoConvergence;
        }
        return ExitCode.Done;
    }
}
