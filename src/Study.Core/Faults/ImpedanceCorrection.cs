// IEC 60909-0 impedance correction factors for network transformers (K_T) and generators (K_G).
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// Correction factors of the equivalent-voltage-source method, applied to the positive-, negative-
/// and zero-sequence impedances of the element (not to neutral earthing impedances). Formulas from
/// IEC 60909-0:2016 (from memory): K_T = 0.95·c_max/(1 + 0.6·x_T) (§6.3.3) with x_T the relative
/// reactance on the transformer's own rating; K_G = (U_n/U_rG)·c_max/(1 + x''d·sin φ_rG) (§6.6.1).
/// A generator with its own unit transformer takes the power-station-unit factors instead
/// (<see cref="PowerStationUnits"/>); every other transformer is a network transformer.
/// </summary>
public static class ImpedanceCorrection
{
    /// <summary>Rated power factor taken for K_G when the generator does not state one.</summary>
    public const double DefaultPowerFactor = 0.85;

    public static double NetworkTransformer(double xT, double cMax) => 0.95 * cMax / (1 + 0.6 * xT);

    /// <summary>K_T of a two-winding bank, or null when its rating is unknown (per-unit form): then no correction.</summary>
    public static double? TwoWinding(TransformerRating? rating, double lvBusKv) =>
        rating is null ? null : NetworkTransformer(rating.XPu, SupplyImpedance.CMax(lvBusKv));

    /// <summary>
    /// Scale of each star branch after correcting the pairwise impedances: K_HM, K_HL, K_ML from each
    /// pair's reactance on its rated power (the smaller winding rating of the pair), then the star
    /// formulas (IEC 60909-0 §6.3.3 for three-winding transformers, from memory). All pairs share one
    /// X/R, so each scale is real.
    /// </summary>
    public static (double Hv, double Mv, double Lv) ThreeWinding(ThreeWindingRating t)
    {
        double sinX = t.XOverR / Math.Sqrt(1 + t.XOverR * t.XOverR);
        double Pair(double zPercent, double mvaA, double mvaB, double cMax)
        {
            double rated = Math.Min(mvaA, mvaB);
            double xOwn = zPercent / 100.0 * sinX * (rated > 0 ? rated / t.ZBaseMva : 1.0);
            return NetworkTransformer(xOwn, cMax);
        }
        double cMv = SupplyImpedance.CMax(t.MvBusKv), cLv = SupplyImpedance.CMax(t.LvBusKv);
        double kHm = Pair(t.ZHmPercent, t.MvaHv, t.MvaMv, cMv);
        double kHl = Pair(t.ZHlPercent, t.MvaHv, t.MvaLv, cLv);
        double kMl = Pair(t.ZMlPercent, t.MvaMv, t.MvaLv, cLv);
        double zHm = t.ZHmPercent, zHl = t.ZHlPercent, zMl = t.ZMlPercent;
        double Scale(double corrected, double plain) => plain == 0 ? 1.0 : corrected / plain;
        return (
            Scale(kHm * zHm + kHl * zHl - kMl * zMl, zHm + zHl - zMl),
            Scale(kHm * zHm + kMl * zMl - kHl * zHl, zHm + zMl - zHl),
            Scale(kHl * zHl + kMl * zMl - kHm * zHm, zHl + zMl - zHm));
    }

    /// <summary>K_G; <paramref name="powerFactorAssumed"/> says the 0.85 default was taken.</summary>
    public static double Generator(GeneratorRating g, double busKv, out bool powerFactorAssumed)
    {
        powerFactorAssumed = g.PowerFactor is not (> 0 and <= 1);
        double pf = powerFactorAssumed ? DefaultPowerFactor : g.PowerFactor!.Value;
        double sinPhi = Math.Sqrt(1 - pf * pf);
        double voltageRatio = g.Kv is double kv && kv > 0 && busKv > 0 ? busKv / kv : 1.0;
        return voltageRatio * SupplyImpedance.CMax(busKv) / (1 + (g.XdppPu ?? 0) * sinPhi);
    }
}
