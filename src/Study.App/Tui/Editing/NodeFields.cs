// Field lists of buses and of what sits at one bus: loads, shunts, motors, breakers; and scenarios.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>Form and table fields of single-bus elements and scenarios.</summary>
public static class NodeFields
{
    public static IReadOnlyList<ElementField> Bus { get; } =
    [
        Field.Id<Bus>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        // Required: 0 is allowed (a per-unit-only case) but is never what a blank should mean.
        Field.RequiredNumber<Bus>("Base", "kV", e => e.Kv, (e, v) => e with { Kv = v }).Keyed("kv"),
        Field.Number<Bus>("Vmin", "pu", 0.95, e => e.VMin, (e, v) => e with { VMin = v }).Keyed("vMin"),
        Field.Number<Bus>("Vmax", "pu", 1.05, e => e.VMax, (e, v) => e with { VMax = v }).Keyed("vMax"),
        Field.Text<Bus>("Zone", e => e.Zone, (e, v) => e with { Zone = v }).Keyed("zone"),
        Field.Text<Bus>("Name", e => e.Name, (e, v) => e with { Name = v }).Keyed("name"),
        Field.Flag<Bus>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    public static IReadOnlyList<ElementField> Load { get; } =
    [
        Field.Id<Load>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Load>("Bus", e => e.Bus, (e, v) => e with { Bus = v }).Keyed("bus"),
        Field.Number<Load>("P", "MW", 0, e => e.PMw, (e, v) => e with { PMw = v }).Keyed("pMw"),
        Field.Number<Load>("Q", "Mvar", 0, e => e.QMvar, (e, v) => e with { QMvar = v }).Keyed("qMvar"),
        Field.Number<Load>("Const. Z share", "", 0, e => (e.Zip ?? ZipMix.ConstantPower).Z,
            (e, v) => e with { Zip = (e.Zip ?? ZipMix.ConstantPower) with { Z = v } }).Keyed("zip"),
        Field.Number<Load>("Const. I share", "", 0, e => (e.Zip ?? ZipMix.ConstantPower).I,
            (e, v) => e with { Zip = (e.Zip ?? ZipMix.ConstantPower) with { I = v } }).Keyed("zip"),
        Field.Number<Load>("Const. P share", "", 1, e => (e.Zip ?? ZipMix.ConstantPower).P,
            (e, v) => e with { Zip = (e.Zip ?? ZipMix.ConstantPower) with { P = v } }).Keyed("zip"),
        Field.Flag<Load>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    public static IReadOnlyList<ElementField> Shunt { get; } =
    [
        Field.Id<Shunt>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Shunt>("Bus", e => e.Bus, (e, v) => e with { Bus = v }).Keyed("bus"),
        Field.Number<Shunt>("Q (+cap)", "Mvar", 0, e => e.QMvar, (e, v) => e with { QMvar = v }).Keyed("qMvar"),
        Field.Number<Shunt>("P", "MW", 0, e => e.PMw, (e, v) => e with { PMw = v }).Keyed("pMw"),
        Field.Flag<Shunt>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    /// <summary>The starter methods in the file's spelling (declared before the field lists that use it: statics initialise in order).</summary>
    private static readonly (StarterMethod, string)[] Starters =
        [(StarterMethod.Direct, "direct"), (StarterMethod.StarDelta, "starDelta"), (StarterMethod.Autotransformer, "autotransformer"), (StarterMethod.SoftStarter, "softStarter")];

    /// <summary>Motors, with the keys of the network file (README "Motors"); blanks take the defaults <c>study explain</c> states.</summary>
    public static IReadOnlyList<ElementField> Motor { get; } =
    [
        Field.Id<Motor>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Motor>("Bus", e => e.Bus, (e, v) => e with { Bus = v }).Keyed("bus"),
        Field.Optional<Motor>("Rated output", "MW", "", e => e.Mw, (e, v) => e with { Mw = v }).Keyed("mw"),
        Field.Optional<Motor>("Rated", "kV", "", e => e.Kv, (e, v) => e with { Kv = v }).Keyed("kv"),
        Field.Optional<Motor>("Power factor", "", "", e => e.PowerFactor, (e, v) => e with { PowerFactor = v }).Keyed("powerFactor"),
        Field.Optional<Motor>("Efficiency", "", "", e => e.Efficiency, (e, v) => e with { Efficiency = v }).Keyed("efficiency"),
        Field.Optional<Motor>("Pole pairs", "", "1", e => e.PolePairs, (e, v) => e with { PolePairs = Whole("Pole pairs", v) }).Keyed("polePairs"),
        Field.Integer<Motor>("Units", "", 1, e => e.Units, (e, v) => e with { Units = v }).Keyed("units"),
        Field.Flag<Motor>("LV motor group", false, e => e.LowVoltageGroup, (e, v) => e with { LowVoltageGroup = v }).Keyed("lowVoltageGroup"),
        Field.Optional<Motor>("Running load", "%", "100", e => e.LoadPercent, (e, v) => e with { LoadPercent = v }).Keyed("loadPercent"),
        Field.Optional<Motor>("LR current", "× rated", "", e => e.LockedRotor?.CurrentRatio,
            (e, v) => e with { LockedRotor = Rotor((e.LockedRotor ?? new LockedRotor()) with { CurrentRatio = v }) }).Keyed("lockedRotor.currentRatio"),
        Field.Optional<Motor>("Locked-rotor p.f.", "", "0.3", e => e.LockedRotor?.PowerFactor,
            (e, v) => e with { LockedRotor = Rotor((e.LockedRotor ?? new LockedRotor()) with { PowerFactor = v }) }).Keyed("lockedRotor.powerFactor"),
        Field.Named<Motor, StarterMethod>("Starter", Starters, StarterMethod.Direct, e => e.Starter?.Method ?? StarterMethod.Direct,
            (e, v) => e with { Starter = Starter((e.Starter ?? new MotorStarter()) with { Method = v }) }).Keyed("starter.method"),
        Field.Optional<Motor>("Autotransf. tap", "%", "", e => e.Starter?.TapPercent,
            (e, v) => e with { Starter = Starter((e.Starter ?? new MotorStarter()) with { TapPercent = v }) }).Keyed("starter.tapPercent"),
        Field.Optional<Motor>("Soft-start", "× rated", "", e => e.Starter?.CurrentLimit,
            (e, v) => e with { Starter = Starter((e.Starter ?? new MotorStarter()) with { CurrentLimit = v }) }).Keyed("starter.currentLimit"),
        Field.Flag<Motor>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    /// <summary>A starter that says nothing beyond "direct" is left out of the file, as one never given.</summary>
    private static MotorStarter? Starter(MotorStarter s) =>
        s is { Method: StarterMethod.Direct, TapPercent: null, CurrentLimit: null } ? null : s;

    private static LockedRotor? Rotor(LockedRotor r) => r is { CurrentRatio: null, PowerFactor: null } ? null : r;

    private static int? Whole(string name, double? v) => v switch
    {
        null => null,
        double x when x == Math.Floor(x) && Math.Abs(x) < 1000 => (int)x,
        _ => throw new FormatException($"{name}: '{Field.Format(v.Value)}' is not a whole number"),
    };

    /// <summary>Breakers, with the keys of the network file (README "Breakers"): ratings for every duty check.</summary>
    public static IReadOnlyList<ElementField> Breaker { get; } =
    [
        Field.Id<Breaker>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Breaker>("Bus", e => e.Bus, (e, v) => e with { Bus = v }).Keyed("bus"),
        Field.Text<Breaker>("Switched branch", e => e.Branch, (e, v) => e with { Branch = v }).Keyed("branch"),
        Field.Number<Breaker>("Breaking", "kA", 0, e => e.InterruptingKa, (e, v) => e with { InterruptingKa = v }).Keyed("interruptingKa"),
        Field.Number<Breaker>("Peak", "kA", 0, e => e.PeakKa, (e, v) => e with { PeakKa = v }).Keyed("peakKa"),
        Field.Optional<Breaker>("Rated DC", "%", "", e => e.DcPercent, (e, v) => e with { DcPercent = v }).Keyed("dcPercent"),
        Field.Optional<Breaker>("Short-time", "kA", "", e => e.ShortTimeKa, (e, v) => e with { ShortTimeKa = v }).Keyed("shortTimeKa"),
        Field.Optional<Breaker>("Short-time for", "s", "1", e => e.ShortTimeS, (e, v) => e with { ShortTimeS = v }).Keyed("shortTimeS"),
        Field.Optional<Breaker>("Opening time", "s", "study t_min", e => e.MinTripS, (e, v) => e with { MinTripS = v }).Keyed("minTripS"),
        Field.Flag<Breaker>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    public static IReadOnlyList<ElementField> Scenario { get; } =
    [
        Field.Id<Scenario>("Name", e => e.Name, (e, v) => e with { Name = v }).Keyed("name"),
        Field.Number<Scenario>("Load scale", "", 1, e => e.LoadScale, (e, v) => e with { LoadScale = v }).Keyed("loadScale"),
        Field.Optional<Scenario>("Generation scale", "", "1", e => e.GenerationScale, (e, v) => e with { GenerationScale = v }).Keyed("generationScale"),
        Field.Text<Scenario>("Description", e => e.Description, (e, v) => e with { Description = v }).Keyed("description"),
    ];
}
