// What a motor-start study is asked: which motors start together, the voltage they need, the buses to watch.
using Study.Core.LoadFlow;
using Study.Core.Model;

namespace Study.Core.Studies;

public sealed record MotorStartRequest
{
    /// <summary>Ids of the motors started together (all units of each).</summary>
    public required IReadOnlyList<string> Motors { get; init; }

    /// <summary>The voltage a started motor needs at its bus, pu (0.80 is common practice).</summary>
    public double MinTerminalPu { get; init; } = 0.80;

    /// <summary>Buses whose dip the report names; the motors' buses are always shown.</summary>
    public IReadOnlyList<string> WatchBuses { get; init; } = [];

    /// <summary>Scenario name of the pre-start load flow; null for the loads as entered.</summary>
    public string? Scenario { get; init; }

    /// <summary>Options of the pre-start load flow.</summary>
    public LoadFlowOptions Options { get; init; } = LoadFlowOptions.Default;

    /// <summary>Checks what can be checked without the network.</summary>
    /// <exception cref="InputException">No motor, a blank or repeated id, or a minimum voltage that is not in per unit.</exception>
    public void Validate()
    {
        if (Motors.Count == 0) throw new InputException("no motor to start: name one with --motor ID");
        if (Motors.Any(string.IsNullOrWhiteSpace)) throw new InputException("a motor id to start is blank");
        if (Motors.Distinct().Count() != Motors.Count) throw new InputException("a motor is named twice: all its units start together anyway");
        if (!(MinTerminalPu > 0 && MinTerminalPu < 1.2))
            throw new InputException(FormattableString.Invariant($"the minimum terminal voltage {MinTerminalPu} pu is not in per unit: give it around 0.8"));
        if (WatchBuses.Any(string.IsNullOrWhiteSpace)) throw new InputException("a watched bus id is blank");
        Options.Validate();
    }
}
