// Outage screening: islanded load is counted, a bank's outage overloads its partner, the order never depends on threads.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;
using Study.Core.Cases;

namespace Study.Core.Tests.Studies;

public class OutageScreeningTests
{
    /// <summary>
    /// S —(twin feeders A1, A2)— A —(spur B1)— B, with 12 MW at A and 3 MW at B (constant power).
    /// One feeder out leaves the other carrying all of it, about 15.5 MVA: 78 % of 20 MVA, over 150 % of 10 MVA.
    /// </summary>
    private static Network TwinFeederWithSpur(double feederRatingMva) => new()
    {
        Name = "twin feeder with a spur",
        Buses = [new Bus { Id = "S", Kv = 33 }, new Bus { Id = "A", Kv = 33 }, new Bus { Id = "B", Kv = 33 }],
        Supplies = [new Supply { Id = "GRID", Bus = "S", ScMvaMax = 2000, Xr = 10 }],
        Lines =
        [
            new Line { Id = "A1", From = "S", To = "A", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.5, X = 1.0 }, RatingMva = feederRatingMva },
            new Line { Id = "A2", From = "S", To = "A", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.5, X = 1.0 }, RatingMva = feederRatingMva },
            new Line { Id = "B1", From = "A", To = "B", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.4, X = 0.8 }, RatingMva = 10 },
        ],
        Loads = [new Load { Id = "LA", Bus = "A", PMw = 12, QMvar = 3 }, new Load { Id = "LB", Bus = "B", PMw = 3, QMvar = 1 }],
    };

    [Fact]
    public void Taking_out_the_spur_islands_its_bus_and_loses_exactly_its_load()
    {
        OutageScreeningResult r = StudyCase.Of(TwinFeederWithSpur(20)).Outages(new OutageScreeningRequest());
        OutageCase spur = r.Scenarios.Single().Outages.Single(o => o.Element == "B1");
        Assert.True(spur.Converged);
        Assert.Equal(["B"], spur.IslandedBuses);
        Assert.Equal(3.0, spur.LostLoadMw, 6);
        Assert.InRange(spur.Severity, OutageSeverity.LostLoadBase, OutageSeverity.NoConvergence - 1);
        Assert.Equal("B1", r.Scenarios.Single().Outages[0].Element);
    }

    [Fact]
    public void One_twin_feeder_out_overloads_the_other_when_it_cannot_carry_the_whole_load()
    {
        OutageCase feeder = StudyCase.Of(TwinFeederWithSpur(10)).Outages(new OutageScreeningRequest { ElementIds = ["A1"] })
            .Scenarios.Single().Outages.Single();
        Assert.Empty(feeder.IslandedBuses);
        OutageViolation overload = Assert.Single(feeder.NewViolations, v => v.Type == ViolationKind.Overload);
        Assert.Equal("A2", overload.Element);
        // 15 MW + 4 Mvar of load plus the losses on one 10 MVA feeder: a little above 155 %.
        Assert.InRange(overload.Value, 150, 165);
        Assert.Null(overload.IntactValue);
        Assert.Equal("A2", feeder.WorstLoadingElement);
        Assert.InRange(feeder.Severity, overload.Value - 100, OutageSeverity.LostLoadBase);
    }

    [Fact]
    public void The_load_flow_with_one_feeder_out_carries_the_whole_load_on_the_other_and_agrees_with_the_screening_row()
    {
        StudyCase study = StudyCase.Of(TwinFeederWithSpur(10));
        LoadFlowResult after = study.SolveWithout("A1", new SolveRequest());
        Assert.True(after.Converged);
        OutageCase row = study.Outages(new OutageScreeningRequest { ElementIds = ["A1"] }).Scenarios.Single().Outages.Single();
        // Kirchhoff at bus A: with A1 out, A2 alone brings A's 12 MW and what the spur takes on to B.
        BranchResult a2 = after.Branches.Single(b => b.Id == "A2");
        BranchResult b1 = after.Branches.Single(b => b.Id == "B1");
        Assert.Equal(12 + b1.PFromMw, -a2.PToMw, 6);
        Assert.All(after.Branches.Where(b => b.Id == "A1"), b => Assert.Equal(0, b.PFromMw, 9));
        // The screening's values-only solve and this full solve each stop at the convergence tolerance: they agree to 1e-4 %.
        Assert.Equal(row.WorstLoadingPercent!.Value, a2.LoadingPercent!.Value, 4);
        Assert.Equal(row.WorstVPu!.Value, after.Buses.Single(b => b.Id == row.WorstVBus).VPu, 9);
        Assert.Throws<InputException>(() => study.SolveWithout("NOPE", new SolveRequest()));
    }

    [Fact]
    public void Demo_cold_quay_bank_out_islands_the_11kV_buses_with_11_MW_lost_at_winter_peak()
    {
        // The 11 MW of loads and running motors at Cold Quay 11 kV and its 415 V board are partly constant
        // impedance: below 1 pu they draw a little less than 11 MW.
        Network demo = TestNetworks.Demo;
        ScenarioScreening winter = StudyCase.Of(demo).Outages(new OutageScreeningRequest { Scenarios = [] })
            .Scenarios.Single(s => s.Scenario == "winter-peak");
        OutageCase bank = winter.Outages.Single(o => o.Element == "CQ-T1");
        Assert.True(bank.Converged);
        Assert.Equal(["CQ11", "CS04", "CS11", "PS11"], bank.IslandedBuses.Order());
        Assert.InRange(bank.LostLoadMw, 10.5, 11.0);
        LoadFlowResult intact = LoadFlowSolver.Solve(PerUnitModel.Build(demo, demo.FindScenario("winter-peak")));
        Assert.Equal(intact.Buses.Where(b => bank.IslandedBuses.Contains(b.Id)).Sum(b => b.PLoadMw), bank.LostLoadMw, 9);
        Assert.Equal("CQ-T1", winter.Outages[0].Element);
    }

    [Fact]
    public void Demo_GT1_out_at_winter_peak_overloads_GT2_to_about_120_percent_as_a_direct_solve_shows()
    {
        Network demo = TestNetworks.Demo;
        Scenario winter = demo.FindScenario("winter-peak")!;
        OutageCase gt1 = StudyCase.Of(demo).Outages(new OutageScreeningRequest { ElementIds = ["GT1"], Scenarios = [winter.Name] })
            .Scenarios.Single().Outages.Single();

        var without = demo with { Transformers = demo.Transformers.Select(t => t.Id == "GT1" ? t with { InService = false } : t).ToList() };
        double direct = LoadFlowSolver.Solve(PerUnitModel.Build(without, winter)).Branches.Single(b => b.Id == "GT2").LoadingPercent!.Value;

        OutageViolation overload = Assert.Single(gt1.NewViolations, v => v.Element == "GT2");
        Assert.Equal(ViolationKind.Overload, overload.Type);
        Assert.Equal(direct, overload.Value, 3);
        Assert.InRange(overload.Value, 115, 125);
        Assert.Equal("GT2", gt1.WorstLoadingElement);
        Assert.Equal(direct, gt1.WorstLoadingPercent!.Value, 3);
    }

    [Fact]
    public void Results_and_their_order_are_the_same_on_one_core_and_on_many()
    {
        Network demo = TestNetworks.Demo;
        var request = new OutageScreeningRequest { Scenarios = [] };
        OutageScreeningResult one = StudyCase.Of(demo).Outages(request with { MaxParallelism = 1 });
        OutageScreeningResult many = StudyCase.Of(demo).Outages(request with { MaxParallelism = 8 });
        static string Key(OutageScreeningResult r) => string.Join("\n", r.Scenarios.SelectMany(s => s.Outages.Select(o =>
            $"{s.Scenario} {o.Element} {o.Severity:R} {o.WorstVPu:R} {o.WorstLoadingPercent:R} {o.NewViolations.Count}")));
        Assert.Equal(Key(one), Key(many));
        Assert.Equal(demo.Lines.Count + demo.Transformers.Count, one.Scenarios[0].Outages.Count);
        foreach (ScenarioScreening s in one.Scenarios)
            Assert.True(s.Outages.Zip(s.Outages.Skip(1)).All(p => p.First.Severity >= p.Second.Severity));
    }

    [Fact]
    public void Progress_reaches_one_and_a_cancelled_screening_stops()
    {
        Network demo = TestNetworks.Demo;
        var reports = new List<double>();
        StudyCase.Of(demo).Outages(new OutageScreeningRequest(), new Recorder(reports));
        Assert.Equal(1.0, reports[^1], 12);
        Assert.True(reports.Zip(reports.Skip(1)).All(p => p.First < p.Second));

        using var cancel = new CancellationTokenSource();
        cancel.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => StudyCase.Of(demo).Outages(new OutageScreeningRequest(), cancel: cancel.Token));
    }

    [Fact]
    public void Unknown_or_out_of_service_elements_are_refused_by_name()
    {
        Network demo = TestNetworks.Demo;
        var unknown = Assert.Throws<InputException>(() => StudyCase.Of(demo).Outages(new OutageScreeningRequest { ElementIds = ["GT9"] }));
        Assert.Contains("GT9", unknown.Message);
        Assert.Contains("GT1", unknown.Message);
        var off = demo with { Lines = demo.Lines.Select(l => l.Id == "RING-1" ? l with { InService = false } : l).ToList() };
        var already = Assert.Throws<InputException>(() => StudyCase.Of(off).Outages(new OutageScreeningRequest { ElementIds = ["RING-1"] }));
        Assert.Contains("already out of service", already.Message);
    }

    [Fact]
    public void Severity_puts_no_convergence_above_any_lost_load_and_any_lost_load_above_any_stress()
    {
        Assert.Equal(1000, OutageSeverity.Score(false, 0, 100, 0));
        Assert.Equal(100 + 899 * 0.5, OutageSeverity.Score(true, 50, 100, 500), 9);
        Assert.True(OutageSeverity.Score(true, 0.01, 100, 0) > OutageSeverity.Score(true, 0, 100, 10_000));
        Assert.Equal(20, OutageSeverity.Score(true, 0, 100, 20), 9);
        Assert.Equal(0, OutageSeverity.Score(true, 0, 100, 0));
    }

    private sealed class Recorder(List<double> values) : IProgress<double>
    {
        public void Report(double value) => values.Add(value);
    }
}
