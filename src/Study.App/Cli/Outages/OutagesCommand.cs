// `study outages FILE`: N-1 screening — each line and transformer out in turn, ranked by severity.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Cli.Outages;

public sealed class OutagesCommand : CliCommand
{
    public override string Name => "outages";
    public override string Summary => "take each line and transformer out in turn and rank the outages by what they break";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Value("scenario", "NAME", "one scenario (default: every scenario of the network)")
        .Flag("all-scenarios", "screen every scenario of the network (the default when it has scenarios)")
        .Many("elements", "ID", "take out only these lines and transformers (default: every one in service)")
        .Flag("json", "machine-readable result (an array of scenarios when there are several)")
        .Value("csv", "DIR", "write outages.csv and new-violations.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        if (args.Has("all-scenarios") && args.Value("scenario") is not null)
            throw new UsageException("give --scenario NAME or --all-scenarios, not both");

        var request = new OutageScreeningRequest
        {
            ElementIds = args.Values("elements"),
            Scenarios = args.Value("scenario") is string name ? [name] : [],
        };
        request.Validate();
        StudyCase study = NetworkLoading.Open(path, context.Err);
        Network network = study.Network;
        var options = LoadFlowOptions.Default;
        OutageScreeningResult result;
        using (TerminalProgress? progress = TerminalProgress.ForTerminal(context.Err, "outages"))
            result = study.Outages(request, progress);

        if (args.Value("csv") is string dir) OutageCsv.Write(result, dir);
        ReportDocument report = OutageReport.Build(path, network, result, options);
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json"))
        {
            var json = result.Scenarios.Select(OutagesJson.From).ToList();
            if (json.Count == 1) CliJson.Write(context, json[0]);
            else CliJson.Write(context, json);
        }
        else context.Out.Write(PlainTextReport.Render(report));

        var failed = result.Scenarios.Where(s => !s.IntactConverged).ToList();
        foreach (ScenarioScreening s in failed)
            context.Err.WriteLine($"error: {path}: the intact case ({s.Scenario ?? "as entered"}) did not converge: {s.IntactMessage}");
        return failed.Count > 0 ? ExitCode.NoConvergence : ExitCode.Done;
    }
}
