// Admittance matrix assembly and one whole load flow (Jacobian assembly happens inside it, every iteration).
using BenchmarkDotNet.Attributes;
using Study.Core.Admittance;
using Study.Core.LoadFlow;

namespace Study.Bench;

[MemoryDiagnoser]
public class AssemblyBenchmarks
{
    private KernelCase c = null!;

    [Params(1000, 10000)]
    public int Buses { get; set; }

    [GlobalSetup]
    public void Setup() => c = KernelCase.Of(Buses);

    [Benchmark]
    public AdmittanceMatrix Admittance() => new(c.Model);

    [Benchmark]
    public LoadFlowResult LoadFlowFlatStart() => LoadFlowSolver.Solve(c.Model);
}
