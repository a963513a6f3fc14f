// Bounds that refuse a value before it becomes a confident wrong answer: tap ranges whose ratio reaches
// zero, solver options, and file versions this program does not know.
using Study.Core.Io;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class BoundsTests
{
    [Theory]
    [InlineData(-80, 8, 1.25, "at position -80 the tapped winding would be at 0 % of its rated voltage")]
    [InlineData(-100, 8, 1.25, "at position -100 the tapped winding would be at -25 % of its rated voltage")]
    [InlineData(-1, 1, 100, "at position -1 the tapped winding would be at 0 % of its rated voltage")]
    public void A_tap_range_where_any_position_gives_a_ratio_at_or_below_zero_is_an_error(int lowest, int highest, double step, string message)
    {
        // The tapped winding's voltage is (1 + p·step/100) times rated (DEVELOPERS.md, Per-unit rules): 1 − 80·1.25/100 = 0.
        Network net = Clean();
        net = net with
        {
            Transformers = net.Transformers.Change(0, t => t with { Tap = t.Tap! with { Range = new(lowest, highest), PercentPerStep = step, Position = 0 } }),
        };
        Problem p = NetworkValidator.Validate(net).Errors.Single(x => x.Field == "tap.range");
        Assert.Contains(message, p.Message);
    }

    [Fact]
    public void A_range_that_stays_above_zero_is_accepted()
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(0, t => t with { Tap = t.Tap! with { Range = new(-79, 8) } }) };
        Assert.DoesNotContain(NetworkValidator.Validate(net).Problems, x => x.Field == "tap.range" && x.IsError);
    }

    [Theory]
    [InlineData(1e300, false)]
    [InlineData(1e-2, false)]
    [InlineData(1e-14, false)]
    [InlineData(double.NaN, false)]
    [InlineData(0.0, false)]
    [InlineData(1e-3, true)]
    [InlineData(1e-13, true)]
    [InlineData(1e-8, true)]
    public void The_tolerance_is_bounded_to_1e_13_to_1e_3(double tolerance, bool accepted)
    {
        var options = new LoadFlowOptions { TolerancePu = tolerance };
        if (accepted) options.Validate();
        else Assert.Contains("is outside 1e-13..1e-3 pu", Assert.Throws<InputException>(options.Validate).Message);
    }

    [Theory]
    [InlineData(0, false)]
    [InlineData(1001, false)]
    [InlineData(-5, false)]
    [InlineData(1, true)]
    [InlineData(1000, true)]
    public void The_iteration_limit_is_bounded_to_1_to_1000(int iterations, bool accepted)
    {
        var options = new LoadFlowOptions { MaxIterations = iterations };
        if (accepted) options.Validate();
        else Assert.Throws<InputException>(options.Validate);
    }

    [Theory]
    [InlineData("-1")]
    [InlineData("0")]
    [InlineData("3")]
    [InlineData("1.5")]
    [InlineData("\"2\"")]
    public void Only_versions_1_and_2_are_read_and_a_wrong_one_is_refused_at_its_line(string version)
    {
        string text = "{\n  \"format\": \"study-network\",\n  \"version\": " + version + ",\n  \"buses\": []\n}";
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "v.study.json"));
        Assert.Equal(3, e.Line);
        Assert.Contains("file version", e.Message);
    }
}
