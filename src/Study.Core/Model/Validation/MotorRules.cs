// Motor checks: the connection, the nameplate a fault study and a start need, the running load and the starter.
namespace Study.Core.Model.Validation;

internal static class MotorRules
{
    /// <summary>More than this between the motor's rated kV and its bus's base kV is worth a warning.</summary>
    private const double KvTolerance = 0.2;

    public static void Check(ValidationContext context, Motor m)
    {
        ElementScope at = context.At(ElementKind.Motor, m.Id);
        Bus? bus = at.BusRef("bus", m.Bus);
        LockedRotor? lr = m.LockedRotor;
        MotorStarter? starter = m.Starter;
        at.AllFinite(("mw", m.Mw), ("kv", m.Kv), ("powerFactor", m.PowerFactor), ("efficiency", m.Efficiency),
            ("loadPercent", m.LoadPercent), ("lockedRotor.currentRatio", lr?.CurrentRatio), ("lockedRotor.powerFactor", lr?.PowerFactor),
            ("starter.tapPercent", starter?.TapPercent), ("starter.currentLimit", starter?.CurrentLimit));

        Required(at, "mw", m.Mw, "the rated output in MW");
        at.Positive("mw", m.Mw, "the rated output (MW)");
        Required(at, "kv", m.Kv, "the rated voltage in kV");
        bool kvUsable = at.Kv("kv", m.Kv, zeroAllowed: false);
        Required(at, "powerFactor", m.PowerFactor, "the rated power factor (0.85 to 0.9 is usual)");
        Fraction(at, "powerFactor", m.PowerFactor, "a rated power factor", "0.87");
        Required(at, "efficiency", m.Efficiency, "the rated efficiency as a fraction (0.96 for 96 %)");
        Fraction(at, "efficiency", m.Efficiency, "an efficiency", "0.96 for 96 %");
        if (m.PolePairs is int p && p < 1)
            at.Error("polePairs", $"polePairs is {Numbers.Show(p)}: a motor has 1 or more pole pairs (a 4-pole motor has 2)");
        if (m.Units < 1)
            at.Error("units", $"units is {Numbers.Show(m.Units)}: give the number of identical motors, 1 or more");
        at.NotNegative("loadPercent", m.LoadPercent, "the running load");
        if (m.LoadPercent is double load && double.IsFinite(load) && load > 120)
            at.Warning("loadPercent", $"loadPercent {Numbers.Show(load)} is above 120 % of rated output: a percentage, not a fraction or MW?");

        if (lr?.CurrentRatio is not double ratio)
            at.Error("lockedRotor.currentRatio", "lockedRotor.currentRatio is missing: fault studies and starts need the locked-rotor current over rated current (5 to 7 is usual)");
        else if (double.IsFinite(ratio) && ratio <= 1)
            at.Error("lockedRotor.currentRatio", $"lockedRotor.currentRatio is {Numbers.Show(ratio)}: a locked-rotor current is several times the rated current (5 to 7 is usual)");
        else if (double.IsFinite(ratio) && ratio > 12)
            at.Warning("lockedRotor.currentRatio", $"lockedRotor.currentRatio {Numbers.Show(ratio)} is above 12: check it is I_LR/I_rM, not amperes");
        if (lr?.PowerFactor is double lrPf && double.IsFinite(lrPf) && (lrPf <= 0 || lrPf >= 1))
            at.Error("lockedRotor.powerFactor", $"lockedRotor.powerFactor is {Numbers.Show(lrPf)}: a locked-rotor power factor lies between 0 and 1 (0.2 to 0.4 is usual)");

        if (kvUsable && bus is not null)
        {
            if (bus.Kv == 0)
                at.Error("bus", $"bus {bus.Id} states no base kV (kv 0): a motor's nameplate needs the bus kv to be put in per unit");
            else if (bus.Kv > 0 && Plausibility.KvHint(m.Kv!.Value, bus.Kv) is { Length: > 0 } unitSlip)
                at.Error("kv", $"rated kV {Numbers.Show(m.Kv!.Value)} against bus base kV {Numbers.Show(bus.Kv)} (bus {bus.Id}){unitSlip}");
            else if (bus.Kv > 0 && Numbers.RelativeDifference(m.Kv!.Value, bus.Kv) > KvTolerance)
                at.Warning("kv", $"rated kV {Numbers.Show(m.Kv!.Value)} differs from bus base kV {Numbers.Show(bus.Kv)} (bus {bus.Id}) " +
                    $"{Numbers.Difference(m.Kv!.Value, bus.Kv)}: check kv, or connect the motor through its transformer");
        }
        if (m.LowVoltageGroup && m.Kv is double groupKv && double.IsFinite(groupKv) && groupKv > 1)
            at.Warning("lowVoltageGroup", $"a low-voltage group at {Numbers.Show(groupKv)} kV: groups are of small motors at or below 1 kV");
        if (starter is not null) CheckStarter(at, starter, lr?.CurrentRatio);
    }

    private static void CheckStarter(ElementScope at, MotorStarter s, double? ratio)
    {
        if (s.Method == StarterMethod.Autotransformer)
        {
            if (s.TapPercent is not double tap)
                at.Error("starter.tapPercent", "an autotransformer starter needs tapPercent, the voltage it starts on in percent (50 to 80 is usual)");
            else if (double.IsFinite(tap) && (tap <= 0 || tap >= 100))
                at.Error("starter.tapPercent", $"starter.tapPercent is {Numbers.Show(tap)}: an autotransformer tap lies above 0 and below 100 %");
        }
        else if (s.TapPercent is not null)
            at.Warning("starter.tapPercent", "starter.tapPercent is not used: only an autotransformer starter has a tap");
        if (s.Method == StarterMethod.SoftStarter)
        {
            if (s.CurrentLimit is not double limit)
                at.Error("starter.currentLimit", "a soft starter needs currentLimit, the current it holds in multiples of rated (2.5 to 4 is usual)");
            else if (double.IsFinite(limit) && limit <= 0)
                at.Error("starter.currentLimit", $"starter.currentLimit is {Numbers.Show(limit)}: give the held current in multiples of rated, above 0");
            else if (ratio is double r && double.IsFinite(limit) && limit >= r)
                at.Warning("starter.currentLimit", $"starter.currentLimit {Numbers.Show(limit)} is not below the locked-rotor ratio {Numbers.Show(r)}: the starter limits nothing");
        }
        else if (s.CurrentLimit is not null)
            at.Warning("starter.currentLimit", "starter.currentLimit is not used: only a soft starter limits the current");
    }

    private static void Required(ElementScope at, string field, double? value, string what)
    {
        if (value is null) at.Error(field, $"{field} is missing: give {what}");
    }

    /// <summary>A power factor or an efficiency: above 0 and at most 1; a value up to 100 is probably a percentage.</summary>
    private static void Fraction(ElementScope at, string field, double? value, string what, string usual)
    {
        if (value is not double v || !double.IsFinite(v) || (v > 0 && v <= 1)) return;
        string hint = v > 1 && v <= 100 ? $": did you mean {Numbers.Show(v / 100)}?" : $" ({usual})";
        at.Error(field, $"{field} is {Numbers.Show(v)}: {what} lies above 0 and at most 1{hint}");
    }
}
