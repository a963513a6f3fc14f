// `study merge PART...`: the parts of a sharded outage screening joined into the result one run gives.
using Study.App.Cli.Outages;
using Study.App.Reports;
using Study.Core.LoadFlow;
using Study.Core.Studies;

namespace Study.App.Cli.Shards;

public sealed class MergeCommand : CliCommand
{
    public override string Name => "merge";
    public override string Summary => "join the parts of a sharded outage screening (outages --shard K/N --json) into one ranking";
    protected override void Declare(Declaration d) => d
        .PositionalMany("PART", "the parts, one per shard, in any order")
        .Flag("json", "the merged result exactly as 'study outages --json' prints it")
        .Value("csv", "DIR", "write outages.csv and new-violations.csv into DIR");

    protected override int Execute(Arguments args, CommandContext context)
    {
        var (result, header) = OutageParts.Merge(args.Remaining());
        var options = LoadFlowOptions.Default with
        {
            TolerancePu = header.Options.TolerancePu, MaxIterations = header.Options.MaxIterations,
            MaxControlRounds = header.Options.MaxControlRounds, EnforceQLimits = header.Options.EnforceQLimits,
            RegulateTaps = header.Options.RegulateTaps,
        };
        if (args.Value("csv") is string dir) OutageCsv.Write(result, dir);
        if (args.Has("json")) OutagesJson.Write(context, result);
        else context.Out.Write(PlainTextReport.Render(OutageReport.Merged(header.Network, header.NetworkSha256, header.Shards, result, options)));
        return OutagesJson.ReportIntactFailures(result, header.Network, context.Err);
    }
}
