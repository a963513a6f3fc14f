// The magnitude |x| that pivot choices compare, for any scalar the solvers are instantiated with.
using System.Numerics;
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

/// <summary>Scalar helpers shared by the generic sparse routines.</summary>
internal static class Scalar
{
    /// <summary>|x| as a double: absolute value for reals, modulus for complex numbers.</summary>
    /// <remarks>
    /// The type tests are constants for each value-type instantiation, so the JIT keeps only one branch;
    /// the fallback serves any other scalar through generic math.
    /// </remarks>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Magnitude<T>(T x) where T : INumberBase<T>
    {
        if (typeof(T) == typeof(double)) return Math.Abs(Unsafe.As<T, double>(ref x));
        if (typeof(T) == typeof(Complex)) return Complex.Abs(Unsafe.As<T, Complex>(ref x));
        return double.CreateTruncating(T.Abs(x));
    }
}
