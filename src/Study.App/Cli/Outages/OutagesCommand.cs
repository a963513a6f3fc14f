// `study outages FILE`: N-1 screening — each line and transformer out in turn, ranked by severity.
using Study.App.Cli.Files;
using Study.App.Cli.Shards;
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
        .Flag("json", "machine-readable result (an array of scenarios when there are several; with --shard, the part 'study merge' reads)")
        .Value("csv", "DIR", "write outages.csv and new-violations.csv into DIR")
        .Value("markdown", "FILE", "write the report as Markdown, with the inputs, to attach to a study note")
        .Value("shard", "K/N", "solve only the K-th of N slices of the outages (outage i goes to shard i mod N + 1); 'study merge' joins them")
        .Value("slurm", "N", "run the screening as a Slurm job array of N shards (sbatch --array), wait, merge, and print the result")
        .Value("work-dir", "DIR", "with --slurm: the folder for the job script, the network copy, the parts and the logs (default: a new folder here)")
        .Value("partition", "NAME", "with --slurm: the Slurm partition (sbatch --partition)")
        .Value("time-limit", "TIME", "with --slurm: the time limit of each shard, minutes or [D-]HH:MM:SS (sbatch --time)")
        .Value("memory", "SIZE", "with --slurm: the memory of each shard, such as 4G (sbatch --mem)")
        .Value("cores-per-shard", "N", "with --slurm: the cores each shard solves on (sbatch --cpus-per-task)");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        if (args.Has("all-scenarios") && args.Value("scenario") is not null)
            throw new UsageException("give --scenario NAME or --all-scenarios, not both");
        OutageShard? shard = args.Value("shard") is string k ? OutageShard.Parse(k) : null;
        SlurmOptions? slurm = Slurm(args);
        if (shard is not null && slurm is not null) throw new UsageException("give --shard K/N or --slurm N, not both");

        var request = new OutageScreeningRequest
        {
            ElementIds = args.Values("elements"),
            Scenarios = args.Value("scenario") is string name ? [name] : [],
            Shard = shard,
        };
        request.Validate();
        StudyCase study = NetworkLoading.Open(path, context.Err);
        Network network = study.Network;
        var options = LoadFlowOptions.Default;
        // The elements and scenarios are checked here, so a mistake is refused before anything is submitted.
        int total = OutageElements.Pick(network, request.ElementIds).Count * study.Scenarios(request.Scenarios).Count;
        OutageScreeningResult result;
        if (slurm is not null)
        {
            result = SlurmRun.Run(path, OutageParts.Sha256(path), request, slurm, context.Err);
        }
        else
        {
            using TerminalProgress? progress = TerminalProgress.ForStandardError(context.Err, "outages", (shard ?? OutageShard.Whole).CountOf(total));
            result = study.Outages(request, progress);
        }

        if (args.Value("csv") is string dir) OutageCsv.Write(result, dir);
        ReportDocument report = OutageReport.Build(path, network, result, options);
        if (args.Value("markdown") is string markdown) ReportFiles.WriteMarkdown(markdown, report);
        if (args.Has("json") && shard is not null)
            CliJson.Write(context, OutageParts.Of(result, path, OutageParts.Sha256(path), request, options));
        else if (args.Has("json")) OutagesJson.Write(context, result);
        else context.Out.Write(PlainTextReport.Render(report));
        return OutagesJson.ReportIntactFailures(result, path, context.Err);
    }

    private static SlurmOptions? Slurm(Arguments args)
    {
        string[] passThrough = ["work-dir", "partition", "time-limit", "memory", "cores-per-shard"];
        if (args.Integer("slurm") is not int shards)
        {
            if (passThrough.FirstOrDefault(o => args.Value(o) is not null) is string stray)
                throw new UsageException($"--{stray} goes with --slurm N");
            return null;
        }
        if (shards < 1) throw new UsageException($"--slurm needs at least 1 shard (got {shards})");
        return new SlurmOptions(shards, args.Value("work-dir"), args.Value("partition"), args.Value("time-limit"), args.Value("memory"),
            args.Integer("cores-per-shard"));
    }
}
