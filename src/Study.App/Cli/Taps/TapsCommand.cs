// `study taps FILE --transformer ID`: every tap position in every scenario, and the positions that hold the band.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Cli.Taps;

public sealed class TapsCommand : Command
{
    public override string Name => "taps";
    public override string Summary => "solve every tap position of one transformer and recommend the positions that hold the band";
    public override string Usage =>
        "study taps FILE --transformer ID [--watch BUS ...] [--band LO,HI] [--scenario NAME | --all-scenarios] [--hold-other-taps] [--json] [--csv DIR] [--markdown FILE]";
    public override IReadOnlyList<string> OptionHelp =>
    [
        "--transformer ID   the transformer whose tap positions are studied",
        "--watch BUS ...    buses that must stay in band (default: the buses the transformer feeds at its lv voltage)",
        "--band LO,HI       the band in pu, e.g. 0.97,1.03 (default: each watched bus's vMin..vMax)",
        "--scenario NAME    one scenario; --all-scenarios (the default when the network has scenarios) solves each",
        "--hold-other-taps  hold other on-load tap changers at their file positions (default: they regulate)",
        "--json             machine-readable result",
        "--csv DIR          write positions.csv and recommended.csv into DIR",
        "--markdown FILE    write the report as Markdown, with the inputs, to attach to a study note",
    ];
    protected override IEnumerable<string> ValueOptions => ["transformer", "watch*", "band", "scenario", "csv", "markdown"];
    protected override IEnumerable<string> Flags => ["json", "all-scenarios", "hold-other-taps"];

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        args.ExpectPositionals(1);
        string transformer = args.Value("transformer") ?? throw new UsageException("--transformer ID is required");
        var band = args.Pair("band");
        if (args.Has("all-scenarios") && args.Value("scenario") is not null)
            throw new UsageException("give --scenario NAME or --all-scenarios, not both");
        var request = new TapStudyRequest
        {
            TransformerId = transformer,
            WatchBuses = args.Values("watch"),
            Band = band is { } x ? (x.A, x.B) : null,
            Scenarios = args.Value("scenario") is string name ? [name] : [],
            HoldOtherTaps = args.Has("hold-other-taps"),
        };
        request.Validate();

        StudyCase study = NetworkLoading.Open(path, context.Err);
        Network network = study.Network;
        TapStudyResult result = study.Taps(request);
        var report = TapStudyReport.Build(path, network, result, LoadFlowOptions.Default);
        if (args.Value("csv") is string dir) TapStudyCsv.Write(result, dir);
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json")) CliJson.Write(context, TapsJson.From(result));
        else context.Out.Write(PlainTextReport.Render(report));
        return result.Points.All(p => !p.Converged) ? ExitCode.NoConvergence : ExitCode.Done;
    }
}
