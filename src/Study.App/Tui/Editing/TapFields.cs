// Tap-changer fields shared by two- and three-winding transformers; a blank step means "no tap changer".
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>Builds the tap fields of a transformer record that carries a <see cref="TapChanger"/>.</summary>
public static class TapFields
{
    public static IReadOnlyList<ElementField> For<T>(Func<T, TapChanger?> get, Func<T, TapChanger?, T> set)
    {
        T Edit(T e, Func<TapChanger, TapChanger> change) => set(e, change(get(e) ?? new TapChanger()));
        TapRegulation Reg(TapChanger t) => t.Regulate ?? new TapRegulation { Bus = "" };
        return
        [
            Field.Choice<T, TapWinding>("Tapped winding", TapWinding.Hv, e => get(e)?.Winding ?? TapWinding.Hv, (e, v) => Edit(e, t => t with { Winding = v })).Keyed("tap.winding"),
            Field.Number<T>("Step size", "%", 0, e => get(e)?.PercentPerStep ?? 0, (e, v) => Edit(e, t => t with { PercentPerStep = v })).Keyed("tap.percentPerStep"),
            Field.Integer<T>("Lowest position", "", 0, e => get(e)?.Range.Lowest ?? 0, (e, v) => Edit(e, t => t with { Range = t.Range with { Lowest = v } })).Keyed("tap.range"),
            Field.Integer<T>("Highest position", "", 0, e => get(e)?.Range.Highest ?? 0, (e, v) => Edit(e, t => t with { Range = t.Range with { Highest = v } })).Keyed("tap.range"),
            Field.Integer<T>("Present position", "", 0, e => get(e)?.Position ?? 0, (e, v) => Edit(e, t => t with { Position = v })).Keyed("tap.position"),
            Field.Text<T>("Regulated bus", e => get(e)?.Regulate?.Bus, (e, v) => Edit(e, t => t with
            {
                Regulate = v is null ? null : Reg(t) with { Bus = v },
            })).Keyed("tap.regulate.bus") with { Options = Field.BusOptions },
            Field.Number<T>("Target voltage", "pu", 1, e => get(e)?.Regulate?.VTarget ?? 1,
                (e, v) => get(e)?.Regulate is null ? e : Edit(e, t => t with { Regulate = Reg(t) with { VTarget = v } })).Keyed("tap.regulate.vTarget"),
            Field.Number<T>("Dead band", "pu", 0.015, e => get(e)?.Regulate?.BandPu ?? 0.015,
                (e, v) => get(e)?.Regulate is null ? e : Edit(e, t => t with { Regulate = Reg(t) with { BandPu = v } })).Keyed("tap.regulate.bandPu"),
        ];
    }

    /// <summary>A tap changer with no step, no range and no regulation says nothing: store none.</summary>
    public static TapChanger? Normalise(TapChanger? tap) =>
        tap is { PercentPerStep: 0, Range: { Lowest: 0, Highest: 0 }, Position: 0, Regulate: null } ? null : tap;
}
