// A motor's nameplate to per unit: its running load in the load flow, its fault impedance, the defaults explain states.
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class MotorConversionTests
{
    private static Network Board(Motor motor) => new()
    {
        Name = "board",
        Buses = [new Bus { Id = "S", Kv = 11 }, new Bus { Id = "B", Kv = 11 }],
        Supplies = [new Supply { Id = "GRID", Bus = "S", ScMvaMax = 250 }],
        Lines = [new Line { Id = "C", From = "S", To = "B", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.05, X = 0.05 } }],
        Motors = [motor],
        Scenarios = [new Scenario { Name = "light", LoadScale = 0.5 }],
    };

    private static Motor Compressor => new()
    {
        Id = "M1", Bus = "B", Mw = 1.6, Kv = 11, PowerFactor = 0.87, Efficiency = 0.96, PolePairs = 2, Units = 2, LoadPercent = 80,
        LockedRotor = new LockedRotor { CurrentRatio = 6, PowerFactor = 0.2 },
    };

    // A running motor draws P = mw·load/100/efficiency·units and Q = P·tan φ (common practice): 2 × 1.6 MW at 80 %
    // and 96 % efficiency is 2.666667 MW, at power factor 0.87 1.511266 Mvar; a scenario scales it like any load.
    [Fact]
    public void A_running_motor_is_a_constant_power_load_in_the_load_flow()
    {
        StudyCase study = StudyCase.Of(Board(Compressor));
        var bus = study.Solve(new SolveRequest()).Buses.Single(b => b.Id == "B");
        Assert.Equal(1.6 * 0.8 / 0.96 * 2, bus.PLoadMw, 9);
        Assert.Equal(1.6 * 0.8 / 0.96 * 2 * Math.Tan(Math.Acos(0.87)), bus.QLoadMvar, 9);
        Assert.Equal(0.5 * bus.PLoadMw, study.Solve(new SolveRequest { Scenario = "light" }).Buses.Single(b => b.Id == "B").PLoadMw, 9);
    }

    [Fact]
    public void Explain_states_the_defaults_a_motor_takes_when_they_are_not_given()
    {
        var sparse = Compressor with { PolePairs = null, LoadPercent = null, LockedRotor = new LockedRotor { CurrentRatio = 6 } };
        ElementExplanation e = Explainer.Explain(Board(sparse), "M1");
        Assert.Equal(ElementKind.Motor, e.Kind);
        Assert.Contains("load", e.Steps.Single(s => s.Label == "load").Note);
        Assert.Equal(100, e.Steps.Single(s => s.Label == "load").Value);
        Assert.Equal(1, e.Steps.Single(s => s.Label == "p").Value);
        Assert.Contains("polePairs not given", e.Steps.Single(s => s.Label == "p").Note);
        Assert.Equal(0.3, e.Steps.Single(s => s.Label == "cos φ_LR").Value);
        Assert.Contains("starter not given", e.Steps.Single(s => s.Label == "starter").Note);
        // P_rM/p = 1.6 MW per pole pair with one pole pair: the 0.10 class of IEC 60909-0.
        Assert.Equal(0.10, e.Steps.Single(s => s.Label == "R_M/X_M").Value);
        // |z_M| = (1/6)·(100/(2·S_rM)), S_rM = 1.6/(0.96·0.87).
        Assert.Equal(100 / (2 * 1.6 / (0.96 * 0.87)) / 6, e.Steps.Single(s => s.Label == "|z_M|").Value, 9);
    }

    [Fact]
    public void Motors_breaker_ratings_and_conductors_round_trip_through_the_file()
    {
        var network = Board(Compressor with { Starter = new MotorStarter { Method = StarterMethod.SoftStarter, CurrentLimit = 3 }, LowVoltageGroup = true }) with
        {
            Lines = [Board(Compressor).Lines[0] with { Conductor = ConductorMaterial.Aluminium }],
            Breakers = [new Breaker { Id = "CB", Bus = "B", Branch = "C", InterruptingKa = 20, PeakKa = 50, DcPercent = 35, ShortTimeKa = 20, ShortTimeS = 1, MinTripS = 0.06 }],
        };
        string json = NetworkFile.ToJson(network);
        Assert.Contains("\"method\": \"softStarter\"", json);
        Assert.Contains("\"conductor\": \"aluminium\"", json);
        Network back = NetworkFile.Parse(json, "m.study.json");
        Assert.Equal(network.Motors[0], back.Motors[0]);
        Assert.Equal(network.Breakers[0], back.Breakers[0]);
        Assert.Equal(network.Lines[0], back.Lines[0]);
        Assert.Equal(json, NetworkFile.ToJson(back));
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(json.Replace("\"softStarter\"", "\"wyeDelta\""), "m.study.json"));
        Assert.Contains("wrong type of value", e.Message);
    }
}
