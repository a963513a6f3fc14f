// Three-winding banks in the fault study: the star-equivalent zero-sequence rule per winding.
using Study.Core.Faults;
using Study.Core.Model;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class ThreeWindingFaultTests
{
    private static Network Bank(string group) => new()
    {
        Buses = [new Bus { Id = "H", Kv = 132 }, new Bus { Id = "M", Kv = 33 }, new Bus { Id = "L", Kv = 11 }],
        Supplies = [Grid("H", 5000, 14, 1.0)],
        ThreeWindingTransformers =
        [
            new ThreeWindingTransformer
            {
                Id = "T3", Hv = "H", Mv = "M", Lv = "L", HvKv = 132, MvKv = 33, LvKv = 11, MvaHv = 60, MvaMv = 60, MvaLv = 20,
                ZHmPercent = 12, ZHlPercent = 20, ZMlPercent = 7, ZBaseMva = 60, Xr = 30, VectorGroup = group,
                HvNeutral = Solid, MvNeutral = Solid,
            },
        ],
    };

    // Common practice (star equivalent): YN and yn windings join their terminals to the star point,
    // the d tertiary earths the star point, so the 33 kV earth fault is fed; the delta terminal sees none.
    [Fact]
    public void YNyn0d1_bank_feeds_mv_earth_faults_and_blocks_them_on_the_delta_tertiary()
    {
        var result = Run(Bank("YNyn0d1"), new FaultRequest { Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth] });
        Assert.DoesNotContain(result.Faults, f => f.Bus.EndsWith("/star", StringComparison.Ordinal));
        Assert.True(result.At("M", FaultKind.LineToEarth).IkKa > 0.5 * result.At("M", FaultKind.ThreePhase).IkKa);
        Assert.Equal(0, result.At("L", FaultKind.LineToEarth).IkPu);
        Assert.True(result.At("L", FaultKind.ThreePhase).IkKa > 0);
    }

    // Without the tertiary delta (YNyn0y0) and with the grid earthed, the mv earth fault is still fed through the hv star,
    // but less than with the delta's extra earthing path at the star point.
    [Fact]
    public void Delta_tertiary_raises_the_mv_earth_fault()
    {
        var request = new FaultRequest { Kinds = [FaultKind.LineToEarth] };
        double withDelta = Run(Bank("YNyn0d1"), request).At("M", FaultKind.LineToEarth).IkKa!.Value;
        double without = Run(Bank("YNyn0y0"), request).At("M", FaultKind.LineToEarth).IkKa!.Value;
        Assert.True(without > 0 && withDelta > without, $"{withDelta} against {without}");
    }
}
