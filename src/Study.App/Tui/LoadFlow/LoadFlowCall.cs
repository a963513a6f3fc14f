// The one place the TUI calls the load-flow engine: compile the network for the scenario, then solve.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Tui.LoadFlow;

/// <summary>Runs the engine pipeline for the screens: PerUnitModel.Build, then LoadFlowSolver.Solve.</summary>
public static class LoadFlowCall
{
    public static LoadFlowResult Solve(Network network, string? scenario, LoadFlowResult? warmStart, CancellationToken cancel)
    {
        Scenario? chosen = scenario is null ? null : network.FindScenario(scenario);
        PerUnitModel model = PerUnitModel.Build(network, chosen);
        var options = LoadFlowOptions.Default with { WarmStart = warmStart };
        return LoadFlowSolver.Solve(model, options, cancel);
    }
}
