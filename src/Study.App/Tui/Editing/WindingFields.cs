// Fields shared by machines and transformer windings: neutral earthing, and a transformer's no-load loss.
using Study.Core.Model;

namespace Study.App.Tui.Editing;

/// <summary>
/// Builds the fields of the nested records <see cref="Earthing"/> and <see cref="NoLoadLoss"/>. All blank
/// means "not stated" (no object in the file): an earthed star point without earthing data is taken as
/// solidly earthed by the fault study, which says so in its notes.
/// </summary>
public static class WindingFields
{
    /// <param name="label">How the form names the winding: "HV", "LV", "Neutral" for a machine.</param>
    /// <param name="key">The file key of the earthing object: "hvNeutral", "neutral".</param>
    public static IReadOnlyList<ElementField> Earthing<T>(string label, string key, Func<T, Earthing?> get, Func<T, Earthing?, T> set)
    {
        string prefix = label == "Neutral" ? "Neutral" : $"{label} neutral";
        T With(T e, Func<Earthing, Earthing> change) => set(e, change(get(e) ?? new Earthing()));
        ElementField Ohm(string part, Func<Earthing, double> read, Func<Earthing, double, Earthing> write) =>
            Field.Optional<T>($"{prefix} {part}", "Ω", "0", e => get(e) is { } n ? read(n) : null,
                // 0 Ω is the default: it states nothing on its own, so it never creates the earthing object.
                (e, v) => get(e) is null && (v ?? 0) == 0 ? e : With(e, n => write(n, v ?? 0)));
        return
        [
            new ElementField($"{prefix} earthed", "", "not stated", e => get((T)e) is { } n ? (n.Grounded ? "yes" : "no") : "", (e, text) =>
                Field.YesOrNo($"{prefix} earthed", text) is bool grounded ? With((T)e, n => n with { Grounded = grounded })! : set((T)e, null)!)
            { Options = _ => Field.YesNo, Key = $"{key}.grounded" },
            Ohm("R", n => n.ROhm, (n, v) => n with { ROhm = v }).Keyed($"{key}.rOhm"),
            Ohm("X", n => n.XOhm, (n, v) => n with { XOhm = v }).Keyed($"{key}.xOhm"),
        ];
    }

    /// <summary>The magnetising branch's nameplate data: no-load current (% of rated) and iron loss (kW).</summary>
    public static IReadOnlyList<ElementField> NoLoad<T>(Func<T, NoLoadLoss?> get, Func<T, NoLoadLoss?, T> set)
    {
        T With(T e, Func<NoLoadLoss, NoLoadLoss> change) => set(e, change(get(e) ?? new NoLoadLoss()));
        return
        [
            Field.Optional<T>("No-load current", "%", "none", e => get(e)?.I0Percent,
                (e, v) => v is double i0 ? With(e, n => n with { I0Percent = i0 }) : get(e) is null ? e : With(e, n => n with { I0Percent = 0 })).Keyed("noLoad.i0Percent"),
            Field.Optional<T>("No-load loss", "kW", "none", e => get(e)?.P0Kw,
                (e, v) => v is double p0 ? With(e, n => n with { P0Kw = p0 }) : get(e) is null ? e : With(e, n => n with { P0Kw = 0 })).Keyed("noLoad.p0Kw"),
        ];
    }

    /// <summary>No-load data of zero current and zero loss says nothing: store none.</summary>
    public static NoLoadLoss? Normalise(NoLoadLoss? noLoad) => noLoad is { I0Percent: 0, P0Kw: 0 } ? null : noLoad;
}
