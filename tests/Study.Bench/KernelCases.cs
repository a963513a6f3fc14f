// The matrices the kernel benchmarks run on: the load-flow Jacobian and the admittance matrix of a generated network.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.LoadFlow;
using Study.Core.Numerics;
using Study.Core.Synthetic;
using Study.Core.Units;

namespace Study.Bench;

/// <summary>A generated network's per-unit model, its Y-bus and its flat-start-solved Jacobian.</summary>
internal sealed record KernelCase(PerUnitModel Model, CscMatrix<Complex> Admittance, CscMatrix<double> Jacobian)
{
    public static KernelCase Of(int buses)
    {
        SyntheticCase c = SyntheticGrid.Generate(new SyntheticGridOptions { Buses = buses, Seed = 1 });
        PerUnitModel model = PerUnitModel.Build(c.Network);
        LoadFlowResult r = LoadFlowSolver.Solve(model, LoadFlowOptions.Default with { CaptureJacobian = true });
        var y = new AdmittanceMatrix(model);
        return new KernelCase(model, y.Matrix, r.Jacobian ?? throw new InvalidOperationException("no Jacobian captured"));
    }
}
