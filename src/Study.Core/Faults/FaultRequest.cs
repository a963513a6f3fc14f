// What a fault study is asked to do: which buses, which fault types, which method and level.
using System.Numerics;
using Study.Core.LoadFlow;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>How the symmetrical breaking current is figured.</summary>
public enum BreakingCurrent
{
    /// <summary>I_b = I''k − Σ ΔU''_i/(c·U_n/√3)·(1 − μ_i·q_i)·I''k_i over the machines (IEC 60909-0 meshed networks); I''k for unbalanced faults.</summary>
    Decay,
    /// <summary>I_b = I''k everywhere.</summary>
    Conservative,
}

/// <summary>A fault study request; the defaults give the all-bus IEC 60909 maximum scan for 3ph and slg.</summary>
public sealed record FaultRequest
{
    public static FaultRequest Default { get; } = new();

    /// <summary>Scenario name whose loads the load-flow method solves; null for the loads as entered.</summary>
    public string? Scenario { get; init; }

    /// <summary>Bus ids to fault; null means every bus (internal star points of three-winding banks excepted).</summary>
    public IReadOnlyList<string>? Buses { get; init; }

    public IReadOnlyList<FaultKind> Kinds { get; init; } = [FaultKind.ThreePhase, FaultKind.LineToEarth];

    /// <summary>Fault impedance Z_f in ohm (R + jX), converted on the faulted bus's base; zero for a bolted fault.</summary>
    public Complex FaultImpedanceOhm { get; init; }

    public FaultMethod Method { get; init; } = FaultMethod.Iec60909;

    /// <summary>Max: c_max and each supply's scMvaMax; Min: c_min and scMvaMin (IEC 60909-0, from memory).</summary>
    public FaultLevel Level { get; init; } = FaultLevel.Max;

    /// <summary>For <see cref="FaultMethod.LoadFlow"/>: a converged load flow of the same model; solved here when null.</summary>
    public LoadFlowResult? PreFault { get; init; }

    /// <summary>Options of the load flow solved here when <see cref="PreFault"/> is null.</summary>
    public LoadFlowOptions? LoadFlowOptions { get; init; }

    /// <summary>
    /// False (the default, the command line): an earth fault asked for on a network where some element
    /// lacks zero-sequence data is an input error naming the first such element. True (the terminal UI):
    /// the faults that need no zero sequence are still given, the earth faults are left out, and
    /// <see cref="FaultResult.MissingZeroSequence"/> lists every element that lacks the data.
    /// </summary>
    public bool LeaveOutEarthFaultsWithoutZeroSequence { get; init; }

    /// <summary>Post-fault phase voltages at the faulted bus and its neighbours.</summary>
    public bool IncludeVoltages { get; init; } = true;

    /// <summary>Each branch's current into the faulted bus.</summary>
    public bool IncludeContributions { get; init; } = true;

    /// <summary>Minimum time delay t_min (relay plus opening) for the breaking current and its DC component, s; breakers with their own minTripS use theirs.</summary>
    public double TMinS { get; init; } = 0.1;

    /// <summary>Fault duration T_k for the thermal equivalent current, s.</summary>
    public double DurationS { get; init; } = 1.0;

    /// <summary>How the symmetrical breaking current I_b is taken.</summary>
    public BreakingCurrent Breaking { get; init; } = BreakingCurrent.Decay;

    /// <summary>Minimum levels: the end-of-fault temperature of line conductors, °C.</summary>
    public double LineTemperatureC { get; init; } = 80;

    /// <summary>Longest t_min and T_k accepted, s; the end-of-fault temperatures accepted, °C.</summary>
    public const double MaxTimeS = 10, MinLineTemperatureC = -50, MaxLineTemperatureC = 400;

    /// <summary>Checks what can be checked without the network.</summary>
    /// <exception cref="Model.InputException">No fault type, a fault impedance that is not finite or has negative resistance, a blank bus id, or a time or temperature out of bounds.</exception>
    public void Validate()
    {
        if (Kinds.Count == 0) throw new Model.InputException("no fault type asked for (3ph, slg, ll, dlg)");
        Complex zf = FaultImpedanceOhm;
        if (!double.IsFinite(zf.Real) || !double.IsFinite(zf.Imaginary))
            throw new Model.InputException("the fault impedance must be finite (R, X in ohm)");
        if (zf.Real < 0) throw new Model.InputException("the fault resistance must not be negative");
        if (Buses is { } buses && buses.Any(string.IsNullOrWhiteSpace)) throw new Model.InputException("a bus id to fault is blank");
        if (!(TMinS > 0 && TMinS <= MaxTimeS))
            throw new Model.InputException(FormattableString.Invariant($"the minimum time delay t_min {TMinS} s is outside 0..{MaxTimeS} s (0.1 s is the default)"));
        if (!(DurationS > 0 && DurationS <= MaxTimeS))
            throw new Model.InputException(FormattableString.Invariant($"the fault duration T_k {DurationS} s is outside 0..{MaxTimeS} s (1 s is the default)"));
        if (!(LineTemperatureC >= MinLineTemperatureC && LineTemperatureC <= MaxLineTemperatureC))
            throw new Model.InputException(FormattableString.Invariant(
                $"the line temperature {LineTemperatureC} °C is outside {MinLineTemperatureC}..{MaxLineTemperatureC} °C (80 °C is the default)"));
        LoadFlowOptions?.Validate();
    }
}
