// Motor starting against the closed form of one source, one transformer and one motor, and the starters' ratios.
using System.Numerics;
using Study.Core.Cases;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.Core.Tests.Studies;

public class MotorStartTests
{
    /// <summary>
    /// A 33 kV supply (scMvaMin 200 MVA, X/R 10; no fault level: an infinite source) feeding an 11 kV motor bus through a
    /// 10 MVA, 8 %, X/R 12 bank with no magnetising data, and one 2 MW motor that is started.
    /// </summary>
    private static Network Circuit(MotorStarter? starter = null, double? scMva = 200, int units = 1) => new()
    {
        Name = "start",
        Buses = [new Bus { Id = "S", Kv = 33 }, new Bus { Id = "M", Kv = 11, VMin = 0.5 }],
        Supplies = [new Supply { Id = "GRID", Bus = "S", ScMvaMax = scMva is null ? null : 2 * scMva, ScMvaMin = scMva, Xr = 10 }],
        Transformers = [new Transformer { Id = "T", Hv = "S", Lv = "M", Mva = 10, HvKv = 33, LvKv = 11, ZPercent = 8, Xr = 12, VectorGroup = "Dyn11" }],
        Motors =
        [
            new Motor
            {
                Id = "PUMP", Bus = "M", Mw = 2, Kv = 11, PowerFactor = 0.88, Efficiency = 0.95, PolePairs = 2, Units = units,
                LockedRotor = new LockedRotor { CurrentRatio = 6, PowerFactor = 0.2 }, Starter = starter,
            },
        ],
    };

    private static MotorStartResult Start(Network n, double min = 0.8) =>
        StudyCase.Of(n).Start(new MotorStartRequest { Motors = ["PUMP"], MinTerminalPu = min });

    /// <summary>Z_LR of the motor in pu on 100 MVA at 11 kV: |z| = (1/6)·(100/S_rM)·units⁻¹ at the locked-rotor power factor 0.2.</summary>
    private static Complex LockedRotor(int units = 1)
    {
        double srM = 2 / (0.95 * 0.88);
        return Complex.FromPolarCoordinates(100 / srM / 6 / units, Math.Acos(0.2));
    }

    // Motor start, closed form (common practice): one source E behind Z_Q feeding a transformer Z_T and one motor at
    // its locked-rotor impedance Z_LR: V_motor = E·Z_LR/(Z_LR + Z_T + Z_Q). With nothing running before the start
    // the source's EMF is its set voltage (no current flows), E = 1.0 pu; Z_Q = S_base/S_k at X/R 10 (no c),
    // Z_T = 0.08·100/10 at X/R 12.
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    public void Direct_on_line_start_matches_the_closed_form(int units)
    {
        Complex zq = Complex.FromPolarCoordinates(100.0 / 200, Math.Atan(10));
        Complex zt = Complex.FromPolarCoordinates(0.8, Math.Atan(12));
        Complex zlr = LockedRotor(units);
        double expected = (zlr / (zlr + zt + zq)).Magnitude;
        MotorStartResult r = Start(Circuit(units: units));
        Assert.True(r.Completed, r.Failure);
        StartedMotor m = Assert.Single(r.Started);
        Assert.Equal(expected, m.TerminalPu, 9);
        Assert.Equal(expected, r.MotorTerminalPu, 12);
        Assert.Equal(1.0, r.Buses.Single(b => b.Id == "M").BeforePu, 9);
        Assert.Equal(100 * (1 - expected), r.Buses.Single(b => b.Id == "M").DipPercent, 6);
        // The current the motor draws is its locked-rotor current at the reduced voltage: 6·V times rated.
        Assert.Equal(6 * expected, m.CurrentPerRated, 9);
        Assert.Equal(FaultStudyCaution, r.Caution);
    }

    private static string FaultStudyCaution => Study.Core.Faults.FaultStudy.Caution;

    // Common practice: star-delta starting draws one third of the direct-on-line current, an autotransformer at tap k
    // k² of it (at the same supply voltage: an infinite source with no transformer drop, so the bus stays at 1 pu).
    [Fact]
    public void Star_delta_draws_a_third_and_an_autotransformer_k_squared_of_the_direct_current()
    {
        Network stiff(MotorStarter? s) => Circuit(s, scMva: null) with
        {
            Transformers = [new Transformer { Id = "T", Hv = "S", Lv = "M", Mva = 10, HvKv = 33, LvKv = 11, ZPercent = 1e-6, Xr = 12, VectorGroup = "Dyn11" }],
        };
        double direct = Assert.Single(Start(stiff(null)).Started).CurrentPerRated;
        double starDelta = Assert.Single(Start(stiff(new MotorStarter { Method = StarterMethod.StarDelta })).Started).CurrentPerRated;
        double auto = Assert.Single(Start(stiff(new MotorStarter { Method = StarterMethod.Autotransformer, TapPercent = 65 })).Started).CurrentPerRated;
        Assert.Equal(6.0, direct, 5);
        Assert.Equal(direct / 3, starDelta, 5);
        Assert.Equal(direct * 0.65 * 0.65, auto, 5);
    }

    // The same closed form with the starter's line impedance: 3·Z_LR for star-delta, Z_LR/k² for the autotransformer.
    [Fact]
    public void Reduced_voltage_starters_dip_the_bus_less_by_the_closed_form()
    {
        Complex zq = Complex.FromPolarCoordinates(0.5, Math.Atan(10)), zt = Complex.FromPolarCoordinates(0.8, Math.Atan(12));
        Complex zlr = LockedRotor();
        double V(Complex z) => (z / (z + zt + zq)).Magnitude;
        var sd = Start(Circuit(new MotorStarter { Method = StarterMethod.StarDelta }));
        var at = Start(Circuit(new MotorStarter { Method = StarterMethod.Autotransformer, TapPercent = 80 }));
        Assert.Equal(V(3 * zlr), sd.MotorTerminalPu, 9);
        Assert.Equal(V(zlr / 0.64), at.MotorTerminalPu, 9);
        Assert.True(sd.MotorTerminalPu > Start(Circuit()).MotorTerminalPu);
    }

    // A soft starter holds its current limit (here 3 × rated, below the 6 × the motor would draw direct); its
    // current lags the terminal voltage by the locked-rotor angle, and the voltage is then V = E − (Z_Q + Z_T)·I.
    // When the limit is above what the motor draws at the reduced voltage, the motor is its impedance.
    [Fact]
    public void A_soft_starter_holds_its_current_limit_or_draws_less()
    {
        var r = Start(Circuit(new MotorStarter { Method = StarterMethod.SoftStarter, CurrentLimit = 3 }));
        StartedMotor m = Assert.Single(r.Started);
        Assert.True(m.CurrentLimited);
        Assert.Equal(3.0, m.CurrentPerRated, 9);
        Complex zq = Complex.FromPolarCoordinates(0.5, Math.Atan(10)), zt = Complex.FromPolarCoordinates(0.8, Math.Atan(12));
        double rated = 2 / (0.95 * 0.88) / 100;
        // Fixed point of V = 1 − (Z_Q + Z_T)·3·rated·e^{j(∠V − φ_LR)}, solved here by iteration on its own.
        Complex v = Complex.One;
        for (int i = 0; i < 200; i++)
            v = Complex.One - (zq + zt) * Complex.FromPolarCoordinates(3 * rated, v.Phase - Math.Acos(0.2));
        Assert.Equal(v.Magnitude, m.TerminalPu, 9);

        var generous = Assert.Single(Start(Circuit(new MotorStarter { Method = StarterMethod.SoftStarter, CurrentLimit = 5.9 })).Started);
        Assert.False(generous.CurrentLimited);
        Assert.Equal(Assert.Single(Start(Circuit()).Started).TerminalPu, generous.TerminalPu, 12);
    }

    [Fact]
    public void A_motor_below_the_minimum_terminal_voltage_fails_the_start()
    {
        var r = Start(Circuit(), min: 0.95);
        Assert.False(r.Ok);
        Assert.False(Assert.Single(r.Started).Ok);
        Assert.True(Start(Circuit(), min: 0.5).Ok);
    }

    // The pre-start state: the motor to be started is not running, the others are (and are impedances during the start).
    [Fact]
    public void The_motor_started_is_not_running_before_its_start_and_an_unknown_motor_is_an_input_error()
    {
        var n = Circuit();
        var withSecond = n with
        {
            Motors = [.. n.Motors, n.Motors[0] with { Id = "FAN", Mw = 1 }],
        };
        var r = StudyCase.Of(withSecond).Start(new MotorStartRequest { Motors = ["PUMP"] });
        var flow = StudyCase.Of(withSecond).Solve(new SolveRequest());
        double fanLoad = 1.0 * 1.0 / 0.95;
        double pumpLoad = 2.0 / 0.95;
        Assert.Equal(fanLoad + pumpLoad, flow.Buses.Single(b => b.Id == "M").PLoadMw, 9);
        Assert.True(r.Buses.Single(b => b.Id == "M").BeforePu > flow.Buses.Single(b => b.Id == "M").VPu);
        var e = Assert.Throws<InputException>(() => StudyCase.Of(n).Start(new MotorStartRequest { Motors = ["PUMPS"] }));
        Assert.Contains("did you mean 'PUMP'", e.Message);
        Assert.Throws<InputException>(() => StudyCase.Of(n).Start(new MotorStartRequest { Motors = [] }));
    }

    // The demo: the two refrigeration compressors started together direct on line, and the pump on its autotransformer.
    [Fact]
    public void On_the_demo_the_compressors_started_together_dip_the_cold_store_more_than_the_pump_on_its_autotransformer()
    {
        StudyCase demo = StudyCase.Of(TestNetworks.Demo);
        var compressors = demo.Start(new MotorStartRequest { Motors = ["M-CS-COMP"], Scenario = "winter-peak", WatchBuses = ["CQ11"] });
        var pump = demo.Start(new MotorStartRequest { Motors = ["M-PS-PUMP"], Scenario = "winter-peak" });
        Assert.True(compressors.Ok && pump.Ok);
        Assert.True(compressors.Buses.Single(b => b.Id == "CS11").DipPercent > pump.Buses.Single(b => b.Id == "PS11").DipPercent);
        Assert.True(compressors.Buses.Single(b => b.Id == "CQ11").Watched);
        Assert.All(compressors.Buses, b => Assert.True(b.DuringPu <= b.BeforePu + 1e-9, b.Id));
        Assert.InRange(Assert.Single(pump.Started).CurrentPerRated, 0.65 * 0.65 * 5.8 * 0.85, 0.65 * 0.65 * 5.8);
    }
}
