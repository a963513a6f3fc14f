// Motors in fault studies: their impedance and κ (IEC 60909-0), their decay in I_b, and where they are left out.
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class MotorFaultTests
{
    public static Motor Motor(string id = "M1", string bus = "B11", double mw = 1.6, double kv = 11, int polePairs = 2, int units = 1,
        bool lowVoltageGroup = false, double ratio = 6.0) => new()
    {
        Id = id, Bus = bus, Mw = mw, Kv = kv, PowerFactor = 0.87, Efficiency = 0.96, PolePairs = polePairs, Units = units,
        LowVoltageGroup = lowVoltageGroup, LockedRotor = new LockedRotor { CurrentRatio = ratio },
    };

    /// <summary>One motor alone at its bus: the fault is fed by the motor only.</summary>
    private static Network Alone(Motor motor, double busKv = 11) => new()
    {
        Name = "motor alone", Buses = [new Bus { Id = motor.Bus, Kv = busKv }], Motors = [motor],
    };

    /// <summary>A 33 kV grid feeding an 11 kV board through a 20 MVA Dyn11 bank, with motors on the board.</summary>
    private static Network Board(params Motor[] motors) => new()
    {
        Name = "board with motors",
        Buses = [new Bus { Id = "B33", Kv = 33 }, new Bus { Id = "B11", Kv = 11 }],
        Supplies = [Grid("B33", 1000, 10)],
        Transformers = [Bank("T1", "B33", "B11", 20, 33, 11, 10, 15, "Dyn11", lvNeutral: Solid)],
        Motors = motors,
    };

    private static FaultRequest ThreePhase => new() { Kinds = [FaultKind.ThreePhase] };

    // IEC 60909-0:2016 §6.8 (from memory): R_M/X_M = 0.10 with κ_M = 1.75 for HV motors of P_rM/p ≥ 1 MW,
    // 0.15 with κ_M = 1.65 below 1 MW per pole pair, 0.42 with κ_M = 1.3 for LV motor groups and motors at or
    // below 1 kV. A fault fed by the motor alone has the motor's R/X, so its κ is the table's (to its rounding).
    [Theory]
    [InlineData(2.0, 11, 2, false, 0.10, 1.75)]
    [InlineData(1.0, 11, 1, false, 0.10, 1.75)]
    [InlineData(1.6, 11, 2, false, 0.15, 1.65)]
    [InlineData(0.5, 0.4, 2, false, 0.42, 1.30)]
    [InlineData(0.9, 0.4, 2, true, 0.42, 1.30)]
    public void Kappa_of_a_motor_is_the_standards_value_for_its_class(double mw, double kv, int polePairs, bool group, double rOverX, double kappa)
    {
        var m = Motor(mw: mw, kv: kv, polePairs: polePairs, lowVoltageGroup: group);
        var f = Run(Alone(m, kv), ThreePhase).At("B11", FaultKind.ThreePhase);
        Assert.Equal(rOverX, f.ROverX, 12);
        Assert.Equal(rOverX, f.KappaROverX, 9);
        Assert.Equal(kappa, f.Kappa, 0.006); // the table's κ_M to its rounding
        Assert.Equal(1.02 + 0.98 * Math.Exp(-3 * rOverX), f.Kappa, 9);
    }

    // Between the standard's three classes κ follows κ = 1.02 + 0.98·e^(−3R/X) (IEC 60909-0 §8.1, from memory).
    [Fact]
    public void Kappa_between_the_motor_classes_follows_the_peak_factor_formula() =>
        Assert.Equal(1.02 + 0.98 * Math.Exp(-0.9), SymmetricalComponents.PeakFactor(0.3), 12);

    // Z_M = (1/(I_LR/I_rM))·U_rM²/S_rM (IEC 60909-0 §6.8, from memory), so a motor alone at its rated voltage feeds
    // I''k = c·U_n/(√3·|Z_M|) = c·(I_LR/I_rM)·I_rM: 1.1 × 6 × I_rM, I_rM = units·S_rM/(√3·U_rM), S_rM = P_rM/(η·cos φ).
    [Fact]
    public void A_motor_alone_feeds_c_times_its_locked_rotor_current()
    {
        var m = Motor(units: 2);
        double srM = 1.6 / (0.96 * 0.87), irKa = 2 * srM / (Math.Sqrt(3) * 11);
        var f = Run(Alone(m), ThreePhase).At("B11", FaultKind.ThreePhase);
        Assert.Equal(1.1 * 6 * irKa, f.IkKa!.Value, 9);
        Assert.Equal(11 * 11 / srM / 6 / 2, f.Z1Ohm!.Value.Magnitude, 9);
        var machine = Assert.Single(f.Machines);
        Assert.Equal(1.1 * 6, machine.RatedRatio, 9);
    }

    // I_b = I''k − ΔU''_M/(c·U_n/√3)·(1 − μ·q)·I''kM (IEC 60909-0 §9.1.3, from memory), worked by hand for the motor
    // alone: ΔU''_M = X_M·I''kM and I''kM = c/|Z_M|, so ΔU''/(c·U_n/√3) = X_M/|Z_M| = 1/√(1 + 0.15²); at t_min
    // 0.1 s with I''kM/I_rM = 6.6 and 0.8 MW per pole pair: μ = 0.62 + 0.72·e^(−0.32·6.6), q = 0.57 + 0.12·ln 0.8.
    [Fact]
    public void Breaking_current_of_a_motor_alone_matches_the_hand_calculation()
    {
        var f = Run(Alone(Motor()), ThreePhase).At("B11", FaultKind.ThreePhase);
        double mu = 0.62 + 0.72 * Math.Exp(-0.32 * 6.6), q = 0.57 + 0.12 * Math.Log(0.8);
        double expected = f.IkKa!.Value * (1 - (1 - mu * q) / Math.Sqrt(1 + 0.15 * 0.15));
        Assert.Equal(expected, f.IbKa!.Value, 9);
        Assert.True(f.IbKa < 0.5 * f.IkKa, "a motor alone has lost most of its AC current by 0.1 s");
        // Later contact separation, more decay.
        var later = Run(Alone(Motor()), ThreePhase with { TMinS = 0.25 }).At("B11", FaultKind.ThreePhase);
        Assert.True(later.IbKa < f.IbKa);
    }

    // On a board fed by the grid, only the motor's part decays: the grid's part (far from generators) stays.
    [Fact]
    public void On_a_board_only_the_motors_share_of_the_current_decays()
    {
        var withMotor = Run(Board(Motor(units: 2)), ThreePhase).At("B11", FaultKind.ThreePhase);
        var gridOnly = Run(Board(), ThreePhase).At("B11", FaultKind.ThreePhase);
        var motor = Assert.Single(withMotor.Machines);
        Assert.True(withMotor.IkKa > gridOnly.IkKa);
        double baseKa = 100 / (Math.Sqrt(3) * 11);
        Assert.Equal(withMotor.IkPu - motor.DecayPu(0.1), withMotor.IbPu, 12);
        Assert.Equal((withMotor.IkPu - motor.DecayPu(0.1)) * baseKa, withMotor.IbKa!.Value, 9);
        Assert.InRange(withMotor.IbKa!.Value, gridOnly.IkKa!.Value, withMotor.IkKa!.Value);
        // Without a machine nothing decays.
        Assert.Equal(gridOnly.IkKa, gridOnly.IbKa);
    }

    // Far-from-generator simplification: the steady-state current I_k is I''k without the motors.
    [Fact]
    public void Steady_state_current_leaves_the_motors_out()
    {
        var request = new FaultRequest { Kinds = AllKinds };
        var with = Run(Board(Motor(units: 2)), request);
        var without = Run(Board(), request);
        foreach (FaultKind kind in AllKinds)
        {
            Assert.Equal(without.At("B11", kind).IkKa!.Value, with.At("B11", kind).IkSteadyKa!.Value, 12);
            Assert.Equal(without.At("B33", kind).IkKa!.Value, with.At("B33", kind).IkSteadyKa!.Value, 12);
        }
        Assert.Contains(with.Notes, n => n.Contains("I''k with the motors left out", StringComparison.Ordinal));
    }

    // IEC 60909-0 (from memory): unbalanced faults take I_b = I''k; motors feed the negative sequence, not the zero sequence.
    [Fact]
    public void Unbalanced_faults_take_the_initial_current_and_motors_are_open_in_the_zero_sequence()
    {
        var request = new FaultRequest { Kinds = AllKinds };
        var with = Run(Board(Motor(units: 2)), request);
        var without = Run(Board(), request);
        foreach (FaultKind kind in AllKinds.Where(k => k != FaultKind.ThreePhase))
            Assert.Equal(with.At("B11", kind).IkKa, with.At("B11", kind).IbKa);
        Assert.Equal(without.At("B11", FaultKind.LineToEarth).Z0Pu, with.At("B11", FaultKind.LineToEarth).Z0Pu);
        Assert.True(with.At("B11", FaultKind.LineToLine).IkKa > without.At("B11", FaultKind.LineToLine).IkKa);
    }

    // IEC 60909-0 (from memory): minimum short-circuit currents leave motors out.
    [Fact]
    public void Minimum_levels_leave_the_motors_out_and_say_so()
    {
        var request = new FaultRequest { Kinds = [FaultKind.ThreePhase], Level = FaultLevel.Min };
        var with = Run(Board(Motor(units: 2)), request);
        var without = Run(Board(), request);
        Assert.Equal(without.At("B11", FaultKind.ThreePhase).IkKa, with.At("B11", FaultKind.ThreePhase).IkKa);
        Assert.Contains(with.Notes, n => n.Contains("motors left out", StringComparison.Ordinal));
    }

    [Fact]
    public void The_conservative_option_takes_the_breaking_current_as_the_initial_current()
    {
        var f = Run(Board(Motor(units: 2)), ThreePhase with { Breaking = BreakingCurrent.Conservative }).At("B11", FaultKind.ThreePhase);
        Assert.Equal(f.IkKa, f.IbKa);
        Assert.Empty(f.Machines);
    }

    // The load-flow method represents a running motor by its impedance, not also by its load.
    [Fact]
    public void The_load_flow_method_takes_a_running_motor_as_its_impedance_only()
    {
        var network = Board(Motor(units: 2));
        var flow = Run(network, ThreePhase with { Method = FaultMethod.LoadFlow }).At("B11", FaultKind.ThreePhase);
        var iec = Run(network, ThreePhase).At("B11", FaultKind.ThreePhase);
        var gridOnly = Run(Board(), ThreePhase with { Method = FaultMethod.LoadFlow }).At("B11", FaultKind.ThreePhase);
        Assert.True(flow.IkKa > gridOnly.IkKa);
        Assert.InRange(iec.IkKa!.Value / flow.IkKa!.Value, 1.0, 1.2);
    }
}
