// Supply point checks: the connection, the set point and the utility's declared fault level.
namespace Study.Core.Model.Validation;

internal static class SupplyRules
{
    public static void Check(ValidationContext context, Supply supply)
    {
        ElementScope at = context.At(ElementKind.Supply, supply.Id);
        at.BusRef("bus", supply.Bus);
        at.AllFinite(("vSet", supply.VSet), ("angleDeg", supply.AngleDeg), ("scMvaMax", supply.ScMvaMax),
            ("scMvaMin", supply.ScMvaMin), ("xr", supply.Xr), ("z0z1", supply.Z0Z1));
        SetPoint.Check(at, supply.VSet);
        if (supply.ScMvaMax is null)
            at.Warning("scMvaMax", "scMvaMax is not given: the load flow runs, but fault studies need the declared fault level in MVA");
        at.Positive("scMvaMax", supply.ScMvaMax, "the declared maximum fault level (MVA)");
        at.Positive("scMvaMin", supply.ScMvaMin, "the declared minimum fault level (MVA)");
        if (supply.ScMvaMin > supply.ScMvaMax)
            at.Error("scMvaMin", $"scMvaMin {Numbers.Show(supply.ScMvaMin.Value)} MVA is above scMvaMax " +
                $"{Numbers.Show(supply.ScMvaMax.Value)} MVA: the minimum fault level cannot exceed the maximum");
        // The strongest grids declare a few hundred thousand MVA at EHV; far beyond that the figure is in VA or kVA.
        if (supply.ScMvaMax is double sc && double.IsFinite(sc) && sc > 1e6)
            at.Warning("scMvaMax", $"scMvaMax {Numbers.Show(sc)} MVA is beyond any grid's fault level (up to about 100000 MVA): is it in kVA or VA?");
        at.Positive("xr", supply.Xr, "the supply X/R ratio");
        at.Positive("z0z1", supply.Z0Z1, "the ratio Z0/Z1 of the supply impedance");
    }
}
