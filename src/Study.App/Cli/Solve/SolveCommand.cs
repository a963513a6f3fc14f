// `study solve FILE`: Newton-Raphson load flow, as readable tables or the JSON shape of DESIGN.md.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Io;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Cli.Solve;

public sealed class SolveCommand : Command
{
    public override string Name => "solve";
    public override string Summary => "solve the load flow (Newton-Raphson) and report voltages, flows, losses and violations";
    public override string Usage =>
        "study solve FILE [--scenario NAME] [--json] [--csv DIR] [--markdown FILE] [--tolerance X] [--max-iterations N] [--no-q-limits] [--fixed-taps] [--export-jacobian FILE] [--timings]";
    public override IReadOnlyList<string> OptionHelp =>
    [
        "--scenario NAME         scale loads as the named scenario does (default: loads as entered)",
        "--json                  machine-readable result",
        "--csv DIR               write buses.csv, branches.csv, taps.csv, violations.csv into DIR",
        "--markdown FILE         write the report as Markdown, with the inputs, to attach to a study note",
        "--tolerance X           largest P/Q mismatch accepted, pu (default 1e-8)",
        "--max-iterations N      Newton-Raphson iterations per solve (default 30)",
        "--no-q-limits           do not switch PV buses to PQ at their reactive limits",
        "--fixed-taps            hold on-load tap changers at the positions in the file",
        "--export-jacobian FILE  write the Jacobian of the last iteration (Matrix Market)",
        "--timings               report the time of each stage (read, validate, build, solve, report)",
    ];
    protected override IEnumerable<string> ValueOptions => ["scenario", "csv", "markdown", "tolerance", "max-iterations", "export-jacobian"];
    protected override IEnumerable<string> Flags => ["json", "no-q-limits", "fixed-taps", "timings"];

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        args.ExpectPositionals(1);
        var options = new LoadFlowOptions
        {
            TolerancePu = args.Number("tolerance") ?? LoadFlowOptions.Default.TolerancePu,
            MaxIterations = args.Integer("max-iterations") ?? LoadFlowOptions.Default.MaxIterations,
            EnforceQLimits = !args.Has("no-q-limits"),
            RegulateTaps = !args.Has("fixed-taps"),
            CaptureJacobian = args.Value("export-jacobian") is not null,
        };
        if (!(options.TolerancePu > 0)) throw new UsageException("--tolerance must be positive");
        if (options.MaxIterations < 1) throw new UsageException("--max-iterations must be at least 1");

        StageClock? clock = args.Has("timings") ? new StageClock() : null;
        Network network = NetworkLoading.ReadValid(path, context.Err, clock);
        Scenario? scenario = NetworkLoading.PickScenario(network, args.Value("scenario"));
        PerUnitModel model = PerUnitModel.Build(network, scenario);
        clock?.Lap("build");
        LoadFlowResult result = LoadFlowSolver.Solve(model, options);
        clock?.Lap("solve");
        if (clock is not null && result.Timings is LoadFlowTimings t)
        {
            clock.Detail("solve.admittance", t.AdmittanceMs);
            clock.Detail("solve.analyse", t.AnalyseMs);
            clock.Detail("solve.jacobian", t.JacobianMs);
            clock.Detail("solve.factor", t.FactorMs);
            clock.Detail("solve.substitution", t.SolveMs);
        }
        var comparison = PublishedComparison.Compare(network, result);

        if (args.Value("export-jacobian") is string jacobianPath && result.Jacobian is not null)
            MatrixMarket.Write(result.Jacobian, jacobianPath,
                $"load-flow Jacobian at the {(result.Converged ? "converged" : "last")} state of {network.Name}\n"
                + "rows: dP then dQ (dV for PV buses) of the unknown buses; columns: angle then |V|");
        if (args.Value("csv") is string dir)
            LoadFlowCsv.Write(result, dir);
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
