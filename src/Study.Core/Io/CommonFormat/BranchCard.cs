// A branch card of an IEEE Common Format file: a line or transformer in system per unit.
namespace Study.Core.Io.CommonFormat;

/// <summary>One card of the BRANCH DATA section; impedances in per unit on the system MVA base.</summary>
internal sealed record BranchCard
{
    // Columns of the IEEE Working Group (1973) branch data card, checked against the UW archive files.
    public static readonly Field TapBusField = new("tap bus number", 1, 4);
    public static readonly Field ZBusField = new("Z bus number", 6, 9);
    private static readonly Field AreaField = new("area", 11, 12);
    // The archive files write the loss zone in column 15; 13-15 holds it wherever it is right-aligned.
    private static readonly Field ZoneField = new("loss zone", 13, 15);
    private static readonly Field CircuitField = new("circuit", 17, 17);
    public static readonly Field TypeField = new("branch type", 19, 19);
    private static readonly Field RField = new("branch resistance R", 20, 29);
    private static readonly Field XField = new("branch reactance X", 30, 39);
    private static readonly Field BField = new("line charging B", 41, 50);
    private static readonly Field Rating1Field = new("line MVA rating 1", 51, 55);
    private static readonly Field Rating2Field = new("line MVA rating 2", 57, 61);
    private static readonly Field Rating3Field = new("line MVA rating 3", 63, 67);
    private static readonly Field ControlBusField = new("control bus number", 69, 72);
    private static readonly Field SideField = new("side", 74, 74);
    public static readonly Field RatioField = new("transformer final turns ratio", 77, 82);
    private static readonly Field AngleField = new("transformer final angle", 84, 90);
    private static readonly Field MinTapField = new("minimum tap or phase shift", 91, 97);
    private static readonly Field MaxTapField = new("maximum tap or phase shift", 98, 104);
    private static readonly Field StepField = new("step size", 106, 111);

    // The format puts the minimum limit in 113-119 and the maximum in 120-126, but the UW archive
    // files start the maximum in column 119; the two are read as the numbers found in 113-126.
    private static readonly Field LimitsSpan = new("minimum and maximum limits", 113, 126);
    private static readonly string[] LimitNames = ["minimum voltage, MVAR or MW limit", "maximum voltage, MVAR or MW limit"];

    public required int Line { get; init; }
    public required int TapBus { get; init; }
    public required int ZBus { get; init; }

    /// <summary>Circuit number, 0 when blank.</summary>
    public int Circuit { get; init; }

    /// <summary>0 line; 1 fixed tap, 2 variable tap for voltage, 3 for Mvar, 4 phase shifter.</summary>
    public int Type { get; init; }
    public double RPu { get; init; }
    public double XPu { get; init; }

    /// <summary>Total line charging susceptance, per unit.</summary>
    public double BPu { get; init; }
    public double Rating1Mva { get; init; }

    /// <summary>Off-nominal turns ratio at the tap bus; 0 for a line.</summary>
    public double FinalRatio { get; init; }
    public double FinalAngleDeg { get; init; }

    public static BranchCard Read(Card card)
    {
        card.RejectTabs();
        int tapBus = card.BusNumber(TapBusField);
        int zBus = card.BusNumber(ZBusField);
        if (zBus == tapBus) throw card.Error(ZBusField, $"is the tap bus again: a branch from bus {tapBus} to itself");
        card.OptionalInteger(AreaField);
        card.OptionalInteger(ZoneField);
        int circuit = card.Integer(CircuitField);
        if (circuit < 0) throw card.Error(CircuitField, $"must not be negative: '{card.Trimmed(CircuitField)}'");
        int type = card.Integer(TypeField);
        if (type is < 0 or > 4) throw card.Error(TypeField, $"must be 0 to 4: '{card.Trimmed(TypeField)}'");
        var branch = new BranchCard
        {
            Line = card.Line,
            TapBus = tapBus,
            ZBus = zBus,
            Circuit = circuit,
            Type = type,
            RPu = card.Number(RField),
            XPu = card.Number(XField),
            BPu = card.Number(BField),
            Rating1Mva = card.Number(Rating1Field),
            FinalRatio = card.Number(RatioField),
            FinalAngleDeg = card.Number(AngleField),
        };
        card.Number(Rating2Field);
        card.Number(Rating3Field);
        card.Integer(ControlBusField);
        card.Integer(SideField);
        card.Number(MinTapField);
        card.Number(MaxTapField);
        card.Number(StepField);
        card.Numbers(LimitsSpan, LimitNames);
        if (branch.FinalRatio < 0) throw card.Error(RatioField, $"must not be negative: '{card.Trimmed(RatioField)}'");
        return branch;
    }
}
