// The title card of an IEEE Common Format file: system MVA base and the case identification.
namespace Study.Core.Io.CommonFormat;

/// <summary>The first card of the file (IEEE Working Group, 1973: title data).</summary>
internal sealed record TitleCard(double BaseMva, string CaseId)
{
    // Date (cols 2-9), originator (11-30) and season (44) are free text the model does not keep.
    private static readonly Field MvaBase = new("MVA base", 32, 37);
    private static readonly Field Year = new("year", 39, 42);
    private static readonly Field CaseIdentification = new("case identification", 46, 73);

    public static TitleCard Read(Card card)
    {
        card.RejectTabs();
        double baseMva = card.Number(MvaBase);
        if (baseMva <= 0) throw card.Error(MvaBase, $"must be above zero: '{card.Trimmed(MvaBase)}'");
        card.OptionalInteger(Year);
        return new TitleCard(baseMva, card.Trimmed(CaseIdentification));
    }
}
