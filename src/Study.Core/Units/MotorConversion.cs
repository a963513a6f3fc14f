// A motor's nameplate to the system base: its running load for the load flow, its impedance for fault
// studies (IEC 60909-0) and its locked-rotor impedance for a start.
using System.Numerics;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// A motor (all its units together) in per unit on the system base at its bus: the running load P + jQ
/// (scenario scale applied), the fault impedance Z_M with its R/X, the locked-rotor impedance Z_LR and
/// the rated current, in pu of the bus base current.
/// </summary>
public sealed record MotorConversionResult(
    double P, double Q, double RatedMva, double RatedCurrentPu, Complex ZPu, double ROverX, Complex LockedRotorZPu,
    double CurrentRatio, double MwPerPolePair, bool LowVoltage, IReadOnlyList<DerivationStep> Steps);

/// <summary>
/// Running load P = mw·loadPercent/100/efficiency·units, Q = P·tan φ_r (common practice). Fault model
/// (IEC 60909-0:2016 §6.8, from memory): Z_M = (1/(I_LR/I_rM))·U_rM²/S_rM with S_rM = P_rM/(η_r·cos φ_r);
/// R_M/X_M = 0.10 for a motor above 1 kV with P_rM/p ≥ 1 MW, 0.15 above 1 kV below that, 0.42 for a
/// low-voltage group and any motor at or below 1 kV. The locked-rotor impedance has the same magnitude at
/// the locked-rotor power factor. In per unit, z = (1/(I_LR/I_rM))·(S_base/(units·S_rM))·(U_rM/U_bus)².
/// </summary>
public static class MotorConversion
{
    public const double DefaultLoadPercent = 100;
    public const int DefaultPolePairs = 1;
    public const double DefaultLockedRotorPowerFactor = 0.3;

    /// <summary>R_M/X_M of IEC 60909-0 (from memory) for the three classes of motor.</summary>
    public const double HighVoltageLargeROverX = 0.10, HighVoltageSmallROverX = 0.15, LowVoltageROverX = 0.42;

    /// <exception cref="InputException">A nameplate value the conversion needs is missing or not positive, or the bus states no kV.</exception>
    public static MotorConversionResult Convert(Motor m, Bus bus, double baseMva, double loadScale = 1.0, bool recordSteps = true)
    {
        const string hint = "a motor's nameplate needs the bus kv";
        double busKv = BaseQuantities.RequireKv(bus, m.Id, hint);
        double mw = BaseQuantities.RequirePositive(m.Mw, "mw", m.Id);
        double kv = BaseQuantities.RequirePositive(m.Kv, "kv", m.Id);
        double pf = BaseQuantities.RequirePositive(m.PowerFactor, "powerFactor", m.Id);
        double eta = BaseQuantities.RequirePositive(m.Efficiency, "efficiency", m.Id);
        double ratio = BaseQuantities.RequirePositive(m.LockedRotor?.CurrentRatio, "lockedRotor.currentRatio", m.Id);
        if (m.Units < 1) throw new InputException($"units must be at least 1 (got {m.Units})", elementId: m.Id);
        if (pf > 1 || eta > 1) throw new InputException("powerFactor and efficiency must be at most 1", elementId: m.Id);

        var d = new Derivation(recordSteps);
        int units = m.Units;
        double load = m.LoadPercent is double given
            ? d.Step("load", "loadPercent given", given, "%")
            : d.Assumed("load", $"= {N(DefaultLoadPercent)}", DefaultLoadPercent, "%", "loadPercent not given: runs at rated output (default, not data)");
        int polePairs = m.PolePairs ?? DefaultPolePairs;
        if (m.PolePairs is null)
            d.Assumed("p", $"= {DefaultPolePairs}", DefaultPolePairs, "", "polePairs not given: 1 pole pair taken (default, not data); it sets q and R/X");
        else
            d.Step("p", "polePairs given", polePairs, "");
        double lrPf = m.LockedRotor?.PowerFactor is double lrGiven
            ? d.Step("cos φ_LR", "lockedRotor.powerFactor given", lrGiven, "")
            : d.Assumed("cos φ_LR", $"= {N(DefaultLockedRotorPowerFactor)}", DefaultLockedRotorPowerFactor, "",
                "lockedRotor.powerFactor not given: 0.3 taken (default, not data); it sets the starting current's angle");

        double pMw = d.Step("P (running)", $"mw · load / 100 / efficiency · units = {N(mw)} · {N(load)} / 100 / {N(eta)} · {units}",
            mw * load / 100 / eta * units, "MW");
        double qMvar = d.Step("Q (running)", $"P · tan(acos(powerFactor)) = {N(pMw)} · tan(acos({N(pf)}))",
            pMw * Math.Sqrt(1 - pf * pf) / pf, "Mvar");
        if (loadScale != 1.0) d.Step("load scale", "scenario loadScale", loadScale, "");
        double p = d.Step("P", $"P · scale / S_base = {N(pMw)} · {N(loadScale)} / {N(baseMva)}", pMw * loadScale / baseMva, "pu");
        double q = d.Step("Q", $"Q · scale / S_base = {N(qMvar)} · {N(loadScale)} / {N(baseMva)}", qMvar * loadScale / baseMva, "pu");

        double sr = d.Step("S_rM", $"mw / (efficiency · powerFactor) = {N(mw)} / ({N(eta)} · {N(pf)})", mw / (eta * pf), "MVA");
        double iRated = d.Step("I_rM", $"units · S_rM / (√3 · kv) = {units} · {N(sr)} / (√3 · {N(kv)})", units * sr / (Math.Sqrt(3) * kv), "kA");
        double iBase = baseMva / (Math.Sqrt(3) * busKv);
        double iRatedPu = d.Step("i_rM", $"I_rM / I_base = {N(iRated)} / {N(iBase)}", iRated / iBase, "pu");
        d.Step("|Z_M|", $"(1 / (I_LR/I_rM)) · kv² / S_rM / units = (1 / {N(ratio)}) · {N(kv)}² / {N(sr)} / {units}",
            kv * kv / sr / ratio / units, "ohm");
        double k = d.Step("base change", $"(S_base / (units · S_rM)) · (kv / kV_bus)² = ({N(baseMva)} / ({units} · {N(sr)})) · ({N(kv)} / {N(busKv)})²",
            baseMva / (units * sr) * Math.Pow(kv / busKv, 2), "");
        double zPu = d.Step("|z_M|", $"(1 / (I_LR/I_rM)) · factor = (1 / {N(ratio)}) · {N(k)}", k / ratio, "pu");

        bool lowVoltage = m.LowVoltageGroup || kv <= 1.0;
        double perPolePair = d.Step("P_rM / p", $"mw / p = {N(mw)} / {polePairs}", mw / polePairs, "MW");
        double rOverX = lowVoltage
            ? d.Step("R_M/X_M", m.LowVoltageGroup ? "low-voltage group (IEC 60909-0, from memory)" : "motor at or below 1 kV (IEC 60909-0, from memory)", LowVoltageROverX, "")
            : perPolePair >= 1.0
                ? d.Step("R_M/X_M", "above 1 kV, P_rM/p ≥ 1 MW (IEC 60909-0, from memory)", HighVoltageLargeROverX, "")
                : d.Step("R_M/X_M", "above 1 kV, P_rM/p < 1 MW (IEC 60909-0, from memory)", HighVoltageSmallROverX, "");
        double x = d.Step("x_M", $"|z_M| / √(1 + (R/X)²) = {N(zPu)} / √(1 + {N(rOverX)}²)", zPu / Math.Sqrt(1 + rOverX * rOverX), "pu");
        double r = d.Step("r_M", $"x_M · R/X = {N(x)} · {N(rOverX)}", x * rOverX, "pu");
        double rLr = d.Step("r_LR", $"|z_M| · cos φ_LR = {N(zPu)} · {N(lrPf)}", zPu * lrPf, "pu");
        double xLr = d.Step("x_LR", $"|z_M| · sin φ_LR = {N(zPu)} · {N(Math.Sqrt(1 - lrPf * lrPf))}", zPu * Math.Sqrt(1 - lrPf * lrPf), "pu");
        return new MotorConversionResult(p, q, units * sr, iRatedPu, new Complex(r, x), rOverX, new Complex(rLr, xLr),
            ratio, perPolePair, lowVoltage, d.ToList());
    }
}
