// The two-port admittances of one π branch with an ideal off-nominal transformer at its From end.
using System.Numerics;
using Study.Core.Units;

namespace Study.Core.Admittance;

/// <summary>
/// I_from = Yff·V_from + Yft·V_to and I_to = Ytf·V_from + Ytt·V_to for a π branch behind an ideal
/// ratio a = t·e^{jφ}:1 at the From terminal (the standard branch model of load-flow texts, e.g.
/// Grainger &amp; Stevenson, Power System Analysis, §9.6). A magnetising admittance sits directly at
/// the From terminal.
/// </summary>
public readonly record struct BranchAdmittance(Complex Yff, Complex Yft, Complex Ytf, Complex Ytt)
{
    /// <summary>The branch with its own ratio.</summary>
    public static BranchAdmittance Of(PuBranch branch, bool includeCharging = true, bool includeMagnetising = true) =>
        Of(branch.Z, includeCharging ? branch.B : 0, branch.Ratio, branch.ShiftRad,
           includeMagnetising ? branch.MagnetisingY : Complex.Zero);

    public static BranchAdmittance Of(Complex z, double bTotal, double ratio, double shiftRad, Complex magnetising)
    {
        Complex ys = 1.0 / z;
        Complex halfCharging = new(0, bTotal / 2);
        Complex a = Complex.FromPolarCoordinates(ratio, shiftRad);
        Complex ytt = ys + halfCharging;
        Complex yff = ytt / (ratio * ratio) + magnetising;
        Complex yft = -ys / Complex.Conjugate(a);
        Complex ytf = -ys / a;
        return new BranchAdmittance(yff, yft, ytf, ytt);
    }
}
