// The voltage set point check shared by supplies and voltage-controlling generators.
namespace Study.Core.Model.Validation;

internal static class SetPoint
{
    public static void Check(ElementScope at, double vSet)
    {
        if (!double.IsFinite(vSet)) return;
        if (vSet <= 0)
            at.Error("vSet", $"vSet is {Numbers.Show(vSet)}: give the held voltage in per unit (1.0 is nominal)");
        else if (vSet < 0.8 || vSet > 1.2)
            at.Warning("vSet", $"vSet {Numbers.Show(vSet)} pu is outside 0.8..1.2 pu: give the set point in per unit, not kV");
    }
}
