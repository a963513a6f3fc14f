// Compare: a case against itself changes nothing; the demo's new bank adds its 11 kV buses and loads the 33 kV ring.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Cases;

namespace Study.Core.Tests.Studies;

public class CaseComparisonTests
{
    [Fact]
    public void A_network_compared_with_itself_shows_no_change()
    {
        Network demo = TestNetworks.Demo;
        Scenario winter = demo.FindScenario("winter-peak")!;
        CaseComparisonResult r = StudyCase.Compare(StudyCase.Of(demo), winter?.Name, StudyCase.Of(demo), winter?.Name);
        Assert.True(r.BeforeConverged && r.AfterConverged);
        Assert.Equal(demo.Buses.Count, r.Buses.Count);
        Assert.All(r.Buses, b => Assert.Equal(CaseMembership.Both, b.Membership));
        Assert.All(r.Buses, b => Assert.Equal(0, b.DeltaPu!.Value, 12));
        Assert.All(r.Branches, b => Assert.Equal(0, b.DeltaMw!.Value, 9));
        Assert.Equal(r.LossBeforeMw, r.LossAfterMw, 12);
        Assert.Empty(r.ViolationsAppeared);
        Assert.Empty(r.ViolationsCleared);
    }

    [Fact]
    public void The_new_bank_adds_the_11kV_buses_and_lowers_the_voltage_at_Cold_Quay_33kV()
    {
        Network before = TestNetworks.DemoBefore, after = TestNetworks.Demo;
        Scenario winter = before.FindScenario("winter-peak")!;
        CaseComparisonResult r = StudyCase.Compare(StudyCase.Of(before), winter?.Name, StudyCase.Of(after), "winter-peak");

        var added = r.Buses.Where(b => b.Membership == CaseMembership.Added).ToList();
        Assert.Equal(["CQ11", "CS04", "CS11", "PS11"], added.Select(b => b.Id).Order());
        Assert.All(added, b => Assert.Null(b.BeforePu));
        Assert.All(added, b => Assert.NotNull(b.AfterPu));
        Assert.DoesNotContain(r.Buses, b => b.Membership == CaseMembership.Removed);

        // Every shared bus has both voltages. The grid banks regulate WRB33 and step their taps, so the
        // ring's voltages need not fall; what the 11 MW drawn at CQ33 must do is widen the drop from the
        // regulated busbar to CQ33.
        var shared = r.Buses.Where(b => b.Membership == CaseMembership.Both).ToList();
        Assert.Equal(before.Buses.Count, shared.Count);
        Assert.All(shared, b => Assert.NotNull(b.DeltaPu));
        BusChange wrb = r.Buses.Single(b => b.Id == "WRB33"), cq = r.Buses.Single(b => b.Id == "CQ33");
        Assert.True(wrb.AfterPu - cq.AfterPu > wrb.BeforePu - cq.BeforePu + 0.001);
        Assert.Contains(r.Taps, t => t.Id == "CQ-T1" && t.BeforePosition is null);

        Assert.Contains(r.Branches, b => b.Id == "CQ-T1" && b.Membership == CaseMembership.Added);
        Assert.True(r.LossAfterMw > r.LossBeforeMw);
        Assert.Equal(11.0, r.LoadAfterMw - r.LoadBeforeMw, 0);
    }

    [Fact]
    public void With_the_grid_banks_held_on_one_tap_the_new_bank_lowers_every_33kV_voltage()
    {
        static Network Held(Network n) => n with
        {
            Transformers = n.Transformers.Select(t => t.Id is "GT1" or "GT2" ? t with { Tap = t.Tap! with { Position = -2 } } : t).ToList(),
        };
        Network before = Held(TestNetworks.DemoBefore), after = Held(TestNetworks.Demo);
        CaseComparisonResult r = StudyCase.Compare(StudyCase.Of(before), "winter-peak", StudyCase.Of(after), "winter-peak",
            LoadFlowOptions.Default with { RegulateTaps = false });
        var ring = r.Buses.Where(b => b.Kv == 33).ToList();
        Assert.Equal(4, ring.Count);
        Assert.All(ring, b => Assert.True(b.DeltaPu < 0, $"{b.Id} {b.DeltaPu}"));
        Assert.True(r.Buses.Single(b => b.Id == "CQ33").DeltaPu < r.Buses.Single(b => b.Id == "WRB33").DeltaPu);
    }

    [Fact]
    public void Summer_night_against_winter_peak_raises_the_ring_voltages_and_cuts_the_losses()
    {
        Network demo = TestNetworks.Demo;
        CaseComparisonResult r = StudyCase.Compare(StudyCase.Of(demo), "winter-peak", StudyCase.Of(demo), "summer-night");
        Assert.Equal("winter-peak", r.BeforeScenario);
        Assert.Equal("summer-night", r.AfterScenario);
        Assert.True(r.Buses.Single(b => b.Id == "CQ33").DeltaPu > 0);
        Assert.True(r.LossAfterMw < r.LossBeforeMw);
        Assert.Equal(demo.Buses.Count, r.Buses.Count);
    }

    [Fact]
    public void A_case_that_does_not_converge_is_reported_with_nothing_compared()
    {
        Network demo = TestNetworks.Demo;
        var heavy = demo with { Scenarios = [new Scenario { Name = "impossible", LoadScale = 40 }] };
        CaseComparisonResult r = StudyCase.Compare(StudyCase.Of(demo), null, StudyCase.Of(heavy), "impossible");
        Assert.True(r.BeforeConverged);
        Assert.False(r.AfterConverged);
        Assert.NotNull(r.AfterMessage);
        Assert.Empty(r.Buses);
    }
}
