// Network feeder impedance of a supply point from its declared fault level (IEC 60909-0).
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>Which declared fault level of the supply point to use.</summary>
public enum FaultLevel
{
    Max,
    Min,
}

/// <summary>Positive- and zero-sequence feeder impedance; the ohm values are null when the bus kV is not stated.</summary>
public sealed record SupplyImpedanceResult(
    double ScMva, double C, double XOverR, double Z0Z1,
    Complex Z1Pu, Complex Z0Pu, Complex? Z1Ohm, Complex? Z0Ohm, IReadOnlyList<DerivationStep> Steps);

/// <summary>
/// Z_Q = c · U_nQ² / S''kQ, R_Q = Z_Q / √(1 + (X/R)²), X_Q = R_Q · X/R; Z0 = (Z0/Z1) · Z1
/// (IEC 60909-0:2016, network feeders, from memory). Per unit: z_Q = c · S_base / S''kQ.
/// For fault studies only; the load flow holds the supply as a slack source.
/// </summary>
public static class SupplyImpedance
{
    /// <summary>X/R taken when none is given: R_Q = 0.1 · X_Q (IEC 60909-0, feeders without data, from memory).</summary>
    public const double DefaultXOverR = 10.0;

    /// <summary>Voltage factor c_max: 1.10 above 1 kV, 1.05 at or below (IEC 60909-0 Table 1, from memory).</summary>
    public static double CMax(double unKv) => unKv > 1.0 || unKv == 0 ? 1.10 : 1.05;

    /// <summary>Voltage factor c_min: 1.00 above 1 kV, 0.95 at or below (IEC 60909-0 Table 1, from memory).</summary>
    public static double CMin(double unKv) => unKv > 1.0 || unKv == 0 ? 1.00 : 0.95;

    /// <exception cref="InputException">The fault level needed is missing or not positive.</exception>
    public static SupplyImpedanceResult Convert(Supply supply, Bus bus, double baseMva, double c, FaultLevel level) =>
        Convert(supply.Id, SupplyFaultData.Of(supply), bus.Kv, baseMva, c, level);

    /// <summary>The same from compiled data: <paramref name="busKv"/> is the supply bus's base kV (0 when not stated).</summary>
    /// <exception cref="InputException">The fault level needed is missing or not positive.</exception>
    public static SupplyImpedanceResult Convert(string supplyId, SupplyFaultData supply, double busKv, double baseMva, double c, FaultLevel level)
    {
        double? declared = level == FaultLevel.Max ? supply.ScMvaMax : supply.ScMvaMin ?? supply.ScMvaMax;
        string field = level == FaultLevel.Max ? "scMvaMax" : "scMvaMin";
        if (declared is null)
            throw new InputException($"{field} is missing: the supply's fault level is needed for fault studies", elementId: supplyId);
        if (!(declared > 0))
            throw new InputException($"{field} must be positive (got {N(declared.Value)})", elementId: supplyId);

        var d = new Derivation();
        double sk = level == FaultLevel.Min && supply.ScMvaMin is null
            ? d.Assumed("S''kQ", $"scMvaMin not given: = scMvaMax = {N(declared.Value)}", declared.Value, "MVA", "scMvaMin defaults to scMvaMax (default, not data)")
            : d.Step("S''kQ", $"{field} given", declared.Value, "MVA");
        d.Step("c", level == FaultLevel.Max ? "c_max" : "c_min", c, "");
        double xr = supply.XOverR is double given
            ? d.Step("X/R", "xr given", given, "")
            : d.Assumed("X/R", $"= {N(DefaultXOverR)}", DefaultXOverR, "", "xr not given: R_Q = 0.1 · X_Q assumed (IEC 60909-0, from memory)");
        double z0z1 = supply.Z0Z1 is double ratio
            ? d.Step("Z0/Z1", "z0z1 given", ratio, "")
            : d.Assumed("Z0/Z1", "= 1", 1.0, "", "z0z1 not given: taken as 1 (default, not data)");

        double zPu = d.Step("|z_Q|", $"c · S_base / S''kQ = {N(c)} · {N(baseMva)} / {N(sk)}", c * baseMva / sk, "pu");
        double rPu = d.Step("r_Q", $"|z_Q| / √(1 + (X/R)²) = {N(zPu)} / √(1 + {N(xr)}²)", zPu / Math.Sqrt(1 + xr * xr), "pu");
        double xPu = d.Step("x_Q", $"r_Q · X/R = {N(rPu)} · {N(xr)}", rPu * xr, "pu");
        var z1Pu = new Complex(rPu, xPu);
        var z0Pu = z1Pu * z0z1;
        d.Step("|z0_Q|", $"Z0/Z1 · |z_Q| = {N(z0z1)} · {N(zPu)}", z0Pu.Magnitude, "pu");

        Complex? z1Ohm = null, z0Ohm = null;
        if (busKv > 0)
        {
            double zOhm = d.Step("|Z_Q|", $"c · U_n² / S''kQ = {N(c)} · {N(busKv)}² / {N(sk)}", c * busKv * busKv / sk, "ohm");
            double rOhm = d.Step("R_Q", $"|Z_Q| / √(1 + (X/R)²) = {N(zOhm)} / √(1 + {N(xr)}²)", zOhm / Math.Sqrt(1 + xr * xr), "ohm");
            double xOhm = d.Step("X_Q", $"R_Q · X/R = {N(rOhm)} · {N(xr)}", rOhm * xr, "ohm");
            z1Ohm = new Complex(rOhm, xOhm);
            z0Ohm = z1Ohm * z0z1;
        }
        return new SupplyImpedanceResult(sk, c, xr, z0z1, z1Pu, z0Pu, z1Ohm, z0Ohm, d.ToList());
    }
}
