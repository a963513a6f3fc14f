// A generator with its own unit transformer: K_S, K_SO, K_G,S and K_T,S (IEC 60909-0 §6.7), worked by hand.
using System.Numerics;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Units;
using static Study.Core.Tests.Faults.FaultNetworks;

namespace Study.Core.Tests.Faults;

public class PowerStationUnitTests
{
    // A 110 kV network (S''kQ 5000 MVA, X/R 10) with a 100 MVA, 10.5 kV generator (x''d 0.2, X/R 40, cos φ 0.85)
    // behind its own 115/10.5 kV, 100 MVA, 12 %, X/R 30 transformer; with or without an on-load tap changer.
    private static Network Unit(bool onLoad) => new()
    {
        Name = "power-station unit",
        Buses = [new Bus { Id = "HV", Kv = 110 }, new Bus { Id = "GEN", Kv = 10.5 }],
        Supplies = [Grid("HV", 5000, 10)],
        Generators =
        [
            new Generator
            {
                Id = "G", Bus = "GEN", Mode = GeneratorMode.Pv, PMw = 80, VSet = 1.0, Mva = 100, Kv = 10.5, XdppPu = 0.2, Xr = 40,
                PowerFactor = 0.85,
            },
        ],
        Transformers =
        [
            Bank("UT", "HV", "GEN", 100, 115, 10.5, 12, 30, "YNd5", hvNeutral: Solid) with
            {
                Tap = new TapChanger
                {
                    Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-8, 8),
                    Regulate = onLoad ? new TapRegulation { Bus = "GEN", VTarget = 1.0, BandPu = 0.02 } : null,
                },
            },
        ],
    };

    private const double XdPu = 0.2, SinPhi = 0.526782687642637; // √(1 − 0.85²)
    private static readonly double XtPu = 0.12 * 30 / Math.Sqrt(901);

    // IEC 60909-0:2016 §6.7 (from memory), with U_nQ = 110 kV, U_rG = 10.5 kV, U_rTHV/U_rTLV = 115/10.5, c_max 1.1,
    // p_G = p_T = 0: K_S = (110²/10.5²)·(10.5²/115²)·1.1/(1 + |0.2 − x_T|·sin φ) = 0.965696;
    // K_SO = (110/10.5)·(10.5/115)·1.1/(1 + 0.2·sin φ) = 0.951886; K_G,S = 1.1/(1 + 0.2·sin φ) = 0.995154;
    // K_T,S = 1.1/(1 − x_T·sin φ) = 1.174184, x_T = 0.12·30/√901.
    [Theory]
    [InlineData(true, 0.965696)]
    [InlineData(false, 0.951886)]
    public void The_unit_factor_is_K_S_with_an_on_load_tap_changer_and_K_SO_without(bool onLoad, double factor)
    {
        var notes = new List<string>();
        var unit = Assert.Single(PowerStationUnits.Find(PerUnitModel.Build(Unit(onLoad)), notes));
        Assert.Equal(("G", "UT", onLoad), (unit.Generator, unit.Transformer, unit.OnLoad));
        Assert.Equal(factor, unit.Unit, 6);
        Assert.Equal(0.995154, unit.GeneratorAtTerminals, 6);
        Assert.Equal(1.174184, unit.TransformerAtTerminals, 6);
        Assert.Contains(notes, n => n.Contains(onLoad ? "K_S = 0.9657" : "K_SO = 0.9519", StringComparison.Ordinal));
    }

    // The fault on the network side sees Z_S = K·(t_r²·Z_G + Z_THV) in parallel with Z_Q, all in ohm at 110 kV:
    // Z_Q = 1.1·110²/5000 (X/R 10), Z_G = 0.2·10.5²/100 (X/R 40), t_r = 115/10.5, Z_THV = 0.12·115²/100 (X/R 30).
    // At the generator terminals K_G,S·Z_G is in parallel with K_T,S·Z_TLV + Z_Q/t_r², at 10.5 kV.
    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Faults_on_either_side_of_the_unit_match_the_hand_calculation(bool onLoad)
    {
        double cos(double xr) => 1 / Math.Sqrt(1 + xr * xr);
        Complex Z(double magnitude, double xr) => Complex.FromPolarCoordinates(magnitude, Math.Acos(cos(xr)));
        Complex zq = Z(1.1 * 110 * 110 / 5000, 10);
        double tr = 115 / 10.5;
        Complex zg = new Complex(0.2 * 10.5 * 10.5 / 100 / 40, 0.2 * 10.5 * 10.5 / 100);
        Complex zthv = Z(0.12 * 115 * 115 / 100, 30), ztlv = Z(0.12 * 10.5 * 10.5 / 100, 30);
        double k = onLoad
            ? Math.Pow(110 / 10.5 * 10.5 / 115, 2) * 1.1 / (1 + Math.Abs(XdPu - XtPu) * SinPhi)
            : 110 / 10.5 * 10.5 / 115 * 1.1 / (1 + XdPu * SinPhi);
        Complex zs = k * (tr * tr * zg + zthv);
        Complex Parallel(Complex a, Complex b) => a * b / (a + b);
        double ikHv = 1.1 * 110 / (Math.Sqrt(3) * Parallel(zq, zs).Magnitude);
        double kgs = 1.1 / (1 + XdPu * SinPhi), kts = 1.1 / (1 - XtPu * SinPhi);
        double ikGen = 1.1 * 10.5 / (Math.Sqrt(3) * Parallel(kgs * zg, kts * ztlv + zq / (tr * tr)).Magnitude);

        var r = Run(Unit(onLoad), new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        Assert.Equal(ikHv, r.At("HV", FaultKind.ThreePhase).IkKa!.Value, 9);
        Assert.Equal(ikGen, r.At("GEN", FaultKind.ThreePhase).IkKa!.Value, 9);
    }

    // A generator whose bus has a second branch, or a second source, is not a unit: K_G and K_T stay separate.
    [Fact]
    public void A_generator_with_more_than_its_unit_transformer_is_corrected_by_K_G_and_K_T()
    {
        var network = Unit(false);
        var feeder = network with
        {
            Buses = [.. network.Buses, new Bus { Id = "AUX", Kv = 10.5 }],
            Lines = [new Line { Id = "F", From = "GEN", To = "AUX", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.1, X = 0.1 } }],
        };
        Assert.Empty(PowerStationUnits.Find(PerUnitModel.Build(feeder), []));
        var second = network with { Supplies = [.. network.Supplies, Grid("GEN", 500) with { Id = "LOCAL" }] };
        Assert.Empty(PowerStationUnits.Find(PerUnitModel.Build(second), []));
        // The load-flow method applies no correction factors at all.
        var flow = Run(network, new FaultRequest { Kinds = [FaultKind.ThreePhase], Method = FaultMethod.LoadFlow });
        Assert.DoesNotContain(flow.Notes, n => n.Contains("power-station unit", StringComparison.Ordinal));
    }
}
