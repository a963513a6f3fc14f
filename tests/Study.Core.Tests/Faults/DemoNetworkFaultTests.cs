// The bundled demo network end to end, and the input errors a fault study reports.
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class DemoNetworkFaultTests
{
    private static FaultResult Scan(Network network) => FaultStudy.Run(PerUnitModel.Build(network));

    [Fact]
    public void Every_demo_bus_gets_three_phase_and_earth_fault_levels_and_every_breaker_a_duty()
    {
        var network = TestNetworks.Demo;
        var result = Scan(network);
        Assert.Equal(FaultStudy.Caution, result.Caution);
        foreach (Bus bus in network.Buses)
            foreach (FaultKind kind in new[] { FaultKind.ThreePhase, FaultKind.LineToEarth })
            {
                var f = result.At(bus.Id, kind);
                Assert.True(double.IsFinite(f.IkKa!.Value) && f.IkKa > 0, $"{bus.Id} {kind}: I''k {f.IkKa}");
                Assert.True(f.IpKa > f.IkKa * Math.Sqrt(2) && f.Kappa < 2, $"{bus.Id} {kind}: kappa {f.Kappa}");
            }
        Assert.Equal(network.Breakers.Count, result.Breakers.Count);
        Assert.All(result.Breakers, b => Assert.True(b.DutyPercent > 0 && double.IsFinite(b.DutyPercent!.Value), b.Id));
    }

    // Physical monotonicity: a passive network with one more source can only see more fault current.
    [Fact]
    public void Fault_level_never_falls_when_a_source_is_added()
    {
        var with = TestNetworks.Demo;
        var without = with with { Generators = with.Generators.Select(g => g with { InService = false }).ToList() };
        var more = Scan(with);
        var less = Scan(without);
        foreach (ShortCircuitLevel f in less.Faults)
            Assert.True(more.At(f.Bus, f.Kind).IkKa >= f.IkKa * (1 - 1e-12), $"{f.Bus} {f.Kind}");
        Assert.True(more.At("MRG11", FaultKind.ThreePhase).IkKa > less.At("MRG11", FaultKind.ThreePhase).IkKa * 1.2);
    }

    // The breaking check now uses I_b at the breaker's own t_min (it used I''k before the duty checks), and a
    // breaker on a branch carries the larger of its two sides; the duty is the worst of its four checks.
    [Fact]
    public void Breaker_duty_is_the_worst_of_its_checks_each_from_the_largest_current_it_carries()
    {
        var result = Scan(TestNetworks.Demo);
        var cb = result.Breakers.Single(b => b.Id == "CB-CS11");
        var carried = result.Faults.Where(f => f.Bus == "CS11").SelectMany(f => f.BreakerCurrents).Where(c => c.Breaker == "CB-CS11")
            .SelectMany(c => c.Sides).ToList();
        double baseKa = 100 / (Math.Sqrt(3) * 11);
        Assert.Equal(100 * carried.Max(s => s.IbPu) * baseKa / 8, cb.BreakingPercent!.Value, 1e-9);
        Assert.Equal(100 * carried.Max(s => s.IpPu) * baseKa / 20, cb.MakingPercent!.Value, 1e-9);
        Assert.Equal(4, cb.Checks.Count);
        Assert.Equal(cb.Checks.Max(c => c.DutyPercent), cb.DutyPercent);
        var expected = cb.DutyPercent > 100 ? DutyStatus.Over : cb.DutyPercent > 90 ? DutyStatus.Warning : DutyStatus.Ok;
        Assert.Equal(expected, cb.Status);
    }

    [Fact]
    public void A_breaker_without_ratings_reports_no_rating()
    {
        var demo = TestNetworks.Demo;
        var network = demo with { Breakers = [new Breaker { Id = "CB-X", Bus = "QE33" }] };
        Assert.Equal(DutyStatus.NoRating, Scan(network).Breakers.Single().Status);
    }

    [Fact]
    public void Load_flow_method_gives_levels_close_to_the_iec_method_on_the_demo()
    {
        var model = PerUnitModel.Build(TestNetworks.Demo);
        var iec = FaultStudy.Run(model, new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        var flow = FaultStudy.Run(model, new FaultRequest { Kinds = [FaultKind.ThreePhase], Method = FaultMethod.LoadFlow });
        // c = 1.1 against pre-fault voltages near 1.0 pu: the IEC maximum is higher, by at most about 15 %.
        foreach (ShortCircuitLevel f in flow.Faults)
            Assert.InRange(iec.At(f.Bus, f.Kind).IkKa!.Value / f.IkKa!.Value, 0.95, 1.2);
    }

    [Fact]
    public void Unknown_bus_is_an_input_error_naming_it()
    {
        var e = Assert.Throws<InputException>(() =>
            FaultStudy.Run(PerUnitModel.Build(TestNetworks.Demo), new FaultRequest { Buses = ["NOWHERE"] }));
        Assert.Equal("NOWHERE", e.ElementId);
        Assert.Contains("NOWHERE", e.Message);
    }

    [Fact]
    public void Line_without_zero_sequence_data_in_an_earth_fault_study_is_an_input_error_naming_it()
    {
        var demo = TestNetworks.Demo;
        var network = demo with
        {
            Lines = demo.Lines.Select(l => l.Id == "RING-2" ? l with { Z0 = null } : l).ToList(),
        };
        var model = PerUnitModel.Build(network);
        var e = Assert.Throws<InputException>(() => FaultStudy.Run(model));
        Assert.Equal("RING-2", e.ElementId);
        Assert.Contains("line RING-2 has no zero-sequence data (z0)", e.Message);
        // A three-phase study does not need the zero sequence.
        var three = FaultStudy.Run(model, new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        Assert.All(three.Faults, f => Assert.Null(f.Z0Pu));
    }

    [Fact]
    public void Transformer_without_vector_group_in_an_earth_fault_study_is_an_input_error_naming_it()
    {
        var demo = TestNetworks.Demo;
        var network = demo with { Transformers = demo.Transformers.Select(t => t.Id == "CQ-T1" ? t with { VectorGroup = null } : t).ToList() };
        var e = Assert.Throws<InputException>(() => Scan(network));
        Assert.Equal("CQ-T1", e.ElementId);
        Assert.Contains("vector group", e.Message);
    }

    [Fact]
    public void When_asked_the_study_gives_three_phase_levels_without_zero_sequence_data_and_lists_every_element_that_lacks_it()
    {
        var demo = TestNetworks.Demo;
        var network = demo with
        {
            Lines = demo.Lines.Select(l => l.Id == "RING-2" ? l with { Z0 = null } : l).ToList(),
            Transformers = demo.Transformers.Select(t => t.Id == "CQ-T1" ? t with { VectorGroup = null } : t).ToList(),
        };
        var request = new FaultRequest { Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth], LeaveOutEarthFaultsWithoutZeroSequence = true };
        FaultResult result = FaultStudy.Run(PerUnitModel.Build(network), request);

        Assert.Equal([FaultKind.LineToEarth], result.LeftOut);
        Assert.Equal(["RING-2", "CQ-T1"], result.MissingZeroSequence.Select(m => m.ElementId).Order().Reverse().ToList());
        Assert.Contains(result.MissingZeroSequence, m => m.Message.Contains("no zero-sequence data (z0)", StringComparison.Ordinal));
        Assert.Contains(result.MissingZeroSequence, m => m.Message.Contains("no vector group", StringComparison.Ordinal));
        Assert.All(result.Faults, f => Assert.Equal(FaultKind.ThreePhase, f.Kind));
        // The three-phase fault sees the positive sequence only (Fortescue): its levels are those of the
        // complete network, bus by bus.
        FaultResult complete = FaultStudy.Run(PerUnitModel.Build(demo), new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        Assert.Equal(complete.Faults.Count, result.Faults.Count);
        for (int i = 0; i < complete.Faults.Count; i++)
            Assert.Equal(complete.Faults[i].IkKa!.Value, result.Faults[i].IkKa!.Value, 9);
        Assert.Equal(demo.Breakers.Count, result.Breakers.Count);

        // Without the request's consent it stays an input error naming the first element, as before.
        Assert.Throws<InputException>(() => FaultStudy.Run(PerUnitModel.Build(network), request with { LeaveOutEarthFaultsWithoutZeroSequence = false }));
    }

    // Kirchhoff at the faulted bus: the branch contributions and the local sources add up to the fault current.
    [Fact]
    public void Branch_contributions_at_a_bus_without_a_source_add_up_to_the_fault_current()
    {
        var result = FaultStudy.Run(PerUnitModel.Build(TestNetworks.Demo),
            new FaultRequest { Buses = ["QE33"], Kinds = [FaultKind.ThreePhase] });
        var f = result.Faults.Single();
        Assert.Equal(2, f.Contributions.Count);
        Assert.All(f.Contributions, c => Assert.Equal(ContributionDirection.IntoFault, c.Direction));
        // Two ring feeders into QE33; their phasors are almost in phase, so magnitudes add to within a few per cent.
        double sum = f.Contributions.Sum(c => c.IkKa!.Value);
        Assert.InRange(sum / f.IkKa!.Value, 1.0 - 1e-9, 1.05);
        Assert.Equal(0, f.Voltages[0].VaPu, 9);
    }
}
