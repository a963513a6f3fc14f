// The Z-bus diagonal from one sparse factorisation against a dense inverse (MathNet.Numerics).
using MathNet.Numerics.LinearAlgebra;
using Study.Core.Faults;
using Study.Core.Units;
using Complex = System.Numerics.Complex;

namespace Study.Core.Tests.Faults;

public class ZBusTests
{
    // DEVELOPERS.md, Outside references: MathNet.Numerics dense linear algebra as the reference.
    // The IEEE 14-bus case (University of Washington archive) carries no machine data: x''d = 0.25 pu
    // on 100 MVA is ASSUMED for every generator here, not published data.
    [Fact]
    public void Ieee14_thevenin_impedances_match_the_dense_inverse_of_the_admittance_matrix()
    {
        var case14 = TestNetworks.Ieee14;
        var network = case14 with { Generators = case14.Generators.Select(g => g with { XdppPu = 0.25, Mva = 100, Xr = 40 }).ToList() };
        var model = PerUnitModel.Build(network);
        var notes = new List<string>();
        var networks = SequenceNetworks.Build(model, FaultMethod.Iec60909, FaultLevel.Max, zeroRequired: false, voltagePu: null, notes);

        var y = networks.Positive.Admittance.Matrix;
        int n = y.Rows;
        var dense = new Complex[n, n];
        for (int j = 0; j < n; j++)
            for (int p = y.ColPtr[j]; p < y.ColPtr[j + 1]; p++) dense[y.RowIdx[p], j] += y.Values[p];
        var inverse = Matrix<Complex>.Build.DenseOfArray(dense).Inverse();

        var result = FaultStudy.Run(model, new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        Assert.Equal(14, result.Faults.Count);
        foreach (ShortCircuitLevel f in result.Faults)
        {
            int k = model.BusIndex[f.Bus];
            Complex expected = inverse[k, k];
            Assert.True((f.Z1Pu!.Value - expected).Magnitude <= 1e-10 * expected.Magnitude,
                $"bus {f.Bus}: sparse {f.Z1Pu} against dense {expected}");
            // Per-unit-only case: kA and ohm are "not stated", per unit is given.
            Assert.Null(f.IkKa);
            Assert.Null(f.Z1Ohm);
            Assert.Equal(1.10 / expected.Magnitude, f.IkPu, 1e-9 * f.IkPu);
        }
    }
}
