// `study choose FILE --transformer ID --candidates C.json`: each candidate bank in place of one transformer, held to every constraint, ranked by total owning cost.
using Study.App.Cli.Files;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Studies;

namespace Study.App.Cli.Choose;

public sealed class ChooseCommand : CliCommand
{
    public override string Name => "choose";
    public override string Summary => "put each candidate bank in place of a transformer: band, loading, fault duty, outages, losses; rank by total owning cost";

    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Value("transformer", "ID", "the two-winding transformer the candidates replace (required)")
        .Value("candidates", "FILE", "the candidates file (JSON, README \"Choosing a bank\") (required)")
        .Value("profile", "CSV", "a load profile for the energy each bank loses (default: the loss-load factor)")
        .Value("no-load-rate", "X", "capitalised value of 1 kW of no-load loss, money per kW (A; default 0)")
        .Value("load-rate", "Y", "capitalised value of 1 kW of load loss at rated current, money per kW (B; default 0)")
        .Value("loss-load-factor", "F", "average over peak load loss in a year, 0..1, for the annual energy without a profile")
        .Many("scenario", "NAME", "scenarios to hold the band in (default: every scenario of the network)")
        .Many("watch", "BUS", "buses that must stay in band (default: the buses the bank feeds at its lv voltage)")
        .Value("band", "LO,HI", "the band in pu, e.g. 0.97,1.03 (default: each watched bus's vMin..vMax)")
        .Flag("json", "machine-readable result")
        .Value("csv", "DIR", "write candidates.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        string transformer = args.Value("transformer") ?? throw new UsageException("--transformer ID is required");
        string candidatesPath = args.Value("candidates") ?? throw new UsageException("--candidates FILE is required");
        if (args.Value("profile") is null && args.Number("loss-load-factor") is null)
            throw new UsageException("give --profile CSV or --loss-load-factor F for the energy the banks lose in a year");
        var band = args.Pair("band");
        var request = new BankChoiceRequest
        {
            TransformerId = transformer,
            WatchBuses = args.Values("watch"),
            Band = band is { } x ? (x.A, x.B) : null,
            Scenarios = args.Values("scenario"),
            NoLoadRate = args.Number("no-load-rate") ?? 0,
            LoadRate = args.Number("load-rate") ?? 0,
            LossLoadFactor = args.Number("loss-load-factor"),
        };
        request.Validate();
        BankCandidates candidates = CandidatesFile.Read(candidatesPath);
        LoadProfile? profile = args.Value("profile") is string profilePath ? ProfileFile.Read(profilePath) : null;

        StudyCase study = NetworkLoading.Open(path, context.Err);
        BankChoiceResult result = study.Choose(request, candidates, profile);

        ReportDocument report = ChooseReport.Build(path, study.Network, candidatesPath, result);
        if (args.Value("csv") is string dir)
            CsvTable.WriteSet(dir, ("candidates.csv", CsvTable.Of(ChooseColumns.Candidates, ChooseColumns.Rows(result))));
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json")) CliJson.Write(context, ChooseJson.From(result));
        else context.Out.Write(PlainTextReport.Render(report));
        return ExitCode.Done;
    }
}
