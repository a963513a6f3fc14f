// Vector groups in IEC 60076-1 notation, checked with the rest of the data rather than only when a fault study needs them.
namespace Study.Core.Model.Validation;

internal static class VectorGroupRules
{
    /// <summary>
    /// The parsed group, or null when none is given or it is not IEC 60076-1 notation (an error on
    /// "vectorGroup", in the parser's words, with the number of windings the transformer has).
    /// </summary>
    public static VectorGroup? Check(ElementScope at, string? text, string? id, bool threeWinding)
    {
        if (text is null) return null;
        try
        {
            return VectorGroup.Parse(text, id ?? "", threeWinding);
        }
        catch (InputException e)
        {
            at.Error("vectorGroup", e.Message);
            return null;
        }
    }
}
