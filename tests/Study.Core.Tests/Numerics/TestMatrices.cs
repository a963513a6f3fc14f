// Matrices the Numerics tests run on: random sparse systems that need pivoting, 2-D grids, and
// conversions to dense arrays for the reference solver.
using System.Numerics;
using Study.Core.Numerics;

namespace Study.Core.Tests.Numerics;

internal static class TestMatrices
{
    /// <summary>
    /// A random sparse matrix with a nonsymmetric pattern: column-diagonally-dominant (so nonsingular and
    /// well conditioned), with its rows optionally shuffled so most diagonal entries are zero and the
    /// factorisation has to pivot off the diagonal. Some entries are added twice to exercise summing.
    /// </summary>
    public static CscMatrix<T> RandomSparse<T>(int n, int seed, int offDiagonalPerColumn, bool shuffleRows,
        Func<Random, T> offDiagonal, Func<Random, double, T> diagonalOfMagnitude) where T : INumberBase<T>
    {
        var rng = new Random(seed);
        var rowOf = Enumerable.Range(0, n).ToArray();
        if (shuffleRows) rng.Shuffle(rowOf);
        var builder = new TripletBuilder<T>(n, n);
        for (int j = 0; j < n; j++)
        {
            double columnSum = 0;
            for (int e = 0; e < offDiagonalPerColumn; e++)
            {
                int i = rng.Next(n);
                if (i == j) continue;
                T v = offDiagonal(rng);
                columnSum += Magnitude(v);
                builder.Add(rowOf[i], j, v);
            }
            T d = diagonalOfMagnitude(rng, columnSum + 1 + rng.NextDouble());
            if (rng.Next(4) == 0)
            {
                T half = d / T.CreateChecked(2);
                builder.Add(rowOf[j], j, half);
                builder.Add(rowOf[j], j, d - half);
            }
            else
            {
                builder.Add(rowOf[j], j, d);
            }
        }
        return builder.ToCsc();
    }

    public static CscMatrix<double> RandomReal(int n, int seed, bool shuffleRows, int offDiagonalPerColumn = 4) =>
        RandomSparse(n, seed, offDiagonalPerColumn, shuffleRows,
            rng => rng.NextDouble() * 2 - 1,
            (rng, magnitude) => rng.Next(2) == 0 ? magnitude : -magnitude);

    public static CscMatrix<Complex> RandomComplex(int n, int seed, bool shuffleRows, int offDiagonalPerColumn = 4) =>
        RandomSparse(n, seed, offDiagonalPerColumn, shuffleRows,
            rng => new Complex(rng.NextDouble() * 2 - 1, rng.NextDouble() * 2 - 1),
            (rng, magnitude) => Complex.FromPolarCoordinates(magnitude, rng.NextDouble() * 2 * Math.PI));

    /// <summary>Five-point Laplacian of a side×side grid plus `shift` on the diagonal (4 + shift, −1 off it).</summary>
    public static CscMatrix<double> Grid(int side, double shift = 0.1)
    {
        var builder = new TripletBuilder<double>(side * side, side * side, 5 * side * side);
        for (int r = 0; r < side; r++)
        {
            for (int c = 0; c < side; c++)
            {
                int k = r * side + c;
                builder.Add(k, k, 4 + shift);
                if (r > 0) builder.Add(k, k - side, -1);
                if (r < side - 1) builder.Add(k, k + side, -1);
                if (c > 0) builder.Add(k, k - 1, -1);
                if (c < side - 1) builder.Add(k, k + 1, -1);
            }
        }
        return builder.ToCsc();
    }

    /// <summary>
    /// A nodal admittance matrix of a side×side grid of lines (each y = 1/(r + jx) with random r, x)
    /// with a small capacitive and resistive shunt at every node, unless the network is left floating.
    /// </summary>
    public static CscMatrix<Complex> GridAdmittance(int side, int seed, bool withShunts = true)
    {
        var rng = new Random(seed);
        int n = side * side;
        var builder = new TripletBuilder<Complex>(n, n, 5 * n);
        void Line(int a, int b)
        {
            var y = 1 / new Complex(0.01 + 0.05 * rng.NextDouble(), 0.05 + 0.3 * rng.NextDouble());
            builder.Add(a, a, y);
            builder.Add(b, b, y);
            builder.Add(a, b, -y);
            builder.Add(b, a, -y);
        }
        for (int r = 0; r < side; r++)
        {
            for (int c = 0; c < side; c++)
            {
                int k = r * side + c;
                if (c < side - 1) Line(k, k + 1);
                if (r < side - 1) Line(k, k + side);
                if (withShunts) builder.Add(k, k, new Complex(0.2 + 0.2 * rng.NextDouble(), 0.1 + 0.2 * rng.NextDouble()));
            }
        }
        return builder.ToCsc();
    }

    public static T[,] ToDense<T>(CscMatrix<T> a) where T : INumberBase<T>
    {
        var dense = new T[a.Rows, a.Cols];
        for (int i = 0; i < a.Rows; i++)
            for (int j = 0; j < a.Cols; j++)
                dense[i, j] = T.Zero;
        for (int j = 0; j < a.Cols; j++)
            for (int p = a.ColPtr[j]; p < a.ColPtr[j + 1]; p++)
                dense[a.RowIdx[p], j] += a.Values[p];
        return dense;
    }

    public static T[] RandomVector<T>(int n, int seed, Func<Random, T> entry)
    {
        var rng = new Random(seed);
        var v = new T[n];
        for (int i = 0; i < n; i++) v[i] = entry(rng);
        return v;
    }

    public static double[] RandomReal(int n, int seed) => RandomVector(n, seed, rng => rng.NextDouble() * 2 - 1);

    public static Complex[] RandomComplex(int n, int seed) =>
        RandomVector(n, seed, rng => new Complex(rng.NextDouble() * 2 - 1, rng.NextDouble() * 2 - 1));

    /// <summary>max |x − reference| / max |reference|.</summary>
    public static double RelativeDifference<T>(ReadOnlySpan<T> x, ReadOnlySpan<T> reference) where T : INumberBase<T>
    {
        Assert.Equal(reference.Length, x.Length);
        double diff = 0, scale = 0;
        for (int i = 0; i < x.Length; i++)
        {
            diff = Math.Max(diff, Magnitude(x[i] - reference[i]));
            scale = Math.Max(scale, Magnitude(reference[i]));
        }
        return diff / scale;
    }

    public static double Magnitude<T>(T v) where T : INumberBase<T> => v switch
    {
        double d => Math.Abs(d),
        Complex c => Complex.Abs(c),
        _ => throw new NotSupportedException(typeof(T).Name),
    };

    /// <summary>Same pattern as a with every value scaled by a random factor in [0.5, 1.5].</summary>
    public static CscMatrix<T> WithPerturbedValues<T>(CscMatrix<T> a, int seed) where T : INumberBase<T>
    {
        var rng = new Random(seed);
        var values = new T[a.NonZeros];
        for (int p = 0; p < values.Length; p++) values[p] = a.Values[p] * T.CreateChecked(0.5 + rng.NextDouble());
        return new CscMatrix<T>(a.Rows, a.Cols, a.ColPtr, a.RowIdx, values);
    }
}
