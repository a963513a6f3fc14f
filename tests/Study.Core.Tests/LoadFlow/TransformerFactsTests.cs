// Facts of the trade that any load flow must reproduce (DEVELOPERS.md, Outside references).
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.LoadFlow;

public class TransformerFactsTests
{
    private static LoadFlowResult Solve(Network n, LoadFlowOptions? o = null)
    {
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(n), o);
        Assert.True(r.Converged, r.Message);
        return r;
    }

    [Fact]
    public void Ideal_transformer_at_no_load_gives_V2_over_V1_equal_to_N2_over_N1()
    {
        // Basic transformer theory: V2/V1 = N2/N1. An (almost) ideal 132/33 kV unit at no load gives
        // 33 kV at the lv bus when its hv bus is at 132 kV.
        LoadFlowResult r = Solve(SmallNetworks.Transformer132To33(zPercent: 0.01, xr: 10));
        Assert.Equal(132.0, r.Buses.Single(b => b.Id == "HV").VKv!.Value, 6);
        Assert.Equal(33.0, r.Buses.Single(b => b.Id == "LV").VKv!.Value, 4);
    }

    [Fact]
    public void Off_nominal_winding_ratio_sets_the_no_load_lv_voltage()
    {
        // A 132/34.65 kV winding on a 33 kV bus: V2 = 132 kV · 34.65/132 = 34.65 kV, i.e. 1.05 pu.
        LoadFlowResult r = Solve(SmallNetworks.Transformer132To33(zPercent: 0.01, xr: 10, lvKv: 34.65));
        Assert.Equal(34.65, r.Buses.Single(b => b.Id == "LV").VKv!.Value, 3);
    }

    [Fact]
    public void Current_ratio_under_load_is_the_inverse_voltage_ratio_within_the_losses()
    {
        // V1·I1 = V2·I2 with no losses: stepping 132 kV down to 33 kV multiplies the current by 4.
        LoadFlowResult r = Solve(SmallNetworks.Transformer132To33(loadMw: 40, loadMvar: 10, zPercent: 10, xr: 40));
        BranchResult t = r.Branches.Single();
        double currentRatio = t.IToA!.Value / t.IFromA!.Value;
        double voltageRatio = r.Buses.Single(b => b.Id == "HV").VKv!.Value / r.Buses.Single(b => b.Id == "LV").VKv!.Value;
        double lossShare = Math.Abs(t.SFromMva - t.SToMva) / t.SFromMva;
        Assert.Equal(voltageRatio, currentRatio, voltageRatio * (lossShare + 1e-9));
        Assert.InRange(currentRatio, 3.9, 4.4);
    }

    [Fact]
    public void One_tap_step_on_hv_lowers_lv_voltage_by_about_one_step_at_light_load()
    {
        // Common practice: one step of s % on the hv side raises the turns ratio by s % and lowers the
        // lv voltage by about s % at light load.
        TapChanger Tap(int position) => new() { Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-8, 8), Position = position };
        double V(int position) => Solve(SmallNetworks.Transformer132To33(loadMw: 1, loadMvar: 0.3, tap: Tap(position)))
            .Buses.Single(b => b.Id == "LV").VPu;
        double v0 = V(0), v1 = V(1);
        double drop = (v0 - v1) / v0;
        Assert.True(v1 < v0);
        Assert.InRange(drop, 0.0125 * 0.95, 0.0125 * 1.05);
    }

    [Fact]
    public void Lv_side_tap_raises_the_lv_voltage()
    {
        TapChanger Tap(int position) => new() { Winding = TapWinding.Lv, PercentPerStep = 1.25, Range = new(-8, 8), Position = position };
        double V(int position) => Solve(SmallNetworks.Transformer132To33(loadMw: 1, tap: Tap(position))).Buses.Single(b => b.Id == "LV").VPu;
        Assert.InRange(V(1) / V(0) - 1, 0.0125 * 0.95, 0.0125 * 1.05);
    }

    [Fact]
    public void Line_loss_falls_as_one_over_V_squared()
    {
        // Fact of the trade: for the same delivered power over the same conductor, I²R loss scales as
        // 1/V². The same line in ohms at 33 kV and at 66 kV: loss ratio ≈ 4.
        double Loss(double kv) => Solve(SmallNetworks.OneLine(kv, 10, 3)).Totals.LossMw;
        double ratio = Loss(33) / Loss(66);
        Assert.InRange(ratio, 3.8, 4.3);
    }
}
