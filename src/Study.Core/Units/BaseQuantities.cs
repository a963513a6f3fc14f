// Base impedance and current of a bus from the system MVA base and the bus base kV.
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>Base quantities of one bus; the ohm and ampere bases are null when the kV is not stated.</summary>
public sealed record BusBaseResult(double BaseKv, double? ZBaseOhm, double? IBaseA, IReadOnlyList<DerivationStep> Steps);

/// <summary>Per-unit bases (DEVELOPERS.md, Per-unit rules): Z_base = kV² / MVA, I_base = MVA / (√3 · kV).</summary>
public static class BaseQuantities
{
    public static double ZBaseOhm(double kv, double baseMva) => kv * kv / baseMva;

    public static double IBaseA(double kv, double baseMva) => baseMva * 1000.0 / (Math.Sqrt(3.0) * kv);

    public static BusBaseResult ForBus(Bus bus, double baseMva)
    {
        var d = new Derivation();
        d.Step("S_base", "system base", baseMva, "MVA");
        d.Step("U_base", $"base kV of bus {bus.Id}", bus.Kv, "kV");
        if (bus.Kv <= 0)
            return new BusBaseResult(bus.Kv, null, null, d.ToList());
        double zBase = d.Step("Z_base", $"kV² / S_base = {N(bus.Kv)}² / {N(baseMva)}", ZBaseOhm(bus.Kv, baseMva), "ohm");
        double iBase = d.Step("I_base", $"S_base / (√3 · kV) = {N(baseMva)} · 1000 / (√3 · {N(bus.Kv)})", IBaseA(bus.Kv, baseMva), "A");
        return new BusBaseResult(bus.Kv, zBase, iBase, d.ToList());
    }

    /// <summary>The bus base kV for a conversion that needs one; per-unit-only buses (kV 0) need the pu form.</summary>
    internal static double RequireKv(Bus bus, string elementId, string hint)
    {
        if (bus.Kv > 0) return bus.Kv;
        throw new InputException($"bus {bus.Id} has no base kV: {hint}", elementId: elementId);
    }

    internal static double Require(double? value, string field, string elementId) =>
        value ?? throw new InputException($"{field} is missing", elementId: elementId);

    internal static double RequirePositive(double? value, string field, string elementId)
    {
        double v = Require(value, field, elementId);
        if (v > 0 && double.IsFinite(v)) return v;
        throw new InputException($"{field} must be positive (got {N(v)})", elementId: elementId);
    }
}
