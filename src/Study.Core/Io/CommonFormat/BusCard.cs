// A bus card of an IEEE Common Format file: one bus with its load, generation, shunt and solution.
namespace Study.Core.Io.CommonFormat;

/// <summary>
/// One card of the BUS DATA section, in the file's units: MW, Mvar, kV, degrees, and per unit on the
/// system MVA base for voltages and shunt admittance.
/// </summary>
internal sealed record BusCard
{
    // Columns of the IEEE Working Group (1973) bus data card, checked against the UW archive files.
    public static readonly Field NumberField = new("bus number", 1, 4);
    private static readonly Field NameField = new("name", 6, 17);
    private static readonly Field AreaField = new("area", 19, 20);
    private static readonly Field ZoneField = new("loss zone", 21, 23);
    private static readonly Field TypeField = new("bus type", 25, 26);
    private static readonly Field FinalVoltageField = new("final voltage", 28, 33);
    private static readonly Field FinalAngleField = new("final angle", 34, 40);
    private static readonly Field LoadMwField = new("load MW", 41, 49);
    private static readonly Field LoadMvarField = new("load MVAR", 50, 59);
    private static readonly Field GenMwField = new("generation MW", 60, 67);
    private static readonly Field GenMvarField = new("generation MVAR", 68, 75);
    private static readonly Field BaseKvField = new("base kV", 77, 83);
    private static readonly Field DesiredVoltsField = new("desired volts", 85, 90);
    private static readonly Field MaxField = new("maximum MVAR or voltage limit", 91, 98);
    private static readonly Field MinField = new("minimum MVAR or voltage limit", 99, 106);
    private static readonly Field ShuntGField = new("shunt conductance G", 107, 114);
    private static readonly Field ShuntBField = new("shunt susceptance B", 115, 122);
    private static readonly Field RemoteBusField = new("remote controlled bus number", 124, 127);

    public required int Line { get; init; }
    public required int Number { get; init; }
    public string? Name { get; init; }
    public string? Zone { get; init; }

    /// <summary>0 load (PQ), 1 PQ within voltage limits, 2 PV within Mvar limits, 3 slack.</summary>
    public int Type { get; init; }
    public double FinalVPu { get; init; }
    public double FinalAngleDeg { get; init; }
    public double LoadMw { get; init; }
    public double LoadMvar { get; init; }
    public double GenMw { get; init; }
    public double GenMvar { get; init; }

    /// <summary>0 means "not stated" (several archive cases are per unit only).</summary>
    public double BaseKv { get; init; }
    public double DesiredVPu { get; init; }

    /// <summary>Mvar limits for types 2 and 3; voltage limits for type 1.</summary>
    public double MaxLimit { get; init; }
    public double MinLimit { get; init; }
    public double ShuntGPu { get; init; }
    public double ShuntBPu { get; init; }

    public static BusCard Read(Card card)
    {
        card.RejectTabs();
        int number = card.BusNumber(NumberField);
        string name = card.Trimmed(NameField);
        card.OptionalInteger(AreaField);
        int? zone = card.OptionalInteger(ZoneField);
        int type = card.Integer(TypeField);
        if (type is < 0 or > 3) throw card.Error(TypeField, $"must be 0, 1, 2 or 3: '{card.Trimmed(TypeField)}'");
        var bus = new BusCard
        {
            Line = card.Line,
            Number = number,
            Name = name.Length > 0 ? name : null,
            Zone = zone?.ToString(System.Globalization.CultureInfo.InvariantCulture),
            Type = type,
            FinalVPu = card.Number(FinalVoltageField),
            FinalAngleDeg = card.Number(FinalAngleField),
            LoadMw = card.Number(LoadMwField),
            LoadMvar = card.Number(LoadMvarField),
            GenMw = card.Number(GenMwField),
            GenMvar = card.Number(GenMvarField),
            BaseKv = card.Number(BaseKvField),
            DesiredVPu = card.Number(DesiredVoltsField),
            MaxLimit = card.Number(MaxField),
            MinLimit = card.Number(MinField),
            ShuntGPu = card.Number(ShuntGField),
            ShuntBPu = card.Number(ShuntBField),
        };
        card.Integer(RemoteBusField);
        if (bus.BaseKv < 0) throw card.Error(BaseKvField, $"must not be negative: '{card.Trimmed(BaseKvField)}'");
        return bus;
    }
}
