// `study start FILE --motor ID`: the voltage at every bus at the instant one or more motors start.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Studies;

namespace Study.App.Cli.Start;

public sealed class StartCommand : CliCommand
{
    public override string Name => "start";
    public override string Summary => "motor starting: the voltage dip at every bus and whether the started motors get the voltage they need";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file")
        .Many("motor", "ID", "the motors started together (required; all units of each)")
        .Value("min-terminal-pu", "PU", "the voltage a started motor needs at its bus, pu (default 0.80)")
        .Many("watch", "BUS", "buses whose dip the report lists on their own")
        .Value("scenario", "NAME", "the scenario of the pre-start load flow (default: the loads as entered)")
        .Flag("json", "machine-readable result")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs and the caution, to attach to a study note");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file)");
        IReadOnlyList<string> motors = args.Values("motor");
        if (motors.Count == 0) throw new UsageException("--motor ID is required (the motors started together)");
        var request = new MotorStartRequest
        {
            Motors = motors,
            MinTerminalPu = args.Number("min-terminal-pu") ?? 0.80,
            WatchBuses = args.Values("watch"),
            Scenario = args.Value("scenario"),
        };
        request.Validate();
        StudyCase study = NetworkLoading.Open(path, context.Err);
        MotorStartResult result = study.Start(request);
        if (!result.Completed)
        {
            context.Err.WriteLine($"error: {path}: {result.Failure}");
            return ExitCode.NoConvergence;
        }
        var report = StartReport.Build(path, study.Network, result, request);
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json")) CliJson.Write(context, StartJson.From(result));
        else context.Out.Write(PlainTextReport.Render(report));
        return ExitCode.Done;
    }
}
