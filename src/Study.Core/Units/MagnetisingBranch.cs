// Magnetising (no-load) admittance of a transformer from its no-load test, on the system base.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// The shunt branch G − jB at the hv terminal from i0 % and P0 (open-circuit test, any transformer text).
/// </summary>
internal static class MagnetisingBranch
{
    /// <summary>
    /// Derivation. On one unit's own base (S_r, U_r = rated hv kV) the no-load test at rated voltage
    /// gives |y| = i0 % / 100 and g = P0 / S_r (P0 in MW per unit), so b = √(|y|² − g²).
    /// In siemens Y = y · S_r / U_r². Per unit of the system base at the hv bus (base kV U_bus):
    /// Y_sys = Y · U_bus² / S_base = y · (S_r / S_base) · (U_bus / U_r)²; n parallel units multiply it by n.
    /// So G_sys = n · P0 / S_base · (U_bus / U_r)²: the bank's iron loss at rated voltage, as it should be.
    /// </summary>
    public static Complex Convert(Derivation d, NoLoadLoss noLoad, double mva, int units, double ratedHvKv, double hvBusKv,
        double baseMva, string elementId)
    {
        double y = d.Step("|y_m| (own base)", $"i0Percent / 100 = {N(noLoad.I0Percent)} / 100", noLoad.I0Percent / 100.0, "pu");
        double g = d.Step("g_m (own base)", $"p0Kw / 1000 / mva = {N(noLoad.P0Kw)} / 1000 / {N(mva)}", noLoad.P0Kw / 1000.0 / mva, "pu");
        if (g > y * (1 + 1e-12))
            throw new InputException(
                $"no-load loss p0Kw {N(noLoad.P0Kw)} kW exceeds what i0Percent {N(noLoad.I0Percent)} % allows ({N(y * mva * 1000)} kW)",
                elementId: elementId);
        double b = d.Step("b_m (own base)", $"√(|y_m|² − g_m²) = √({N(y)}² − {N(g)}²)", Math.Sqrt(Math.Max(0.0, y * y - g * g)), "pu");
        double k = d.Step("magnetising base change", $"(mva · units / S_base) · (kV_hv bus / hvKv)² = ({N(mva)} · {units} / {N(baseMva)}) · ({N(hvBusKv)} / {N(ratedHvKv)})²",
            mva * units / baseMva * Math.Pow(hvBusKv / ratedHvKv, 2), "");
        double gSys = d.Step("G_m", $"g_m · factor = {N(g)} · {N(k)}", g * k, "pu");
        double bSys = d.Step("B_m", $"b_m · factor = {N(b)} · {N(k)} (inductive, Y_m = G_m − jB_m)", b * k, "pu");
        return new Complex(gSys, -bSys);
    }
}
