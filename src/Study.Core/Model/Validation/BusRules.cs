// Bus checks: base kV (0 = not stated) and the planning voltage band.
namespace Study.Core.Model.Validation;

internal static class BusRules
{
    public static void Check(ValidationContext context, Bus bus)
    {
        ElementScope at = context.At(ElementKind.Bus, bus.Id);
        at.AllFinite(("kv", bus.Kv), ("vMin", bus.VMin), ("vMax", bus.VMax));
        at.Kv("kv", bus.Kv, zeroAllowed: true);
        if (bus.VMin >= bus.VMax)
            at.Error("vMin", $"vMin {Numbers.Show(bus.VMin)} pu is not below vMax {Numbers.Show(bus.VMax)} pu: the voltage band is empty");
        Band(at, "vMin", bus.VMin);
        Band(at, "vMax", bus.VMax);
    }

    /// <summary>A band limit far from 1 pu is more likely kV or percent typed into a per-unit key.</summary>
    private static void Band(ElementScope at, string field, double v)
    {
        if (double.IsFinite(v) && (v < 0.5 || v > 1.5))
            at.Warning(field, $"{field} {Numbers.Show(v)} pu is outside 0.5..1.5 pu: give the limit in per unit (0.95, 1.05)");
    }
}
