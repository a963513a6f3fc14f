// The fast outage screening (values-only changes of the intact case) gives what the screening by its
// definition gives: each outage rebuilt as its own model and solved from scratch (ReferenceScreening).
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Study.Core.Studies;
using Study.Core.Synthetic;
using Study.Core.Tests.Properties;
using Study.Core.Units;

namespace Study.Core.Tests.Studies;

public class OutageEquivalenceTests
{
    // Both are load flows converged to 1e-8 pu of mismatch from the same start, by different sparse
    // eliminations: their states agree far inside these bounds, and every verdict must be the same.
    private const double VoltageTolerancePu = 1e-6, PercentTolerance = 1e-4, MwTolerance = 1e-6;

    [Fact]
    public void The_demo_in_both_scenarios_taps_regulating_and_reactive_limits_gives_the_same_ranking_and_figures() =>
        AssertSameAsReference(TestNetworks.Demo);

    [Fact]
    public void The_IEEE_14_and_30_bus_cases_give_the_same_ranking_and_figures()
    {
        AssertSameAsReference(TestNetworks.Ieee14);
        AssertSameAsReference(TestNetworks.Ieee30);
    }

    [Fact]
    public void A_generated_grid_with_tight_ratings_and_band_gives_the_same_overloads_islands_and_excursions()
    {
        SyntheticCase c = SyntheticGrid.Generate(new SyntheticGridOptions { Buses = 300, Seed = 4 });
        // Ratings just above each line's intact flow and a narrow band: most outages overload a
        // neighbour or push a bus outside, and the spanning-tree links island parts of the grid.
        LoadFlowResult intact = LoadFlowSolver.Solve(PerUnitModel.Build(c.Network));
        var flow = intact.Branches.ToDictionary(b => b.Id, b => Math.Max(b.SFromMva, b.SToMva));
        Network tight = c.Network with
        {
            Lines = c.Network.Lines.Select(l => l with { RatingMva = Math.Round(1.02 * flow[l.Id] + 1, 1) }).ToList(),
            Buses = c.Network.Buses.Select(b => b with { VMin = 0.99, VMax = 1.01 }).ToList(),
        };
        int[] counts = AssertSameAsReference(tight);
        Assert.True(counts[0] > 20 && counts[1] > 20 && counts[2] > 0,
            $"the case should hold outages with new violations ({counts[0]}), islands ({counts[1]}) and intact violations ({counts[2]})");
    }

    [Fact]
    public void A_three_winding_bank_out_and_its_star_bus_left_dead_give_the_same_result()
    {
        var network = new Network
        {
            Name = "132/33/11 kV three-winding bank beside a two-winding one",
            Buses =
            [
                new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "MV", Kv = 33 }, new Bus { Id = "LV", Kv = 11 }, new Bus { Id = "LV2", Kv = 11 },
            ],
            Supplies = [new Supply { Id = "GRID", Bus = "HV", ScMvaMax = 5000, Xr = 15 }],
            ThreeWindingTransformers =
            [
                new ThreeWindingTransformer
                {
                    Id = "T3", Hv = "HV", Mv = "MV", Lv = "LV", HvKv = 132, MvKv = 33, LvKv = 11,
                    MvaHv = 60, MvaMv = 60, MvaLv = 20, ZHmPercent = 12, ZHlPercent = 20, ZMlPercent = 7,
                    ZBaseMva = 60, Xr = 30, VectorGroup = "YNyn0d1",
                },
            ],
            Transformers =
            [
                new Transformer { Id = "T2", Hv = "HV", Lv = "MV", Mva = 45, HvKv = 132, LvKv = 33, ZPercent = 11, Xr = 25, VectorGroup = "YNyn0" },
                new Transformer { Id = "T4", Hv = "MV", Lv = "LV", Mva = 12, HvKv = 33, LvKv = 11, ZPercent = 8, Xr = 12, VectorGroup = "Dyn1" },
            ],
            Lines =
            [
                new Line { Id = "C1", From = "LV", To = "LV2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.1, X = 0.08 }, RatingMva = 8 },
            ],
            Loads = [new Load { Id = "LMV", Bus = "MV", PMw = 40, QMvar = 12 }, new Load { Id = "LLV", Bus = "LV2", PMw = 6, QMvar = 2 }],
        };
        AssertSameAsReference(network);
    }

    [Fact]
    public void Small_random_networks_with_taps_limits_meshes_and_spurs_give_the_same_result()
    {
        PropertyRun.ForAll("fast outages equal the reference", SmallSolvableNetworks.Gen, PropertyRun.Iterations(60),
            network =>
            {
                if (NetworkValidator.Validate(network).HasErrors) return;
                AssertSameAsReference(network);
            },
            Study.Core.Io.NetworkFile.ToJson);
    }

    /// <summary>Screens every scenario both ways; returns how many outages had new violations, islands, and intact violations.</summary>
    private static int[] AssertSameAsReference(Network network)
    {
        StudyCase study = StudyCase.Of(network);
        var scenarios = study.Scenarios([]);
        var models = scenarios.Select(study.Model).ToList();
        var elements = OutageElements.InService(network);
        var reference = ReferenceScreening.Run(models, elements);
        OutageScreeningResult fast = OutageScreening.Run(models, elements);
        int[] counts = new int[3];
        Assert.Equal(reference.Count, fast.Scenarios.Count);
        for (int s = 0; s < reference.Count; s++)
        {
            ScenarioScreening screened = fast.Scenarios[s];
            Assert.Equal(reference[s].Intact.Converged, screened.IntactConverged);
            Assert.Equal(reference[s].Intact.Totals.LoadMw, screened.IntactLoadMw);
            var expectedByOrder = reference[s].Outages.ToDictionary(o => o.Order);
            var disputed = screened.Outages.Where(o => Collapse(expectedByOrder[o.Order], o)).Select(o => o.Order).ToHashSet();
            AssertSameRanking(reference[s].Outages.Where(o => !disputed.Contains(o.Order)).ToList(),
                screened.Outages.Where(o => !disputed.Contains(o.Order)).ToList());
            foreach (OutageCase actual in screened.Outages)
            {
                if (disputed.Contains(actual.Order)) continue;
                AssertSameOutage(expectedByOrder[actual.Order], actual);
                if (actual.NewViolations.Count > 0) counts[0]++;
                if (actual.IslandedBuses.Count > 0) counts[1]++;
            }
            counts[2] += screened.IntactViolations.Count;
        }
        return counts;
    }

    /// <summary>
    /// True where one side converged and the other did not, and the converged state is a voltage
    /// collapse (a live bus below 0.5 pu): Newton-Raphson wandered from the start to a far, non-physical
    /// solution, and whether it gets there within the iteration limit is an accident of rounding, so
    /// two correct methods may differ. Any other disagreement fails.
    /// </summary>
    private static bool Collapse(OutageCase expected, OutageCase actual)
    {
        if (expected.Converged == actual.Converged) return false;
        OutageCase converged = expected.Converged ? expected : actual;
        Assert.True(converged.WorstVPu < 0.5,
            $"outage of {expected.Element}: converged {actual.Converged}, the reference {expected.Converged}, worst voltage {converged.WorstVPu} pu");
        return true;
    }

    /// <summary>
    /// The same outages in the same order, except that two outages whose severity and stress agree
    /// within the tolerance (twin feeders, say: equal in exact arithmetic) may stand in either order.
    /// </summary>
    private static void AssertSameRanking(IReadOnlyList<OutageCase> expected, IReadOnlyList<OutageCase> actual)
    {
        Assert.Equal(expected.Select(o => o.Order).Order(), actual.Select(o => o.Order).Order());
        var reference = expected.ToDictionary(o => o.Order);
        for (int k = 0; k < actual.Count; k++)
        {
            if (actual[k].Order == expected[k].Order) continue;
            OutageCase here = reference[actual[k].Order], there = expected[k];
            Assert.True(Math.Abs(here.Severity - there.Severity) <= PercentTolerance && Math.Abs(here.StressPercent - there.StressPercent) <= PercentTolerance,
                $"rank {k + 1}: {actual[k].Element}, the reference {expected[k].Element} (severity {here.Severity:R} against {there.Severity:R})");
        }
    }

    private static void AssertSameOutage(OutageCase expected, OutageCase actual)
    {
        string where = $"outage of {expected.Element} ({expected.Scenario ?? "as entered"})";
        Assert.True(expected.Converged == actual.Converged, $"{where}: converged {actual.Converged}, the reference {expected.Converged}");
        Assert.Equal(expected.Order, actual.Order);
        Assert.Equal(expected.Kind, actual.Kind);
        if (!expected.Converged)
        {
            Assert.Equal(OutageSeverity.NoConvergence, actual.Severity);
            Assert.False(string.IsNullOrEmpty(actual.Message));
            return;
        }
        Assert.Equal(expected.IslandedBuses, actual.IslandedBuses);
        Near(where + " lost load", expected.LostLoadMw, actual.LostLoadMw, MwTolerance);
        Near(where + " lost generation", expected.LostGenerationMw, actual.LostGenerationMw, MwTolerance);
        Assert.True(expected.NewViolations.Count == actual.NewViolations.Count,
            $"{where}: {actual.NewViolations.Count} new violations, the reference {expected.NewViolations.Count}");
        foreach (var (e, a) in expected.NewViolations.Zip(actual.NewViolations))
        {
            Assert.Equal((e.Element, e.Kind, e.Type, e.Limit, e.IntactValue), (a.Element, a.Kind, a.Type, a.Limit, a.IntactValue));
            Near($"{where} {e.Element}", e.Value, a.Value, e.Type == ViolationKind.Overload ? PercentTolerance : VoltageTolerancePu);
        }
        // Which bus or branch is named worst may differ only where two tie within the tolerance
        // (the figure is then the same; the name is a rounding accident).
        Near(where + $" worst voltage ({expected.WorstVBus}, here {actual.WorstVBus})", expected.WorstVPu, actual.WorstVPu, VoltageTolerancePu);
        Near(where + $" worst loading ({expected.WorstLoadingElement}, here {actual.WorstLoadingElement})",
            expected.WorstLoadingPercent, actual.WorstLoadingPercent, PercentTolerance);
        Assert.Equal(expected.WorstVBus is null, actual.WorstVBus is null);
        Assert.Equal(expected.WorstLoadingElement is null, actual.WorstLoadingElement is null);
        Assert.Equal(expected.ParallelLoadings.Select(p => p.Element), actual.ParallelLoadings.Select(p => p.Element));
        foreach (var (e, a) in expected.ParallelLoadings.Zip(actual.ParallelLoadings))
            Near($"{where} parallel {e.Element}", e.LoadingPercent, a.LoadingPercent, PercentTolerance);
        Near(where + " stress", expected.StressPercent, actual.StressPercent, PercentTolerance);
        Near(where + " severity", expected.Severity, actual.Severity, PercentTolerance);
    }

    private static void Near(string what, double? expected, double? actual, double tolerance)
    {
        Assert.True(expected.HasValue == actual.HasValue, $"{what}: {actual}, the reference {expected}");
        if (expected is double e && actual is double a)
            Assert.True(Math.Abs(e - a) <= tolerance, $"{what}: {a:R}, the reference {e:R}");
    }
}
