// `study taps FILE --transformer ID`: every tap position in every scenario, and the positions that hold the band.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Cli.Taps;

public sealed class TapsCommand : CliCommand
{
    public override string Name => "taps";
    public override string Summary => "solve every tap position of one transformer and recommend the positions that hold the band";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Value("transformer", "ID", "the transformer whose tap positions are studied (required)")
        .Many("watch", "BUS", "buses that must stay in band (default: the buses the transformer feeds at its lv voltage)")
        .Value("band", "LO,HI", "the band in pu, e.g. 0.97,1.03 (default: each watched bus's vMin..vMax)")
        .Value("scenario", "NAME", "one scenario (default: every scenario of the network)")
        .Flag("all-scenarios", "solve every scenario of the network (the default when it has scenarios)")
        .Flag("hold-other-taps", "hold other on-load tap changers at their file positions (default: they regulate)")
        .Flag("json", "machine-readable result")
        .Value("csv", "DIR", "write positions.csv and recommended.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
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
