// A tap sweep warm-starts each position from its neighbour; it must never stay on a low-voltage solution
// (the lower branch of the P–V curve) where a flat-start solve of the same position finds the normal one.
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;

namespace Study.Core.Tests.Studies;

public class TapSweepCollapseTests
{
    /// <summary>
    /// Invented: the Marsh End 33 kV feeder, 44 km of overhead line, heavily loaded, with a gas engine
    /// holding 1.0 pu at its far end inside ±5 Mvar, fed by a 132/33 kV bank with an lv tap changer. The
    /// low positions sit near the nose of the P–V curve: warm started from position -4, Newton-Raphson
    /// converged on the low-voltage solution at -3 (0.41 pu at F, where a flat start gives 0.65 pu).
    /// </summary>
    private static Network MarshEnd() => new()
    {
        Name = "Marsh End feeder",
        Buses =
        [
            new Bus { Id = "G", Kv = 132 }, new Bus { Id = "M", Kv = 33, VMin = 0.5, VMax = 1.5 },
            new Bus { Id = "F", Kv = 33, VMin = 0.5, VMax = 1.5 }, new Bus { Id = "E", Kv = 33, VMin = 0.5, VMax = 1.5 },
        ],
        Supplies = [new Supply { Id = "GRID", Bus = "G", ScMvaMax = 3000 }],
        Transformers =
        [
            new Transformer
            {
                Id = "T1", Hv = "G", Lv = "M", Mva = 60, HvKv = 132, LvKv = 33, ZPercent = 12, Xr = 20,
                Tap = new TapChanger { Winding = TapWinding.Lv, PercentPerStep = 2.5, Range = new(-8, 8) },
            },
        ],
        Lines =
        [
            new Line { Id = "L", From = "M", To = "F", Km = 44, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.05, X = 0.25 } },
            new Line { Id = "L2", From = "F", To = "E", Km = 22, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.05, X = 0.25 } },
        ],
        Loads = [new Load { Id = "LD", Bus = "F", PMw = 18.8, QMvar = 9.212 }, new Load { Id = "LE", Bus = "E", PMw = 6.267, QMvar = 3.071 }],
        Generators = [new Generator { Id = "GE", Bus = "E", Mode = GeneratorMode.Pv, PMw = 4.7, VSet = 1.0, QMinMvar = -5, QMaxMvar = 5 }],
    };

    [Fact]
    public void Every_position_of_the_sweep_agrees_with_a_flat_start_solve_of_that_position()
    {
        PerUnitModel model = PerUnitModel.Build(MarshEnd());
        TapStudyResult study = TapStudy.Run([model], new TapStudyRequest { TransformerId = "T1", WatchBuses = ["F"] });
        int compared = 0;
        foreach (TapStudyPoint p in study.Points)
        {
            // The reference: a direct solve of the same position from flat start.
            LoadFlowResult direct = LoadFlowSolver.Solve(model.WithTapPosition(0, p.Position));
            if (!direct.Converged || !p.Converged) continue;
            Assert.Equal(direct.Buses.Single(b => b.Id == "F").VPu, p.Watched[0].VPu, 6);
            compared++;
        }
        Assert.True(compared >= 12, $"only {compared} positions converged");
        string note = Assert.Single(study.Notes, n => n.StartsWith("position -3:", StringComparison.Ordinal));
        Assert.Contains("the warm start reached a low-voltage solution (lowest 0.41", note);
        Assert.Contains("the flat-start solution is used (lowest 0.651 pu at F)", note);
        Assert.True(study.Points.Single(p => p.Position == -3).SolvedFromFlatStart);
    }

    [Fact]
    public void A_position_whose_warm_start_fails_is_solved_again_from_flat_start()
    {
        // The same feeder with a 10 % step: the warm start from -3 does not converge at -2; a flat start does.
        Network n = MarshEnd();
        n = n with
        {
            Transformers = [n.Transformers[0] with { Tap = n.Transformers[0].Tap! with { PercentPerStep = 10 } }],
            Lines = n.Lines.Select(l => l with { Km = l.Id == "L" ? 16 : 8, Z1 = l.Z1! with { X = 0.2 } }).ToList(),
            Loads = [n.Loads[0] with { PMw = 32.5, QMvar = 3.25 }, n.Loads[1] with { PMw = 10.833, QMvar = 1.083 }],
            Generators = [n.Generators[0] with { PMw = 8.125 }],
        };
        PerUnitModel model = PerUnitModel.Build(n);
        TapStudyResult study = TapStudy.Run([model], new TapStudyRequest { TransformerId = "T1", WatchBuses = ["F"] });
        TapStudyPoint at = study.Points.Single(p => p.Position == -2);
        Assert.True(at.Converged);
        Assert.True(at.SolvedFromFlatStart);
        Assert.Equal(LoadFlowSolver.Solve(model.WithTapPosition(0, -2)).Buses.Single(b => b.Id == "F").VPu, at.Watched[0].VPu, 6);
        Assert.Contains(study.Notes, x => x.StartsWith("position -2: the warm start from the neighbouring position did not converge", StringComparison.Ordinal));
    }
}
