// `study bench`: build and solve generated networks of several sizes and print where the time goes.
using System.Diagnostics;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Synthetic;
using Study.Core.Units;
using Study.App.Reports;

namespace Study.App.Cli.Scale;

public sealed class BenchCommand : CliCommand
{
    public override string Name => "bench";
    public override string Summary => "time generation, model build, load flow and the all-bus 3ph fault scan on synthetic networks of several sizes";
    protected override void Declare(Declaration d) => d
        .Many("sizes", "N", "bus counts of the generated networks (default 1000,10000,100000)")
        .Value("seed", "S", "seed of the generator (default 1)")
        .Value("repeat", "N", "solves per size, the best one reported (default 3)")
        .Flag("no-faults", "skip the all-bus three-phase fault scan");

    /// <summary>The largest network `study generate` makes (2,000,000 buses): a bench beyond it would only exhaust memory.</summary>
    private const int MostBuses = 2_000_000;

    /// <summary>More repeats than this measure nothing new; the best of a few is the figure reported.</summary>
    private const int MostRepeats = 100;

    protected override int Execute(Arguments args, CommandContext context)
    {
        var sizes = args.Values("sizes").Select(s => int.TryParse(s, out int v) && v >= 2 ? v
            : throw new UsageException($"--sizes takes whole numbers of buses, 2 or more, got '{s}'")).ToList();
        // Checked before anything is generated, so a slip of a few zeros ends at once instead of filling memory.
        if (sizes.FirstOrDefault(n => n > MostBuses) is int tooMany and > 0)
            throw new UsageException($"--sizes: {tooMany} buses is more than the generator makes ({MostBuses:N0} at most)");
        if (sizes.Count == 0) sizes = [1000, 10000, 100000];
        int seed = args.Integer("seed") ?? 1;
        int repeat = args.Integer("repeat") ?? 3;
        if (repeat < 1 || repeat > MostRepeats) throw new UsageException($"--repeat must be between 1 and {MostRepeats}");

        context.Out.WriteLine($"machine: {Environment.ProcessorCount} cores, {Environment.OSVersion}, .NET {Environment.Version}; best of {repeat} solves, flat start");
        // The engine references no MathNet provider (MathNet is a test-only reference), so there is none to report.
        context.Out.WriteLine("linear algebra: Study.Core.Numerics sparse LU (managed); no MathNet provider in the engine");
        var rows = new List<BenchRow>();
        foreach (int n in sizes)
        {
            long t0 = Stopwatch.GetTimestamp();
            SyntheticCase c = SyntheticGrid.Generate(new SyntheticGridOptions { Buses = n, Seed = seed });
            double generateMs = Stopwatch.GetElapsedTime(t0).TotalMilliseconds;
            long t1 = Stopwatch.GetTimestamp();
            PerUnitModel model = PerUnitModel.Build(c.Network);
            double buildMs = Stopwatch.GetElapsedTime(t1).TotalMilliseconds;
            LoadFlowResult? best = null;
            for (int k = 0; k < repeat; k++)
            {
                LoadFlowResult r = LoadFlowSolver.Solve(model);
                if (best is null || r.Timings!.TotalMs < best.Timings!.TotalMs) best = r;
            }
            double? error = best!.Converged ? best.Buses.Select((b, i) => Math.Abs(b.VPu - c.VoltagePu[i])).Max() : null;
            double? scan = null;
            if (!args.Has("no-faults"))
            {
                var request = new FaultRequest { Kinds = [FaultKind.ThreePhase] };
                double bestScan = double.MaxValue;
                for (int k = 0; k < repeat; k++)
                {
                    long ts = Stopwatch.GetTimestamp();
                    FaultStudy.Run(model, request);
                    bestScan = Math.Min(bestScan, Stopwatch.GetElapsedTime(ts).TotalMilliseconds);
                }
                scan = bestScan;
            }
            rows.Add(new BenchRow(n, model.Branches.Count, generateMs, buildMs, best, error, scan));
        }
        context.Out.Write(PlainTextReport.Table(ReportTable.Of(CommandColumns.Bench, rows)));
        context.Out.WriteLine($"peak working set: {Process.GetCurrentProcess().PeakWorkingSet64 / (1024.0 * 1024):0} MiB");
        return ExitCode.Done;
    }
}
