// Fault currents from the three sequence Thevenin impedances (Fortescue), and the phase transform.
using System.Numerics;

namespace Study.Core.Faults;

/// <summary>Sequence components (0, 1, 2) of a phase quantity, phase a the reference.</summary>
public readonly record struct SequenceValues(Complex Zero, Complex Positive, Complex Negative)
{
    /// <summary>a = e^{j120°}.</summary>
    public static readonly Complex A = Complex.FromPolarCoordinates(1, 2 * Math.PI / 3);

    public Complex PhaseA => Zero + Positive + Negative;
    public Complex PhaseB => Zero + A * A * Positive + A * Negative;
    public Complex PhaseC => Zero + A * Positive + A * A * Negative;

    public double LargestPhaseMagnitude => Math.Max(PhaseA.Magnitude, Math.Max(PhaseB.Magnitude, PhaseC.Magnitude));

    /// <summary>Phase index (0 = a, 1 = b, 2 = c) of the largest magnitude.</summary>
    public int LargestPhase
    {
        get
        {
            double a = PhaseA.Magnitude, b = PhaseB.Magnitude, c = PhaseC.Magnitude;
            return a >= b && a >= c ? 0 : b >= c ? 1 : 2;
        }
    }

    public Complex Phase(int index) => index switch { 0 => PhaseA, 1 => PhaseB, _ => PhaseC };
}

/// <summary>
/// Sequence currents into a shunt fault at one bus driven by E behind Z1, Z2, Z0 (null: that
/// sequence network is open at the bus), with fault impedance Z_f (Fortescue; any power-systems text,
/// e.g. Grainger &amp; Stevenson, Power System Analysis, ch. 12):
/// 3ph I1 = E/(Z1 + Zf); slg (phase a) I0 = I1 = I2 = E/(Z1 + Z2 + Z0 + 3Zf);
/// ll (b–c through Zf) I1 = −I2 = E/(Z1 + Z2 + Zf);
/// dlg (b, c joined, to earth through Zf) I1 = E/(Z1 + Z2∥(Z0 + 3Zf)), I2 = −I1·(Z0 + 3Zf)/(Z2 + Z0 + 3Zf),
/// I0 = −I1·Z2/(Z2 + Z0 + 3Zf).
/// </summary>
public static class SymmetricalComponents
{
    public static SequenceValues FaultCurrents(FaultKind kind, Complex e, Complex? z1, Complex? z2, Complex? z0, Complex zf)
    {
        if (z1 is not Complex p) return default;
        switch (kind)
        {
            case FaultKind.ThreePhase:
                return new SequenceValues(Complex.Zero, e / (p + zf), Complex.Zero);
            case FaultKind.LineToEarth:
            {
                if (z2 is not Complex n || z0 is not Complex z) return default;
                Complex i = e / (p + n + z + 3 * zf);
                return new SequenceValues(i, i, i);
            }
            case FaultKind.LineToLine:
            {
                if (z2 is not Complex n) return default;
                Complex i = e / (p + n + zf);
                return new SequenceValues(Complex.Zero, i, -i);
            }
            default:
            {
                if (z2 is not Complex n) return default;
                if (z0 is not Complex z)
                {
                    // No zero-sequence path: the earth connection carries nothing; a bolted b–c fault remains.
                    Complex i = e / (p + n);
                    return new SequenceValues(Complex.Zero, i, -i);
                }
                Complex ze = z + 3 * zf;
                Complex i1 = e / (p + n * ze / (n + ze));
                return new SequenceValues(-i1 * n / (n + ze), i1, -i1 * ze / (n + ze));
            }
        }
    }

    /// <summary>κ = 1.02 + 0.98·e^(−3R/X) (IEC 60909-0:2016 §8.1, from memory); R/X below 0 taken as 0.</summary>
    public static double PeakFactor(double rOverX) => 1.02 + 0.98 * Math.Exp(-3 * Math.Max(rOverX, 0));
}
