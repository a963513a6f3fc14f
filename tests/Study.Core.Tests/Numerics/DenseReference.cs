// The reference the sparse LU is held against: MathNet.Numerics dense LU
// (DEVELOPERS.md, Outside references).
using MathNet.Numerics.LinearAlgebra;
using Complex = System.Numerics.Complex;
// Aliases keep MathNet's Vector<T> apart from System.Numerics.Vector<T>.
using ComplexVector = MathNet.Numerics.LinearAlgebra.Vector<System.Numerics.Complex>;
using RealVector = MathNet.Numerics.LinearAlgebra.Vector<double>;

namespace Study.Core.Tests.Numerics;

internal static class DenseReference
{
    public static double[] Solve(double[,] a, double[] b) =>
        Matrix<double>.Build.DenseOfArray(a).LU().Solve(RealVector.Build.DenseOfArray(b)).ToArray();

    public static Complex[] Solve(Complex[,] a, Complex[] b) =>
        Matrix<Complex>.Build.DenseOfArray(a).LU().Solve(ComplexVector.Build.DenseOfArray(b)).ToArray();

    public static double[] SolveTransposed(double[,] a, double[] b) =>
        Matrix<double>.Build.DenseOfArray(a).Transpose().LU().Solve(RealVector.Build.DenseOfArray(b)).ToArray();

    public static Complex[] SolveTransposed(Complex[,] a, Complex[] b) =>
        Matrix<Complex>.Build.DenseOfArray(a).Transpose().LU().Solve(ComplexVector.Build.DenseOfArray(b)).ToArray();

    public static double[,] Inverse(double[,] a) => Matrix<double>.Build.DenseOfArray(a).Inverse().ToArray();

    public static Complex[,] Inverse(Complex[,] a) => Matrix<Complex>.Build.DenseOfArray(a).Inverse().ToArray();
}
