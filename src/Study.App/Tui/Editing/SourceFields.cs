// Field lists of sources: the utility supply point and generators.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>Form and table fields of supplies and generators.</summary>
public static class SourceFields
{
    public static IReadOnlyList<ElementField> Supply { get; } =
    [
        Field.Id<Supply>("Id", e => e.Id, (e, v) => e with { Id = v }),
        Field.Id<Supply>("Bus", e => e.Bus, (e, v) => e with { Bus = v }),
        Field.Number<Supply>("Vset", "pu", 1, e => e.VSet, (e, v) => e with { VSet = v }),
        Field.Number<Supply>("Angle", "°", 0, e => e.AngleDeg, (e, v) => e with { AngleDeg = v }),
        Field.Optional<Supply>("S''k max", "MVA", "", e => e.ScMvaMax, (e, v) => e with { ScMvaMax = v }),
        Field.Optional<Supply>("S''k min", "MVA", "= max", e => e.ScMvaMin, (e, v) => e with { ScMvaMin = v }),
        Field.Optional<Supply>("X/R", "", "", e => e.Xr, (e, v) => e with { Xr = v }),
        Field.Optional<Supply>("Z0/Z1", "", "", e => e.Z0Z1, (e, v) => e with { Z0Z1 = v }),
        Field.Flag<Supply>("In service", true, e => e.InService, (e, v) => e with { InService = v }),
    ];

    public static IReadOnlyList<ElementField> Generator { get; } =
    [
        Field.Id<Generator>("Id", e => e.Id, (e, v) => e with { Id = v }),
        Field.Id<Generator>("Bus", e => e.Bus, (e, v) => e with { Bus = v }),
        Field.Choice<Generator, GeneratorMode>("Mode", GeneratorMode.Pv, e => e.Mode, (e, v) => e with { Mode = v }),
        Field.Number<Generator>("P", "MW", 0, e => e.PMw, (e, v) => e with { PMw = v }),
        Field.Number<Generator>("Q", "Mvar", 0, e => e.QMvar, (e, v) => e with { QMvar = v }),
        Field.Number<Generator>("Vset", "pu", 1, e => e.VSet, (e, v) => e with { VSet = v }),
        Field.Optional<Generator>("Qmin", "Mvar", "none", e => e.QMinMvar, (e, v) => e with { QMinMvar = v }),
        Field.Optional<Generator>("Qmax", "Mvar", "none", e => e.QMaxMvar, (e, v) => e with { QMaxMvar = v }),
        Field.Optional<Generator>("Rating", "MVA", "", e => e.Mva, (e, v) => e with { Mva = v }),
        Field.Optional<Generator>("Rated", "kV", "", e => e.Kv, (e, v) => e with { Kv = v }),
        Field.Optional<Generator>("x''d", "pu", "", e => e.XdppPu, (e, v) => e with { XdppPu = v }),
        Field.Optional<Generator>("x2", "pu", "= x''d", e => e.X2Pu, (e, v) => e with { X2Pu = v }),
        Field.Optional<Generator>("x0", "pu", "", e => e.X0Pu, (e, v) => e with { X0Pu = v }),
        Field.Optional<Generator>("X/R", "", "", e => e.Xr, (e, v) => e with { Xr = v }),
        Field.Optional<Generator>("Power factor", "", "0.85", e => e.PowerFactor, (e, v) => e with { PowerFactor = v }),
        Field.Flag<Generator>("Neutral earthed", true, e => (e.Neutral ?? new Earthing()).Grounded,
            (e, v) => e with { Neutral = (e.Neutral ?? new Earthing()) with { Grounded = v } }),
        Field.Flag<Generator>("In service", true, e => e.InService, (e, v) => e with { InService = v }),
    ];
}
