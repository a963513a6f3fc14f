// The phase displacement φ of a transformer's ideal ratio t·e^{jφ}:1 in the load flow, with its explanation.
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>φ in radians, and whether it is the vector group's own displacement (fault studies take that one through the clock lag instead).</summary>
public readonly record struct Displacement(double Rad, bool FromGroup)
{
    public static Displacement None => new(0, false);
}

/// <summary>
/// A winding lags the hv winding by its clock number × 30° (IEC 60076-1, from memory), and that is the
/// angle across the bank in the load flow (DEVELOPERS.md, Per-unit rules): Dyn1 puts the lv bus 30°
/// behind, Dyn11 30° ahead. A given phaseShiftDeg replaces it (phase-shifting transformers, imported
/// cases). In a radial network the displacement turns the angles beyond the bank and changes no flow.
/// </summary>
internal static class PhaseDisplacement
{
    public static Displacement TwoWinding(Derivation d, Transformer t)
    {
        if (t.PhaseShiftDeg is double given)
        {
            if (given == 0 && t.VectorGroup is null) return Displacement.None;
            string replaced = t.VectorGroup is null ? "" : $" (given, so the vector group {t.VectorGroup} does not set it)";
            double rad = d.Step("φ", $"phaseShiftDeg · π / 180 = {N(given)} · π / 180{replaced}", given * Math.PI / 180.0, "rad");
            return new Displacement(rad, false);
        }
        if (Group(t.VectorGroup, t.Id, threeWinding: false) is not VectorGroup group) return Displacement.None;
        return new Displacement(FromClock(d, "φ", t.VectorGroup!, "lv", group.LvClock), true);
    }

    /// <summary>
    /// One winding branch of a three-winding bank, from its terminal to the star point (which sits at
    /// the hv reference): the terminal lags the star by the winding's clock, so φ = −clock × 30°.
    /// </summary>
    public static Displacement Winding(Derivation d, ThreeWindingTransformer t, string winding)
    {
        if (winding == "hv" || Group(t.VectorGroup, t.Id, threeWinding: true) is not VectorGroup group) return Displacement.None;
        int clock = winding == "mv" ? group.MvClock : group.LvClock;
        double lag = FromClock(d, $"φ_{winding}", t.VectorGroup!, winding, clock);
        return new Displacement(-lag, true);
    }

    private static double FromClock(Derivation d, string label, string text, string winding, int clock)
    {
        double lag = VectorGroup.LagDeg(clock);
        string lead = lag < 0 ? $", i.e. it leads by {N(-lag)}°" : "";
        return d.Step(label, $"vector group {text}: {winding} lags hv by clock · 30° = {clock} · 30°{lead}; phaseShiftDeg not given",
            lag * Math.PI / 180.0, "rad");
    }

    /// <summary>The parsed group; null when absent or not readable (validation reports that as an error).</summary>
    private static VectorGroup? Group(string? text, string id, bool threeWinding)
    {
        if (text is null) return null;
        try { return VectorGroup.Parse(text, id, threeWinding); }
        catch (InputException) { return null; }
    }
}
