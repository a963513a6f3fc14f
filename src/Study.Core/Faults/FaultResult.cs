// Everything a fault study produces, read alike by the CLI, the TUI and the tests.
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>The fault levels at the studied buses, each breaker's duty, and the notes the engineer should see; <see cref="Failure"/> says why nothing was calculated.</summary>
public sealed record FaultResult
{
    /// <summary>
    /// Why the study could not run, when it could not (the pre-fault load flow of the load-flow method did
    /// not converge); null when it ran. A failed study holds no faults.
    /// </summary>
    public string? Failure { get; init; }

    /// <summary>True when the study ran.</summary>
    public bool Completed => Failure is null;

    public FaultMethod Method { get; init; }
    public FaultLevel Level { get; init; }
    /// <summary>The minimum time delay t_min the rows' breaking current and DC component are for, s.</summary>
    public double TMinS { get; init; } = 0.1;
    /// <summary>The fault duration T_k the thermal equivalent current is for, s.</summary>
    public double TkS { get; init; } = 1.0;
    public BreakingCurrent Breaking { get; init; }
    /// <summary>Minimum levels: the temperature line resistances were taken at, °C; null for maximum levels.</summary>
    public double? LineTemperatureC { get; init; }
    /// <summary>The system frequency, Hz (the DC component and m depend on it).</summary>
    public double FrequencyHz { get; init; } = 50;
    /// <summary>The caution every fault output carries (<see cref="FaultStudy.Caution"/>).</summary>
    public string Caution { get; init; } = FaultStudy.Caution;
    /// <summary>Every fault, by bus in network order, then by kind in the order asked.</summary>
    public IReadOnlyList<ShortCircuitLevel> Faults { get; init; } = [];
    public IReadOnlyList<BreakerDuty> Breakers { get; init; } = [];
    /// <summary>Assumptions and defaults the engineer should see (assumed power factors, sources left out, ...).</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
    /// <summary>
    /// With <see cref="FaultRequest.LeaveOutEarthFaultsWithoutZeroSequence"/>: what each element lacks for the
    /// zero sequence ("line F2 has no zero-sequence data (z0) ..."), by element id; the earth faults are then
    /// left out (<see cref="LeftOut"/>). Empty when nothing is missing.
    /// </summary>
    public IReadOnlyList<MissingData> MissingZeroSequence { get; init; } = [];

    /// <summary>Fault kinds asked for but not calculated, because the zero-sequence data is incomplete.</summary>
    public IReadOnlyList<FaultKind> LeftOut { get; init; } = [];

    /// <summary>True when no bus states its kV: results in per unit only.</summary>
    public bool PerUnitOnly { get; init; }
}

/// <summary>Data an element lacks for a calculation: the element and the sentence saying what to give.</summary>
public sealed record MissingData(string ElementId, string Message);
