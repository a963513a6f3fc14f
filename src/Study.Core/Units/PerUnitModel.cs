// The solver input: the network compiled to indexed per-unit elements on the system base.
using System.Numerics;
using Study.Core.Model;

namespace Study.Core.Units;

/// <summary>What a per-unit branch stands for.</summary>
public enum BranchKind
{
    Line,
    Transformer,
    /// <summary>One winding of a three-winding transformer, from its terminal to the internal star bus.</summary>
    ThreeWindingTransformer,
}

/// <summary>A bus, indexed. Star points of three-winding transformers are internal buses.</summary>
public sealed record PuBus
{
    public required string Id { get; init; }
    /// <summary>Base kV; 0 when the case does not state it.</summary>
    public double BaseKv { get; init; }
    public double VMin { get; init; } = 0.95;
    public double VMax { get; init; } = 1.05;
    /// <summary>True for the internal star bus of a three-winding transformer (hidden in bus lists).</summary>
    public bool IsInternal { get; init; }
}

/// <summary>
/// A π branch on the system base. For transformers, <see cref="From"/> is the tapped (hv) terminal
/// behind an ideal ratio t·e^{jφ}:1, with the magnetising admittance at that terminal.
/// </summary>
public sealed record PuBranch
{
    public required string Id { get; init; }
    public BranchKind Kind { get; init; }
    public int From { get; init; }
    public int To { get; init; }
    public Complex Z { get; init; }
    /// <summary>Total charging susceptance, half at each end.</summary>
    public double B { get; init; }
    public double Ratio { get; init; } = 1.0;
    public double ShiftRad { get; init; }
    /// <summary>
    /// The part of <see cref="ShiftRad"/> that is the vector group's clock displacement. Fault studies
    /// build their sequence networks without it and turn voltages across the bank by the clock lag.
    /// </summary>
    public double GroupShiftRad { get; init; }
    /// <summary>Magnetising admittance G − jB at the From terminal (transformers).</summary>
    public Complex MagnetisingY { get; init; }
    public double? RatingMva { get; init; }
    /// <summary>For a three-winding transformer winding: "hv", "mv" or "lv".</summary>
    public string? Winding { get; init; }
    /// <summary>Index into <see cref="PerUnitModel.Taps"/> when the branch carries a tap changer.</summary>
    public int? Tap { get; init; }
    /// <summary>Zero-sequence series impedance; null when the data gives none (lines without r0/x0).</summary>
    public Complex? Z0 { get; init; }
    /// <summary>Zero-sequence total charging susceptance; null when not given.</summary>
    public double? B0 { get; init; }
    /// <summary>Two-winding nameplate data (one unit) for the correction factors; null for lines and the per-unit form.</summary>
    public TransformerRating? Rating { get; init; }
    /// <summary>Pairwise data of the bank, on each winding branch of a three-winding transformer.</summary>
    public ThreeWindingRating? ThreeWindingRating { get; init; }
    /// <summary>Vector group and neutral earthing (transformers); null for lines.</summary>
    public PuWindings? Windings { get; init; }
    /// <summary>Identical units in parallel (two-winding transformers).</summary>
    public int Units { get; init; } = 1;
    /// <summary>
    /// Lines: the temperature coefficient α of the conductor's resistance, per kelvin, for the resistance at
    /// the end-of-fault temperature; null for transformers.
    /// </summary>
    public double? ResistanceCoefficient { get; init; }
}

/// <summary>A source: supply point or generator, with its load-flow role.</summary>
public sealed record PuSource
{
    public required string Id { get; init; }
    public ElementKind Kind { get; init; }
    public int Bus { get; init; }
    public GeneratorMode Mode { get; init; }
    public double P { get; init; }
    public double Q { get; init; }
    public double VSet { get; init; } = 1.0;
    public double AngleRad { get; init; }
    /// <summary>Reactive limits in pu; null when not stated (no limit).</summary>
    public double? QMin { get; init; }
    public double? QMax { get; init; }
    /// <summary>Generators with x''d: subtransient sequence impedances on the system base (null for supplies).</summary>
    public Complex? Z1 { get; init; }
    public Complex? Z2 { get; init; }
    public Complex? Z0 { get; init; }
    /// <summary>Supply points: the declared fault levels (null for generators).</summary>
    public SupplyFaultData? FaultData { get; init; }
    /// <summary>Generators: rated data for the correction factor K_G (null for supplies).</summary>
    public GeneratorRating? Rating { get; init; }
    /// <summary>Generators: neutral earthing, on the bus base (null for supplies).</summary>
    public PuNeutral? Neutral { get; init; }
}

/// <summary>A load in pu at 1 pu voltage, already scaled by the scenario.</summary>
public sealed record PuLoad
{
    public required string Id { get; init; }
    public int Bus { get; init; }
    public double P { get; init; }
    public double Q { get; init; }
    public ZipMix Zip { get; init; } = ZipMix.ConstantPower;
    /// <summary>
    /// True for a motor's running load (constant power): a fault study represents the motor by its own
    /// impedance (<see cref="PuMotor"/>) instead, and a start leaves out the motors it starts.
    /// </summary>
    public bool Motor { get; init; }
}

/// <summary>A shunt admittance G + jB in pu at 1 pu voltage (B &gt; 0 capacitive).</summary>
public sealed record PuShunt
{
    public required string Id { get; init; }
    public int Bus { get; init; }
    public double G { get; init; }
    public double B { get; init; }
}

/// <summary>
/// A tap changer in the compiled model: enough to recompute the branch ratio at any position.
/// Ratio(p) = (HvFactor · TapFactor_hv(p)) / (LvFactor · TapFactor_lv(p)), TapFactor(p) = 1 + p·PercentPerStep/100.
/// </summary>
public sealed record PuTap
{
    /// <summary>Id of the transformer.</summary>
    public required string Id { get; init; }
    public int Branch { get; init; }
    public TapWinding Winding { get; init; }
    public double PercentPerStep { get; init; }
    public int Min { get; init; }
    public int Max { get; init; }
    public int Position { get; init; }
    /// <summary>Rated winding kV over the bus base kV on the hv side (1 when per-unit only).</summary>
    public double HvFactor { get; init; } = 1.0;
    public double LvFactor { get; init; } = 1.0;
    /// <summary>Index of the regulated bus, when the tap regulates on load.</summary>
    public int? RegulatedBus { get; init; }
    public double VTarget { get; init; } = 1.0;
    public double BandPu { get; init; }
    /// <summary>True when the file gives the changer a regulation (on-load), even if its regulated bus is out of service.</summary>
    public bool OnLoad { get; init; }
    /// <summary>
    /// True when the tap factor multiplies the From end whatever <see cref="Winding"/> says: the windings of
    /// a three-winding transformer, each a branch from its own terminal to the star.
    /// </summary>
    public bool FactorAtFrom { get; init; }

    public double TapFactor(int position) => 1.0 + position * PercentPerStep / 100.0;

    public double RatioAt(int position) => Winding == TapWinding.Lv && !FactorAtFrom
        ? HvFactor / (LvFactor * TapFactor(position))
        : HvFactor * TapFactor(position) / LvFactor;
}

/// <summary>
/// The compiled network for one scenario: buses indexed 0..n−1, all quantities per unit on
/// <see cref="BaseMva"/>. Out-of-service elements are left out.
/// </summary>
public sealed partial record PerUnitModel
{
    /// <summary>The network's name (for titles and messages).</summary>
    public string Name { get; init; } = "";
    public Scenario? Scenario { get; init; }
    public double BaseMva { get; init; }
    public double FrequencyHz { get; init; } = 50;
    /// <summary>True when no bus states its base kV: results in per unit only.</summary>
    public bool PerUnitOnly { get; init; }
    /// <summary>Ids of the buses left out because they are out of service (for messages that name them).</summary>
    public IReadOnlySet<string> OutOfServiceBuses { get; init; } = new HashSet<string>();
    public IReadOnlyList<PuBus> Buses { get; init; } = [];
    public IReadOnlyList<PuBranch> Branches { get; init; } = [];
    public IReadOnlyList<PuSource> Sources { get; init; } = [];
    public IReadOnlyList<PuLoad> Loads { get; init; } = [];
    public IReadOnlyList<PuShunt> Shunts { get; init; } = [];
    public IReadOnlyList<PuTap> Taps { get; init; } = [];
    public IReadOnlyList<PuBreaker> Breakers { get; init; } = [];
    public IReadOnlyList<PuMotor> Motors { get; init; } = [];
    public IReadOnlyDictionary<string, int> BusIndex { get; init; } = new Dictionary<string, int>();
}
