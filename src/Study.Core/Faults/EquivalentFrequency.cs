// Impedances at the equivalent frequency f_c of IEC 60909-0 §8.1.3 method C, for the R/X behind κ in meshed networks.
using System.Numerics;

namespace Study.Core.Faults;

/// <summary>
/// Method C (IEC 60909-0:2016 §8.1.3, from memory): compute Z_c = R_c + jX_c at the fault with every
/// reactance taken at f_c = 20 Hz for a 50 Hz system (24 Hz for 60 Hz), then R/X = (R_c/X_c)·(f_c/f).
/// Inductive reactances scale by f_c/f, capacitive susceptances by f_c/f, inductive susceptances by f/f_c.
/// </summary>
public static class EquivalentFrequency
{
    /// <summary>f_c/f: 20/50 and 24/60 are both 0.4.</summary>
    public const double Ratio = 0.4;

    /// <summary>A series impedance R + jX at f_c.</summary>
    public static Complex Series(Complex z, double fcOverF) => new(z.Real, z.Imaginary * fcOverF);

    /// <summary>A shunt admittance G + jB at f_c: capacitive B (&gt; 0) scales with frequency, inductive B (&lt; 0) inversely.</summary>
    public static Complex Parallel(Complex y, double fcOverF) =>
        new(y.Real, y.Imaginary > 0 ? y.Imaginary * fcOverF : y.Imaginary / fcOverF);
}
