// What the outage dialog asks: screen the active scenario only, or every scenario of the network.
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Tui.Outages;

/// <summary>The outage question before it is asked; every in-service line and transformer is taken out in turn.</summary>
public sealed class OutageForm(Network network, string? activeScenario)
{
    /// <summary>True: every scenario of the network; false: the active one (or loads as entered).</summary>
    public bool AllScenarios { get; set; }

    public string ActiveScenarioLabel => Study.App.Reports.Labels.Scenario(activeScenario);

    /// <summary>How many scenarios "all" means; with none the network is screened as entered.</summary>
    public int ScenarioCount => network.Scenarios.Count;

    public (OutageScreeningRequest? Request, string? Error) Build()
    {
        if (activeScenario is not null && network.FindScenario(activeScenario) is null && !AllScenarios)
            return (null, $"scenario '{activeScenario}' is no longer in the network: choose another (Alt+N) or all scenarios");
        // Empty means every scenario; a null name is the loads as entered.
        IReadOnlyList<string?> scenarios = AllScenarios ? [] : [activeScenario];
        return (new OutageScreeningRequest { Scenarios = scenarios }, null);
    }
}
