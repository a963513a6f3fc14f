// `study compare BEFORE AFTER` or `study compare FILE --scenarios A,B`: bus voltages, branch flows and losses side by side.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Cli.Compare;

public sealed class CompareCommand : CliCommand
{
    public override string Name => "compare";
    public override string Summary => "compare two networks (before and after a change) or two scenarios: voltages, flows, losses, violations";
    protected override void Declare(Declaration d) => d
        .Positional("BEFORE", "the network before the change (or the one FILE whose scenarios --scenarios compares)")
        .Positional("AFTER", "the network after the change, solved alike and matched by id", required: false)
        .Value("scenario", "NAME", "solve both networks in this scenario (default: as entered)")
        .Value("scenarios", "A,B", "with one FILE: compare its scenario A (before) with its scenario B (after)")
        .Flag("json", "machine-readable result")
        .Value("csv", "DIR", "write buses.csv, branches.csv, violations.csv and totals.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string beforePath = args.Positional(0, "BEFORE (a network file)");
        IReadOnlyList<string> pair = args.Values("scenarios");
        StudyCase before, after;
        string afterPath;
        string? beforeScenario, afterScenario;
        if (args.Value("scenarios") is not null)
        {
            if (args.Value("scenario") is not null) throw new UsageException("give --scenario NAME or --scenarios A,B, not both");
            if (pair.Count != 2) throw new UsageException("--scenarios needs two scenario names separated by a comma, e.g. winter-peak,summer-night");
            before = after = NetworkLoading.Open(beforePath, context.Err);
            afterPath = beforePath;
            (beforeScenario, afterScenario) = (pair[0], pair[1]);
        }
        else
        {
            afterPath = args.Positional(1, "AFTER (a network file), or --scenarios A,B to compare two scenarios of one file");
            before = NetworkLoading.Open(beforePath, context.Err);
            after = NetworkLoading.Open(afterPath, context.Err);
            beforeScenario = afterScenario = args.Value("scenario");
        }

        var options = LoadFlowOptions.Default;
        CaseComparisonResult result = StudyCase.Compare(before, beforeScenario, after, afterScenario, options);
        // The names as the networks spell them, for the report's labels.
        beforeScenario = before.Scenario(beforeScenario)?.Name;
        afterScenario = after.Scenario(afterScenario)?.Name;
        var beforeSide = new CompareSide(beforePath, before.Network.Name, beforeScenario);
        var afterSide = new CompareSide(afterPath, after.Network.Name, afterScenario);
        ReportDocument report = CompareReport.Build(beforeSide, afterSide, result, options);
        bool converged = result.BeforeConverged && result.AfterConverged;
        if (converged && args.Value("csv") is string dir) CompareCsv.Write(result, dir);
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json")) CliJson.Write(context, CompareJson.From(result, beforeSide.Label, afterSide.Label));
        else context.Out.Write(PlainTextReport.Render(report));
        if (converged) return ExitCode.Done;
        if (!result.BeforeConverged) context.Err.WriteLine($"error: {beforePath}: the load flow did not converge: {result.BeforeMessage}");
        if (!result.AfterConverged) context.Err.WriteLine($"error: {afterPath}: the load flow did not converge: {result.AfterMessage}");
        return ExitCode.NoConvergence;
    }
}
