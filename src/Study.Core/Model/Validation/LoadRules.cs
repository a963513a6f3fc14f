// Load and shunt checks: the connection, finite powers, and a ZIP mix that sums to one.
namespace Study.Core.Model.Validation;

internal static class LoadRules
{
    private const double ZipTolerance = 1e-6;

    public static void CheckLoad(ValidationContext context, Load load)
    {
        ElementScope at = context.At(ElementKind.Load, load.Id);
        at.BusRef("bus", load.Bus);
        at.AllFinite(("pMw", load.PMw), ("qMvar", load.QMvar));
        if (load.Zip is not ZipMix zip) return;
        if (!at.AllFinite(("zip.z", zip.Z), ("zip.i", zip.I), ("zip.p", zip.P))) return;
        string shares = $"z {Numbers.Show(zip.Z)}, i {Numbers.Show(zip.I)}, p {Numbers.Show(zip.P)}";
        if (zip.Z < 0 || zip.I < 0 || zip.P < 0)
            at.Error("zip", $"zip shares ({shares}) include a negative share: each share is a fraction from 0 to 1");
        double sum = zip.Z + zip.I + zip.P;
        if (Math.Abs(sum - 1) > ZipTolerance)
            at.Error("zip", $"zip shares ({shares}) sum to {Numbers.Show(sum)}, not 1: the constant-impedance, " +
                "constant-current and constant-power shares must add up to the whole load");
    }

    public static void CheckShunt(ValidationContext context, Shunt shunt)
    {
        ElementScope at = context.At(ElementKind.Shunt, shunt.Id);
        at.BusRef("bus", shunt.Bus);
        at.AllFinite(("qMvar", shunt.QMvar), ("pMw", shunt.PMw));
    }
}
