// Ordering, symbolic analysis, factorisation, values-only refactorisation and solves of the Jacobian and Y-bus.
using System.Numerics;
using BenchmarkDotNet.Attributes;
using Study.Core.Numerics;

namespace Study.Bench;

[MemoryDiagnoser]
public class LuBenchmarks
{
    private KernelCase c = null!;
    private SparseLu<double> jacobianLu = null!;
    private SparseLu<Complex> admittanceLu = null!;
    private double[] rhs = [];
    private int[] blockOf = [];
    private readonly int[] diagonalRow = new int[1];
    private readonly Complex[] entry = new Complex[1];

    [Params(1000, 10000)]
    public int Buses { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        c = KernelCase.Of(Buses);
        jacobianLu = SparseLu<double>.Analyse(c.Jacobian);
        jacobianLu.Factor(c.Jacobian);
        admittanceLu = SparseLu<Complex>.Analyse(c.Admittance);
        admittanceLu.Factor(c.Admittance);
        rhs = new double[c.Jacobian.Cols];
        int m = c.Jacobian.Cols / 2;
        blockOf = new int[2 * m];
        for (int k = 0; k < m; k++) blockOf[k] = blockOf[m + k] = k;
    }

    [Benchmark]
    public LuSymbolic JacobianAnalyseAmd() => LuSymbolic.Analyse(c.Jacobian);

    [Benchmark]
    public int[] JacobianBlockOrdering() => BlockOrdering.Order(c.Jacobian, blockOf.Length / 2, blockOf);

    [Benchmark]
    public void JacobianFactor() => jacobianLu.Factor(c.Jacobian);

    [Benchmark]
    public void JacobianRefactor() => jacobianLu.Refactor(c.Jacobian);

    [Benchmark]
    public void JacobianSolve()
    {
        Array.Fill(rhs, 1.0);
        jacobianLu.Solve(rhs);
    }

    [Benchmark]
    public void AdmittanceFactor() => admittanceLu.Factor(c.Admittance);

    [Benchmark]
    public Complex AdmittanceDiagonalOfInverse()
    {
        Complex sum = Complex.Zero;
        for (int k = 0; k < c.Admittance.Cols; k++)
        {
            diagonalRow[0] = k;
            admittanceLu.InverseEntries(k, diagonalRow, entry);
            sum += entry[0];
        }
        return sum;
    }
}
