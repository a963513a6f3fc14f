// On-load tap regulation: the outer loop settles inside the band or reports the tap at its limit.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.LoadFlow;

public class TapRegulationTests
{
    [Theory]
    [InlineData("winter-peak")]
    [InlineData("summer-night")]
    public void Demo_regulation_settles_inside_the_band_and_parallel_banks_stay_together(string scenario)
    {
        Network n = TestNetworks.Demo;
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(n, n.FindScenario(scenario)));
        Assert.True(r.Converged, r.Message);
        TapRegulation reg = n.Transformers.Single(t => t.Id == "GT1").Tap!.Regulate!;
        double v = r.Buses.Single(b => b.Id == reg.Bus).VPu;
        TapResult gt1 = r.Taps.Single(t => t.Id == "GT1"), gt2 = r.Taps.Single(t => t.Id == "GT2");
        Assert.Equal(gt1.Position, gt2.Position);
        if (gt1.AtLimit is null)
            Assert.InRange(v, reg.VTarget - reg.BandPu / 2, reg.VTarget + reg.BandPu / 2);
        Assert.True(gt1.Regulating);
        Assert.False(r.Taps.Single(t => t.Id == "CQ-T1").Regulating);
    }

    [Fact]
    public void Regulation_moves_the_tap_the_right_way_from_a_far_start()
    {
        // Start the banks at +8 (lowest 33 kV voltage): they must come back into the band.
        Network n = TestNetworks.Demo;
        Network far = n with
        {
            Transformers = n.Transformers.Select(t => t.Tap?.Regulate is null ? t : t with { Tap = t.Tap with { Position = 8 } }).ToList(),
        };
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(far, far.FindScenario("winter-peak")));
        LoadFlowResult reference = LoadFlowSolver.Solve(PerUnitModel.Build(n, n.FindScenario("winter-peak")));
        Assert.True(r.Converged);
        double v = r.Buses.Single(b => b.Id == "WRB33").VPu;
        Assert.InRange(v, 1.01 - 0.008, 1.01 + 0.008);
        Assert.InRange(r.Taps.Single(t => t.Id == "GT1").Position, -8, 7);
        Assert.Equal(reference.Buses.Single(b => b.Id == "WRB33").VPu, v, 2);
    }

    [Fact]
    public void A_tap_that_cannot_reach_its_band_is_reported_at_its_limit()
    {
        // Ask for 1.10 pu on the 33 kV bus with only ±2 steps of 1.25 %: the tap runs to its end.
        var tap = new TapChanger
        {
            Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-2, 2), Position = 0,
            Regulate = new TapRegulation { Bus = "LV", VTarget = 1.10, BandPu = 0.015 },
        };
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(SmallNetworks.Transformer132To33(20, 5, tap: tap)));
        Assert.True(r.Converged);
        TapResult t = r.Taps.Single();
        Assert.Equal(-2, t.Position);
        Assert.Equal(TapLimit.Lowest, t.AtLimit);
    }

    [Fact]
    public void Fixed_taps_option_holds_every_tap_at_its_file_position()
    {
        Network n = TestNetworks.Demo;
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(n, n.FindScenario("summer-night")),
            LoadFlowOptions.Default with { RegulateTaps = false });
        foreach (Transformer t in n.Transformers.Where(t => t.Tap is not null))
            Assert.Equal(t.Tap!.Position, r.Taps.Single(x => x.Id == t.Id).Position);
    }
}
