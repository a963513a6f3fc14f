// Breaker duty, one check at a time: each check trips on a fixture rated just below what it must stand.
using Study.Core.Faults;
using Study.Core.Model;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class BreakerCheckTests
{
    /// <summary>A 33 kV grid through a 20 MVA bank (or two in parallel) to an 11 kV board with 2 × 1.6 MW motors.</summary>
    private static Network Board(Breaker breaker, bool twoBanks = false) => new()
    {
        Name = "board",
        Buses = [new Bus { Id = "B33", Kv = 33 }, new Bus { Id = "B11", Kv = 11 }],
        Supplies = [Grid("B33", 1000, 10)],
        Transformers = twoBanks
            ? [Bank("T1", "B33", "B11", 10, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid), Bank("T2", "B33", "B11", 10, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid)]
            : [Bank("T1", "B33", "B11", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid)],
        Motors = [MotorFaultTests.Motor(units: 2)],
        Breakers = [breaker],
    };

    private static readonly FaultRequest Request = new() { Kinds = [FaultKind.ThreePhase], TMinS = 0.02, DurationS = 1 };

    /// <summary>The three-phase fault at the board (I_b, i_DC at t_min 0.02 s) that the breaker's ratings are set against.</summary>
    private static ShortCircuitLevel Level => Run(Board(Rated(1000)), Request).At("B11", FaultKind.ThreePhase);

    /// <summary>A breaker at the board rated far above its duty in every check.</summary>
    private static Breaker Rated(double ka) => new()
    {
        Id = "CB", Bus = "B11", InterruptingKa = ka, PeakKa = 3 * ka, DcPercent = 100, ShortTimeKa = ka, ShortTimeS = 1, MinTripS = 0.02,
    };

    private static BreakerDuty Duty(Breaker breaker, FaultRequest? request = null, bool twoBanks = false) =>
        Assert.Single(Run(Board(breaker, twoBanks), request ?? Request).Breakers);

    private static DutyCheck Check(BreakerDuty duty, DutyCheckKind kind) => duty.Checks.Single(c => c.Check == kind);

    [Fact]
    public void The_breaking_check_trips_when_I_b_exceeds_the_rated_breaking_current()
    {
        var level = Level;
        var duty = Duty(Rated(1000) with { InterruptingKa = 0.98 * level.IbKa!.Value });
        var breaking = Check(duty, DutyCheckKind.Breaking);
        Assert.Equal(DutyStatus.Over, breaking.Status);
        Assert.Equal(level.IbKa!.Value, breaking.RequiredKa!.Value, 9);
        Assert.Equal(100 / 0.98, breaking.DutyPercent!.Value, 9);
        Assert.Equal(DutyStatus.Over, duty.Status);
        Assert.All(duty.Checks.Where(c => c.Check != DutyCheckKind.Breaking && c.Check != DutyCheckKind.BreakingAsym),
            c => Assert.Equal(DutyStatus.Ok, c.Status));
    }

    // IEC 62271-100 terms (from memory): the rated asymmetric breaking current is I_sc·√(1 + 2·(dc/100)²); the
    // duty's DC percentage at contact separation is 100·i_DC/(√2·I_b).
    [Fact]
    public void The_asymmetric_check_trips_on_the_dc_component_the_symmetrical_check_does_not_see()
    {
        var level = Level;
        Assert.True(level.IdcKa > 0.5 * level.IbKa, "the fixture's DC component at 20 ms is large");
        var duty = Duty(Rated(1000) with { InterruptingKa = 1.02 * level.IbKa!.Value, DcPercent = 20 });
        var asym = Check(duty, DutyCheckKind.BreakingAsym);
        Assert.Equal(DutyStatus.Warning, Check(duty, DutyCheckKind.Breaking).Status);
        Assert.Equal(DutyStatus.Over, asym.Status);
        Assert.Equal(level.IbAsymKa!.Value, asym.RequiredKa!.Value, 9);
        Assert.Equal(1.02 * level.IbKa!.Value * Math.Sqrt(1 + 2 * 0.2 * 0.2), asym.RatedKa!.Value, 9);
        Assert.Equal(100 * level.IdcKa!.Value / (Math.Sqrt(2) * level.IbKa!.Value), asym.DcPercent!.Value, 9);
        Assert.Equal(20, asym.RatedDcPercent);
        // Without dcPercent there is no asymmetric rating to check against.
        Assert.Equal(DutyStatus.NoRating, Check(Duty(Rated(1000) with { DcPercent = null }), DutyCheckKind.BreakingAsym).Status);
    }

    [Fact]
    public void The_making_check_trips_when_i_p_exceeds_the_rated_peak()
    {
        var level = Level;
        var duty = Duty(Rated(1000) with { PeakKa = 0.9 * level.IpKa!.Value });
        var making = Check(duty, DutyCheckKind.Making);
        Assert.Equal(DutyStatus.Over, making.Status);
        Assert.Equal(level.IpKa!.Value, making.RequiredKa!.Value, 9);
        Assert.Equal(making.DutyPercent, duty.MakingPercent);
    }

    // Common practice for switchgear and busbars: a rating I_thr for T_kr covers I_th for T_k when
    // I_th ≤ I_thr·√(T_kr/T_k) for T_k ≥ T_kr, and I_th ≤ I_thr for T_k < T_kr.
    [Fact]
    public void The_short_time_check_refers_I_th_to_the_rated_duration_and_trips_above_it()
    {
        var three = Request with { DurationS = 3 };
        var level = Run(Board(Rated(1000)), three).At("B11", FaultKind.ThreePhase);
        var duty = Duty(Rated(1000) with { ShortTimeKa = 1.2 * level.IthKa!.Value, ShortTimeS = 1 }, three);
        var st = Check(duty, DutyCheckKind.ShortTime);
        Assert.Equal(level.IthKa!.Value * Math.Sqrt(3), st.RequiredKa!.Value, 9);
        Assert.Equal(DutyStatus.Over, st.Status);
        // A fault shorter than the rated duration is held against the rating as it is.
        var half = Request with { DurationS = 0.5 };
        var shortLevel = Run(Board(Rated(1000)), half).At("B11", FaultKind.ThreePhase);
        var shortDuty = Duty(Rated(1000) with { ShortTimeKa = 1.05 * shortLevel.IthKa!.Value, ShortTimeS = 1 }, half);
        var shortCheck = Check(shortDuty, DutyCheckKind.ShortTime);
        Assert.Equal(shortLevel.IthKa!.Value, shortCheck.RequiredKa!.Value, 9);
        Assert.Equal(DutyStatus.Warning, shortCheck.Status);
    }

    [Fact]
    public void A_breaker_with_its_own_minimum_trip_time_is_checked_at_that_time()
    {
        var late = Duty(Rated(1000) with { MinTripS = 0.25 });
        var early = Duty(Rated(1000) with { MinTripS = 0.02 });
        Assert.Equal(0.25, late.TMinS);
        Assert.True(Check(late, DutyCheckKind.Breaking).RequiredKa < Check(early, DutyCheckKind.Breaking).RequiredKa, "motors decay more by 0.25 s");
        Assert.True(Check(late, DutyCheckKind.BreakingAsym).DcPercent < Check(early, DutyCheckKind.BreakingAsym).DcPercent);
        // Without minTripS the study's t_min applies.
        Assert.Equal(0.02, Duty(Rated(1000) with { MinTripS = null }).TMinS);
    }

    // A breaker that switches the bank at the board carries, for a fault on its bus side, the bank's contribution
    // (the grid's whole current: the board is at zero volts either way) and, for one on its bank side, the rest
    // (the motors' current). The bank splits the network, so only the motors' side decays.
    [Fact]
    public void A_breaker_on_a_branch_takes_the_worse_of_the_branch_current_and_the_bus_total_minus_it()
    {
        var request = Request with { TMinS = 0.1 };
        var result = Run(Board(Rated(1000) with { Branch = "T1", MinTripS = 0.1 }), request);
        var fault = result.At("B11", FaultKind.ThreePhase);
        var gridOnly = Run(Board(Rated(1000)) with { Motors = [] }, request).At("B11", FaultKind.ThreePhase);
        var motorOnly = Run(Board(Rated(1000)) with { Supplies = [] }, request).At("B11", FaultKind.ThreePhase);
        var carried = Assert.Single(fault.BreakerCurrents);
        Assert.True(carried.DecayCredited);
        var bankSide = carried.Sides.Single(s => s.Side == DutySide.BusSideFault);
        var motorSide = carried.Sides.Single(s => s.Side == DutySide.BranchSideFault);
        Assert.Equal(gridOnly.IkPu, bankSide.IkPu, 9);
        Assert.Equal(bankSide.IkPu, bankSide.IbPu, 12);
        Assert.Equal(motorOnly.IkPu, motorSide.IkPu, 9);
        Assert.Equal(motorSide.IkPu - fault.Machines.Single().DecayPu(0.1), motorSide.IbPu, 9);
        Assert.Equal(fault.Kappa * Math.Sqrt(2) * motorSide.IkPu, motorSide.IpPu, 12);
        var duty = Assert.Single(result.Breakers);
        Assert.Equal("T1", duty.Branch);
        Assert.All(duty.Checks, c => Assert.Equal(DutySide.BusSideFault, c.Side));
        Assert.Equal(bankSide.IkPu * 100 / (Math.Sqrt(3) * 11), duty.IkKa!.Value, 9);
    }

    // With two banks in parallel the branch splits nothing: no machine's decay can be placed on either side.
    [Fact]
    public void A_branch_that_splits_nothing_credits_no_decay_to_either_side()
    {
        var result = Run(Board(Rated(1000) with { Branch = "T1" }, twoBanks: true), Request);
        var carried = Assert.Single(result.At("B11", FaultKind.ThreePhase).BreakerCurrents);
        Assert.False(carried.DecayCredited);
        Assert.All(carried.Sides, s => Assert.Equal(s.IkPu, s.IbPu));
        Assert.Contains(result.Notes, n => n.Contains("does not split the network", StringComparison.Ordinal));
    }

    [Fact]
    public void A_breaker_without_a_rating_for_a_check_reports_no_rating_for_it()
    {
        var duty = Duty(new Breaker { Id = "CB", Bus = "B11", PeakKa = 500 });
        Assert.Equal(DutyStatus.NoRating, Check(duty, DutyCheckKind.Breaking).Status);
        Assert.Equal(DutyStatus.NoRating, Check(duty, DutyCheckKind.ShortTime).Status);
        Assert.Equal(DutyStatus.Ok, Check(duty, DutyCheckKind.Making).Status);
        Assert.Equal(DutyStatus.Ok, duty.Status);
        Assert.Equal(DutyStatus.NoRating, Duty(new Breaker { Id = "CB", Bus = "B11" }).Status);
    }
}
