// Validation of motors (nameplate, locked rotor, starter) and of the new breaker keys (branch, ratings, trip time).
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class MotorAndBreakerRulesTests
{
    private static Motor Pump => new()
    {
        Id = "M1", Bus = "MILL", Mw = 1.5, Kv = 11, PowerFactor = 0.87, Efficiency = 0.96,
        LockedRotor = new LockedRotor { CurrentRatio = 6 },
    };

    private static ValidationReport With(Motor motor) => NetworkValidator.Validate(Clean() with { Motors = [motor] });

    private static ValidationReport With(Breaker breaker) => NetworkValidator.Validate(Clean() with { Breakers = [breaker] });

    [Fact]
    public void A_complete_motor_is_clean()
    {
        AssertClean(With(Pump));
        AssertClean(With(Pump with { Starter = new MotorStarter { Method = StarterMethod.Autotransformer, TapPercent = 65 } }));
    }

    [Theory]
    [InlineData("mw")]
    [InlineData("kv")]
    [InlineData("powerFactor")]
    [InlineData("efficiency")]
    [InlineData("lockedRotor.currentRatio")]
    public void A_motor_without_the_nameplate_a_study_needs_is_an_error_naming_the_key(string key)
    {
        Motor m = key switch
        {
            "mw" => Pump with { Mw = null },
            "kv" => Pump with { Kv = null },
            "powerFactor" => Pump with { PowerFactor = null },
            "efficiency" => Pump with { Efficiency = null },
            _ => Pump with { LockedRotor = null },
        };
        Problem p = Single(With(m), ElementKind.Motor, "M1", key);
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains("missing", p.Message);
    }

    [Fact]
    public void Fractions_given_as_percentages_and_a_locked_rotor_ratio_below_one_are_errors()
    {
        Problem eff = Single(With(Pump with { Efficiency = 96 }), ElementKind.Motor, "M1", "efficiency");
        Assert.Contains("did you mean 0.96?", eff.Message);
        Assert.Equal(Severity.Error, Single(With(Pump with { PowerFactor = 1.2 }), ElementKind.Motor, "M1", "powerFactor").Severity);
        Assert.Contains("several times the rated current",
            Single(With(Pump with { LockedRotor = new LockedRotor { CurrentRatio = 0.8 } }), ElementKind.Motor, "M1", "lockedRotor.currentRatio").Message);
        Assert.Equal(Severity.Error,
            Single(With(Pump with { LockedRotor = new LockedRotor { CurrentRatio = 6, PowerFactor = 1.5 } }), ElementKind.Motor, "M1", "lockedRotor.powerFactor").Severity);
        Assert.Equal(Severity.Error, Single(With(Pump with { Units = 0 }), ElementKind.Motor, "M1", "units").Severity);
        Assert.Equal(Severity.Error, Single(With(Pump with { PolePairs = 0 }), ElementKind.Motor, "M1", "polePairs").Severity);
    }

    [Fact]
    public void Starters_need_their_setting_and_warn_about_one_they_do_not_use()
    {
        Assert.Equal(Severity.Error, Single(With(Pump with { Starter = new MotorStarter { Method = StarterMethod.Autotransformer } }),
            ElementKind.Motor, "M1", "starter.tapPercent").Severity);
        Assert.Equal(Severity.Error, Single(With(Pump with { Starter = new MotorStarter { Method = StarterMethod.Autotransformer, TapPercent = 120 } }),
            ElementKind.Motor, "M1", "starter.tapPercent").Severity);
        Assert.Equal(Severity.Error, Single(With(Pump with { Starter = new MotorStarter { Method = StarterMethod.SoftStarter } }),
            ElementKind.Motor, "M1", "starter.currentLimit").Severity);
        Problem limits = Single(With(Pump with { Starter = new MotorStarter { Method = StarterMethod.SoftStarter, CurrentLimit = 7 } }),
            ElementKind.Motor, "M1", "starter.currentLimit");
        Assert.Equal(Severity.Warning, limits.Severity);
        Assert.Contains("limits nothing", limits.Message);
        Assert.Equal(Severity.Warning, Single(With(Pump with { Starter = new MotorStarter { TapPercent = 60 } }),
            ElementKind.Motor, "M1", "starter.tapPercent").Severity);
    }

    [Fact]
    public void A_motor_far_from_its_bus_kv_or_a_low_voltage_group_above_1_kV_is_a_warning()
    {
        Problem kv = Single(With(Pump with { Kv = 3.3 }), ElementKind.Motor, "M1", "kv");
        Assert.Equal(Severity.Warning, kv.Severity);
        Assert.Contains("differs from bus base kV 11", kv.Message);
        Assert.Equal(Severity.Warning, Single(With(Pump with { LowVoltageGroup = true }), ElementKind.Motor, "M1", "lowVoltageGroup").Severity);
        Problem bus = Single(With(Pump with { Bus = "MIL" }), ElementKind.Motor, "M1", "bus");
        Assert.Contains("did you mean 'MILL'", bus.Message);
    }

    [Fact]
    public void A_motor_shares_its_id_family_with_loads_and_shunts()
    {
        Problem p = Single(With(Pump with { Id = "L1" }), ElementKind.Motor, "L1", "id");
        Assert.Contains("unique among loads, shunts and motors", p.Message);
    }

    [Fact]
    public void A_breaker_branch_must_end_at_its_bus_and_its_ratings_be_plausible()
    {
        var good = new Breaker { Id = "CB1", Bus = "MILL", Branch = "T2", InterruptingKa = 25, PeakKa = 63, DcPercent = 30, ShortTimeKa = 25, ShortTimeS = 3, MinTripS = 0.1 };
        AssertClean(With(good));
        Assert.Contains("does not end at bus MILL", Single(With(good with { Branch = "F1" }), ElementKind.Breaker, "CB1", "branch").Message);
        Assert.Contains("did you mean 'T2'", Single(With(good with { Branch = "t2 " }), ElementKind.Breaker, "CB1", "branch").Message);
        Assert.Equal(Severity.Error, Single(With(good with { DcPercent = 130 }), ElementKind.Breaker, "CB1", "dcPercent").Severity);
        Assert.Equal(Severity.Error, Single(With(good with { ShortTimeS = 0 }), ElementKind.Breaker, "CB1", "shortTimeS").Severity);
        Assert.Equal(Severity.Error, Single(With(good with { MinTripS = -0.1 }), ElementKind.Breaker, "CB1", "minTripS").Severity);
        Assert.Equal(Severity.Warning, Single(With(good with { MinTripS = 80 }), ElementKind.Breaker, "CB1", "minTripS").Severity);
        Assert.Equal(Severity.Warning, Single(With(good with { ShortTimeKa = null }), ElementKind.Breaker, "CB1", "shortTimeS").Severity);
    }
}
