// Neutral earthing checks, shared by generators and transformer windings.
namespace Study.Core.Model.Validation;

internal static class EarthingRules
{
    public static void Check(ElementScope at, string field, Earthing? earthing)
    {
        if (earthing is null) return;
        at.AllFinite(($"{field}.rOhm", earthing.ROhm), ($"{field}.xOhm", earthing.XOhm));
        at.NotNegative($"{field}.rOhm", earthing.ROhm, "an earthing resistance");
        at.NotNegative($"{field}.xOhm", earthing.XOhm, "an earthing reactance");
    }
}
