// Tap study: it agrees with a hand sweep of individual solves and says clearly when no position works.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;
using Study.Core.Cases;

namespace Study.Core.Tests.Studies;

public class TapStudyTests
{
    private static readonly (double, double) Band = (0.97, 1.03);

    private static TapStudyResult NewBankStudy(Network n) => StudyCase.Of(n).Taps( new TapStudyRequest
    {
        TransformerId = "CQ-T1", Band = Band, Scenarios = [],
    });

    [Fact]
    public void Tap_study_on_the_new_bank_recommends_what_a_hand_sweep_of_solves_finds()
    {
        Network n = TestNetworks.Demo;
        TapStudyResult study = NewBankStudy(n);
        Assert.Equal(["CQ11", "CS11", "PS11"], study.WatchBuses);

        // The hand sweep: set the position in the file, solve each scenario, read the watched buses.
        var handPassing = new List<int>();
        Transformer bank = n.Transformers.Single(t => t.Id == "CQ-T1");
        for (int p = bank.Tap!.Range.Lowest; p <= bank.Tap.Range.Highest; p++)
        {
            var at = n with { Transformers = n.Transformers.Select(t => t.Id == "CQ-T1" ? t with { Tap = t.Tap! with { Position = p } } : t).ToList() };
            bool inBand = true;
            foreach (Scenario s in n.Scenarios)
            {
                LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(at, s));
                Assert.True(r.Converged);
                foreach (string bus in study.WatchBuses)
                {
                    double v = r.Buses.Single(b => b.Id == bus).VPu;
                    TapStudyPoint point = study.Points.Single(x => x.Position == p && x.Scenario == s.Name);
                    Assert.Equal(v, point.Watched.Single(w => w.Bus == bus).VPu, 5);
                    inBand &= v >= Band.Item1 && v <= Band.Item2;
                }
            }
            if (inBand) handPassing.Add(p);
        }
        Assert.NotEmpty(handPassing);
        Assert.Equal(handPassing.Order(), study.Recommended.Select(r => r.Position).Order());
        Assert.True(study.Recommended.Zip(study.Recommended.Skip(1)).All(x => x.First.MarginPu >= x.Second.MarginPu));
    }

    [Fact]
    public void A_band_no_position_can_hold_gives_a_clear_statement_and_the_closest_position()
    {
        Network n = TestNetworks.Demo;
        TapStudyResult study = StudyCase.Of(n).Taps( new TapStudyRequest
        {
            TransformerId = "CQ-T1", Band = (0.995, 1.0), Scenarios = [],
        });
        Assert.Empty(study.Recommended);
        Assert.NotNull(study.Closest);
        Assert.StartsWith("no position keeps", study.Finding);
    }

    [Fact]
    public void Unknown_transformer_and_a_transformer_without_taps_are_input_errors()
    {
        Network n = TestNetworks.Demo;
        var unknown = Assert.Throws<InputException>(() => StudyCase.Of(n).Taps( new TapStudyRequest { TransformerId = "NOPE" }));
        Assert.Contains("NOPE", unknown.Message);
        Network noTap = n with { Transformers = n.Transformers.Select(t => t.Id == "CQ-T1" ? t with { Tap = null } : t).ToList() };
        var none = Assert.Throws<InputException>(() => StudyCase.Of(noTap).Taps( new TapStudyRequest { TransformerId = "CQ-T1" }));
        Assert.Contains("no tap changer", none.Message);
    }

    [Fact]
    public void An_empty_band_is_refused()
    {
        var e = Assert.Throws<InputException>(() => StudyCase.Of(TestNetworks.Demo).Taps(
            new TapStudyRequest { TransformerId = "CQ-T1", Band = (1.03, 0.97) }));
        Assert.Contains("empty", e.Message);
    }
}
