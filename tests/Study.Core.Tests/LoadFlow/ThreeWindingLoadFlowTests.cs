// Three-winding banks in the load flow through the star equivalent (common practice; DEVELOPERS.md, Per-unit rules).
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.LoadFlow;

public class ThreeWindingLoadFlowTests
{
    private static Network WithThreeWinding(double lvLoadMw) => new()
    {
        Name = "132/33/11 kV three-winding bank",
        Buses =
        [
            new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "MV", Kv = 33, VMin = 0.5, VMax = 1.5 },
            new Bus { Id = "LV", Kv = 11, VMin = 0.5, VMax = 1.5 },
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
        Loads =
        [
            new Load { Id = "LMV", Bus = "MV", PMw = 30, QMvar = 10 },
            .. lvLoadMw > 0 ? new[] { new Load { Id = "LLV", Bus = "LV", PMw = lvLoadMw, QMvar = lvLoadMw / 3 } } : [],
        ],
    };

    [Fact]
    public void With_the_lv_winding_unloaded_the_bank_behaves_as_its_hv_mv_pair()
    {
        // Star equivalent: Z_H + Z_M = Z_HM, so with no lv current the hv–mv path is the pairwise
        // impedance of a two-winding unit of 12 % on 60 MVA with the same X/R.
        LoadFlowResult three = LoadFlowSolver.Solve(PerUnitModel.Build(WithThreeWinding(0)));
        var twoWinding = new Network
        {
            Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "MV", Kv = 33, VMin = 0.5, VMax = 1.5 }],
            Supplies = [new Supply { Id = "GRID", Bus = "HV" }],
            Transformers = [new Transformer { Id = "T2", Hv = "HV", Lv = "MV", Mva = 60, HvKv = 132, LvKv = 33, ZPercent = 12, Xr = 30 }],
            Loads = [new Load { Id = "LMV", Bus = "MV", PMw = 30, QMvar = 10 }],
        };
        LoadFlowResult two = LoadFlowSolver.Solve(PerUnitModel.Build(twoWinding));
        Assert.True(three.Converged && two.Converged);
        BusResult mv3 = three.Buses.Single(b => b.Id == "MV"), mv2 = two.Buses.Single(b => b.Id == "MV");
        Assert.Equal(mv2.VPu, mv3.VPu, 9);
        Assert.Equal(mv2.AngleDeg, mv3.AngleDeg, 7);
        Assert.Equal(two.Totals.LossMw, three.Totals.LossMw, 9);
    }

    [Fact]
    public void Each_winding_reports_its_own_flow_and_loading_and_the_star_bus_stays_hidden()
    {
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(WithThreeWinding(6)));
        Assert.True(r.Converged, r.Message);
        Assert.DoesNotContain(r.Buses, b => b.Id.EndsWith("/star", StringComparison.Ordinal));
        BranchResult hv = r.Branches.Single(b => b.Id == "T3/hv");
        BranchResult mv = r.Branches.Single(b => b.Id == "T3/mv");
        BranchResult lv = r.Branches.Single(b => b.Id == "T3/lv");
        // Power into the hv winding leaves through the mv and lv windings, less the losses.
        Assert.Equal(hv.PFromMw, -(mv.PFromMw + lv.PFromMw) + hv.LossMw + mv.LossMw + lv.LossMw, 6);
        Assert.InRange(-lv.PFromMw, 5.9, 6.1);
        // Each winding's loading is against its own rating: the 20 MVA lv winding carries ≈ 6.3 MVA.
        Assert.InRange(lv.LoadingPercent!.Value, 30, 34);
        Assert.Equal(60, hv.RatingMva);
        Assert.Equal(20, lv.RatingMva);
        LoadFlowResult withStar = LoadFlowSolver.Solve(PerUnitModel.Build(WithThreeWinding(6)), new LoadFlowOptions { IncludeInternalBuses = true });
        Assert.Contains(withStar.Buses, b => b.Id == "T3/star");
    }
}
