// The bundled demo network solves in both scenarios, with regulation settling inside the band.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.LoadFlow;

public class DemoNetworkLoadFlowTests
{
    [Theory]
    [InlineData("winter-peak")]
    [InlineData("summer-night")]
    public void Demo_network_converges_in_each_scenario(string scenarioName)
    {
        Network network = TestNetworks.Demo;
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(network, network.FindScenario(scenarioName)));
        Assert.True(r.Converged, r.Message);
        Assert.True(r.MaxMismatchPu < 1e-8);
        // Power balance closes: generation = load + branch losses + shunt losses.
        var t = r.Totals;
        Assert.Equal(t.GenerationMw, t.LoadMw + t.LossMw + t.ShuntMw, 6);
        Assert.DoesNotContain(r.Violations, v => v.Kind == ElementKind.Bus && v.Element.EndsWith("33", StringComparison.Ordinal));
        foreach (BusResult b in r.Buses) Assert.True(double.IsFinite(b.VPu) && b.VPu > 0.8, b.Id);
    }
}
