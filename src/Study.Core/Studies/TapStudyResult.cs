// Result records of a tap study: every position in every scenario, and the positions to recommend.
namespace Study.Core.Studies;

public sealed record WatchedVoltage(string Bus, double VPu, double LowPu, double HighPu);

/// <summary>One position solved in one scenario.</summary>
public sealed record TapStudyPoint
{
    public int Position { get; init; }
    public double Ratio { get; init; }
    public string? Scenario { get; init; }
    public bool Converged { get; init; }
    public IReadOnlyList<WatchedVoltage> Watched { get; init; } = [];
    /// <summary>Lowest and highest voltage over the whole system (real buses).</summary>
    public double VMinPu { get; init; }
    public string? VMinBus { get; init; }
    public double VMaxPu { get; init; }
    public string? VMaxBus { get; init; }
    public double LossMw { get; init; }
    /// <summary>Voltage and loading violations anywhere in the system.</summary>
    public int Violations { get; init; }
    /// <summary>Smallest distance of a watched voltage inside its band (negative: outside by that much; −∞ when no operating point).</summary>
    public double MarginPu { get; init; }
    /// <summary>True when solved from flat start: the first position, or a warm start that failed or collapsed.</summary>
    public bool SolvedFromFlatStart { get; init; }
    /// <summary>True when the only solution found is a collapsed, low-voltage one: shown, but never recommended.</summary>
    public bool LowVoltage { get; init; }
}

/// <summary>A position that keeps every watched bus in band in every scenario, with its worst-case margin.</summary>
public sealed record TapRecommendation(int Position, double MarginPu);

public sealed record TapStudyResult
{
    public required string Transformer { get; init; }
    public int Min { get; init; }
    public int Max { get; init; }
    public double StepPercent { get; init; }
    public int FilePosition { get; init; }
    public IReadOnlyList<string> WatchBuses { get; init; } = [];
    public (double Low, double High)? Band { get; init; }
    public IReadOnlyList<string?> Scenarios { get; init; } = [];
    public IReadOnlyList<TapStudyPoint> Points { get; init; } = [];
    /// <summary>Ranked by margin, best first; empty when no position holds every watched bus in band.</summary>
    public IReadOnlyList<TapRecommendation> Recommended { get; init; } = [];
    /// <summary>When nothing is recommended: the position that comes closest, and its (negative) margin.</summary>
    public TapRecommendation? Closest { get; init; }
    /// <summary>A sentence stating the finding.</summary>
    public required string Finding { get; init; }
    /// <summary>Positions whose warm-started solve was repeated from flat start, and why (one line each).</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
