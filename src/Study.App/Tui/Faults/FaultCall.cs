// The one place the TUI calls the fault engine: compile the network for the scenario, then run the faults.
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Tui.Faults;

/// <summary>Runs the engine pipeline for the Faults tab: PerUnitModel.Build, then FaultStudy.Run.</summary>
public static class FaultCall
{
    public static FaultResult Run(Network network, string? scenario, FaultRequest request, CancellationToken cancel)
    {
        Scenario? chosen = scenario is null ? null : network.FindScenario(scenario);
        PerUnitModel model = PerUnitModel.Build(network, chosen);
        return FaultStudy.Run(model, request, cancel);
    }
}
