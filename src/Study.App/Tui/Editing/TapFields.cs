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
            Field.Choice<T, TapSide>("Tap side", TapSide.Hv, e => get(e)?.Side ?? TapSide.Hv, (e, v) => Edit(e, t => t with { Side = v })),
            Field.Number<T>("Tap step", "%", 0, e => get(e)?.StepPercent ?? 0, (e, v) => Edit(e, t => t with { StepPercent = v })),
            Field.Integer<T>("Tap min", "", 0, e => get(e)?.Min ?? 0, (e, v) => Edit(e, t => t with { Min = v })),
            Field.Integer<T>("Tap max", "", 0, e => get(e)?.Max ?? 0, (e, v) => Edit(e, t => t with { Max = v })),
            Field.Integer<T>("Tap neutral", "", 0, e => get(e)?.Neutral ?? 0, (e, v) => Edit(e, t => t with { Neutral = v })),
            Field.Integer<T>("Tap position", "", 0, e => get(e)?.Position ?? 0, (e, v) => Edit(e, t => t with { Position = v })),
            Field.Text<T>("Regulated bus", e => get(e)?.Regulate?.Bus, (e, v) => Edit(e, t => t with
            {
                Regulate = v is null ? null : Reg(t) with { Bus = v },
            })),
            Field.Number<T>("V target", "pu", 1, e => get(e)?.Regulate?.VTarget ?? 1,
                (e, v) => get(e)?.Regulate is null ? e : Edit(e, t => t with { Regulate = Reg(t) with { VTarget = v } })),
            Field.Number<T>("Band", "pu", 0.015, e => get(e)?.Regulate?.BandPu ?? 0.015,
                (e, v) => get(e)?.Regulate is null ? e : Edit(e, t => t with { Regulate = Reg(t) with { BandPu = v } })),
        ];
    }

    /// <summary>A tap changer with no step, no range and no regulation says nothing: store none.</summary>
    public static TapChanger? Normalise(TapChanger? tap) =>
        tap is { StepPercent: 0, Min: 0, Max: 0, Position: 0, Neutral: 0, Regulate: null } ? null : tap;
}
