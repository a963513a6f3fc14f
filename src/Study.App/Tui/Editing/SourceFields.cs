// Field lists of sources: the utility supply point and generators.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>Form and table fields of supplies and generators.</summary>
public static class SourceFields
{
    public static IReadOnlyList<ElementField> Supply { get; } =
    [
        Field.Id<Supply>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Supply>("Bus", e => e.Bus, (e, v) => e with { Bus = v }).Keyed("bus"),
        Field.Number<Supply>("Vset", "pu", 1, e => e.VSet, (e, v) => e with { VSet = v }).Keyed("vSet"),
        Field.Number<Supply>("Angle", "°", 0, e => e.AngleDeg, (e, v) => e with { AngleDeg = v }).Keyed("angleDeg"),
        Field.Optional<Supply>("S''k max", "MVA", "", e => e.ScMvaMax, (e, v) => e with { ScMvaMax = v }).Keyed("scMvaMax"),
        Field.Optional<Supply>("S''k min", "MVA", "= max", e => e.ScMvaMin, (e, v) => e with { ScMvaMin = v }).Keyed("scMvaMin"),
        Field.Optional<Supply>("X/R", "", "", e => e.Xr, (e, v) => e with { Xr = v }).Keyed("xr"),
        Field.Optional<Supply>("Z0/Z1", "", "", e => e.Z0Z1, (e, v) => e with { Z0Z1 = v }).Keyed("z0z1"),
        Field.Flag<Supply>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];

    public static IReadOnlyList<ElementField> Generator { get; } =
    [
        Field.Id<Generator>("Id", e => e.Id, (e, v) => e with { Id = v }).Keyed("id"),
        Field.BusRef<Generator>("Bus", e => e.Bus, (e, v) => e with { Bus = v }).Keyed("bus"),
        Field.Choice<Generator, GeneratorMode>("Mode", GeneratorMode.Pv, e => e.Mode, (e, v) => e with { Mode = v }).Keyed("mode"),
        Field.Number<Generator>("P", "MW", 0, e => e.PMw, (e, v) => e with { PMw = v }).Keyed("pMw"),
        Field.Number<Generator>("Q", "Mvar", 0, e => e.QMvar, (e, v) => e with { QMvar = v }).Keyed("qMvar"),
        Field.Number<Generator>("Vset", "pu", 1, e => e.VSet, (e, v) => e with { VSet = v }).Keyed("vSet"),
        Field.Optional<Generator>("Angle (slack)", "°", "0", e => e.AngleDeg, (e, v) => e with { AngleDeg = v }).Keyed("angleDeg"),
        Field.Optional<Generator>("Qmin", "Mvar", "none", e => e.QMinMvar, (e, v) => e with { QMinMvar = v }).Keyed("qMinMvar"),
        Field.Optional<Generator>("Qmax", "Mvar", "none", e => e.QMaxMvar, (e, v) => e with { QMaxMvar = v }).Keyed("qMaxMvar"),
        Field.Optional<Generator>("Rating", "MVA", "", e => e.Mva, (e, v) => e with { Mva = v }).Keyed("mva"),
        Field.Optional<Generator>("Rated", "kV", "", e => e.Kv, (e, v) => e with { Kv = v }).Keyed("kv"),
        Field.Optional<Generator>("x''d", "pu", "", e => e.XdppPu, (e, v) => e with { XdppPu = v }).Keyed("xdppPu"),
        Field.Optional<Generator>("x2", "pu", "= x''d", e => e.X2Pu, (e, v) => e with { X2Pu = v }).Keyed("x2Pu"),
        Field.Optional<Generator>("x0", "pu", "", e => e.X0Pu, (e, v) => e with { X0Pu = v }).Keyed("x0Pu"),
        Field.Optional<Generator>("X/R", "", "", e => e.Xr, (e, v) => e with { Xr = v }).Keyed("xr"),
        Field.Optional<Generator>("Power factor", "", "0.85", e => e.PowerFactor, (e, v) => e with { PowerFactor = v }).Keyed("powerFactor"),
        .. WindingFields.Earthing<Generator>("Neutral", "neutral", e => e.Neutral, (e, n) => e with { Neutral = n }),
        Field.Flag<Generator>("In service", true, e => e.InService, (e, v) => e with { InService = v }).Keyed("inService"),
    ];
}
