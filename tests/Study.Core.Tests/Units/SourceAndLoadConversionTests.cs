// Generators, loads and shunts to the system base (base change and S = V²Y*, common practice).
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class SourceAndLoadConversionTests
{
    // Base change (common practice; DEVELOPERS.md, Outside references): x''d = 0.18 on 10 MVA at 11 kV is 0.18 · 100/10 = 1.8 pu
    // on 100 MVA at an 11 kV bus; at a 10.5 kV bus it is 1.8 · (11/10.5)².
    [Fact]
    public void Generator_reactances_change_to_the_system_base()
    {
        var g = new Generator { Id = "G1", Bus = "B5", PMw = 8, QMvar = 2, VSet = 1.01, QMinMvar = -3, QMaxMvar = 5,
            Mva = 10, Kv = 11, XdppPu = 0.18, X2Pu = 0.2, Xr = 30 };
        var c = GeneratorConversion.Convert(g, new Bus { Id = "B5", Kv = 11 }, 100);
        Assert.Equal(1.8, c.Z1Pu!.Value.Imaginary, 12);
        Assert.Equal(1.8 / 30, c.Z1Pu!.Value.Real, 12);
        Assert.Equal(2.0, c.Z2Pu!.Value.Imaginary, 12);
        Assert.Null(c.Z0Pu);
        Assert.Equal(0.08, c.P, 12);
        Assert.Equal(-0.03, c.QMin!.Value, 12);
        Assert.Equal(0.05, c.QMax!.Value, 12);

        var offBase = GeneratorConversion.Convert(g, new Bus { Id = "B5", Kv = 10.5 }, 100);
        Assert.Equal(1.8 * Math.Pow(11 / 10.5, 2), offBase.Z1Pu!.Value.Imaginary, 12);
    }

    [Fact]
    public void Q_limits_of_0_and_0_mean_no_limits_stated()
    {
        var g = new Generator { Id = "G2", Bus = "B", QMinMvar = 0, QMaxMvar = 0 };
        var c = GeneratorConversion.Convert(g, new Bus { Id = "B" }, 100);
        Assert.Null(c.QMin);
        Assert.Null(c.QMax);
    }

    [Fact]
    public void Generation_scale_applies_to_pv_generators_but_not_to_the_slack()
    {
        var pv = new Generator { Id = "G", Bus = "B", PMw = 20 };
        Assert.Equal(0.1, GeneratorConversion.Convert(pv, new Bus { Id = "B" }, 100, generationScale: 0.5).P, 12);
        Assert.Equal(0.2, GeneratorConversion.Convert(pv with { Mode = GeneratorMode.Slack }, new Bus { Id = "B" }, 100, 0.5).P, 12);
    }

    [Fact]
    public void A_load_is_scaled_and_keeps_its_ZIP_mix()
    {
        var zip = new ZipMix { Z = 0.3, I = 0.2, P = 0.5 };
        var c = LoadConversion.Convert(new Load { Id = "L1", Bus = "B3", PMw = 12, QMvar = 4, Zip = zip }, 0.35, 100);
        Assert.Equal(12 * 0.35 / 100, c.P, 12);
        Assert.Equal(4 * 0.35 / 100, c.Q, 12);
        Assert.Same(zip, c.Zip);
    }

    // A shunt rated at 1 pu draws S = V²·Y*: a 4 Mvar capacitor is B = +0.04 pu on 100 MVA.
    [Fact]
    public void A_4_Mvar_capacitor_is_0_04_pu_capacitive_susceptance()
    {
        var c = ShuntConversion.Convert(new Shunt { Id = "C1", Bus = "B3", QMvar = 4, PMw = 0.01 }, 100);
        Assert.Equal(0.04, c.B, 12);
        Assert.Equal(1e-4, c.G, 12);
    }
}
