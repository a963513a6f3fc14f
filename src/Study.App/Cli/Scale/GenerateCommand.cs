// `study generate --buses N`: a synthetic meshed network with a known solution, for scale tests and benchmarks.
using Study.App.Cli.Files;
using Study.Core.Io;
using Study.Core.Synthetic;

namespace Study.App.Cli.Scale;

public sealed class GenerateCommand : CliCommand
{
    public override string Name => "generate";
    public override string Summary => "write a synthetic meshed transmission-like network that solves from flat start";
    protected override void Declare(Declaration d) => d
        .Value("buses", "N", "number of buses (required)")
        .Value("seed", "S", "seed of the generator (default 1)")
        .Value("output", "FILE", "the network file to write (required)", "-o");

    protected override int Execute(Arguments args, CommandContext context)
    {
        int buses = args.Integer("buses") ?? throw new UsageException("--buses N is required");
        if (buses < 2 || buses > SyntheticGrid.MostBuses)
            throw new UsageException($"--buses must be between 2 and {SyntheticGrid.MostBuses:N0} (the largest grid that is sure to solve from flat start)");
        string output = args.Value("output") ?? throw new UsageException("-o FILE (where to write the network) is required");
        int seed = args.Integer("seed") ?? 1;
        SyntheticCase c = SyntheticGrid.Generate(new SyntheticGridOptions { Buses = buses, Seed = seed });
        NetworkFile.Write(c.Network, output);
        context.Out.WriteLine($"wrote {output}: {NetworkSummary.Describe(c.Network)}");
        return ExitCode.Done;
    }
}
