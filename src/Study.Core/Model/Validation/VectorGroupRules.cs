// A transformer's vector group must be IEC 60076-1 notation, with one letter group per winding.
namespace Study.Core.Model.Validation;

internal static class VectorGroupRules
{
    /// <summary>
    /// An error when the notation cannot be read (the same reading the fault study makes), so a typing
    /// slip is found when the transformer is entered, not when an earth fault is first asked for.
    /// No vector group is not an error: only earth-fault studies need one, and they say so.
    /// </summary>
    public static void Check(ElementScope at, string? vectorGroup, string id, bool threeWinding)
    {
        if (vectorGroup is null) return;
        try
        {
            VectorGroup.Parse(vectorGroup, id, threeWinding);
        }
        catch (InputException e)
        {
            at.Error("vectorGroup", e.Message);
        }
    }
}
