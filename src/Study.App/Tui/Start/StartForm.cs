// What the motor-start dialog asks: the motors started together, the voltage they need, watched buses, scenario.
using System.Globalization;
using Study.App.Reports;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Tui.Start;

/// <summary>The motor-start question before it is asked; blank fields keep the engine's defaults (0.80 pu, no watched buses).</summary>
public sealed class StartForm(Network network, string? activeScenario)
{
    /// <summary>The network's motors in their order, for the dialog's list.</summary>
    public IReadOnlyList<Motor> Motors { get; } = network.Motors;

    /// <summary>The motors ticked to start together.</summary>
    public HashSet<string> Chosen { get; } = [];

    public string MinTerminalText { get; set; } = "";
    public string WatchText { get; set; } = "";

    /// <summary>The scenario of the pre-start load flow; null for the loads as entered. Starts as the active one.</summary>
    public string? Scenario { get; set; } = activeScenario is not null && network.FindScenario(activeScenario) is not null ? activeScenario : null;

    /// <summary>The choices of scenario: the loads as entered, then each scenario of the network.</summary>
    public IReadOnlyList<string?> ScenarioChoices { get; } = [null, .. network.Scenarios.Select(s => s.Name)];

    /// <summary>"M-CS-COMP  1.2 MW × 2 at CS11, autotransformer": what the list shows of a motor.</summary>
    public static string Describe(Motor m) =>
        $"{m.Id}  {(m.Mw is double mw ? Numbers.UpTo(mw, 3) + " MW" : "MW not given")}{(m.Units > 1 ? $" × {m.Units}" : "")} at {m.Bus}"
        + $", {StartColumns.StarterName(m.Starter?.Method ?? StarterMethod.Direct)}{(m.InService ? "" : " (out of service)")}";

    public (MotorStartRequest? Request, string? Error) Build()
    {
        if (Motors.Count == 0) return (null, "the network has no motors: add one in the Motors list first");
        if (Chosen.Count == 0) return (null, "tick at least one motor to start (Space)");
        double min = 0.80;
        if (MinTerminalText.Trim().Length > 0
            && !double.TryParse(MinTerminalText.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out min))
            return (null, "the minimum terminal voltage is per unit, e.g. 0.8");
        string[] watch = WatchText.Split([',', ' ', ';'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        foreach (string bus in watch)
            if (network.FindBus(bus) is null) return (null, $"watched bus {bus} is not in the network");
        var request = new MotorStartRequest
        {
            Motors = Motors.Select(m => m.Id).Where(Chosen.Contains).ToList(),
            MinTerminalPu = min,
            WatchBuses = watch,
            Scenario = Scenario,
        };
        try
        {
            request.Validate();
        }
        catch (InputException e)
        {
            return (null, e.Message);
        }
        return (request, null);
    }
}
