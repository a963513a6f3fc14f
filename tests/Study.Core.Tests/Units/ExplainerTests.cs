// `study explain`: every element traced back to its data with the numbers the engine uses.
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Tests.Units;

public class ExplainerTests
{
    private static Network Sample() => new()
    {
        BaseMva = 100,
        Buses = [new Bus { Id = "B0", Kv = 132 }, new Bus { Id = "B1", Kv = 33 }, new Bus { Id = "B2", Kv = 33 }, new Bus { Id = "B3", Kv = 11 }],
        Supplies = [new Supply { Id = "GRID", Bus = "B0", ScMvaMax = 3000, ScMvaMin = 2000, Xr = 12 }],
        Transformers =
        [
            TransformerImpedanceTests.Bank132To33(new TapChanger { Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-8, 8), Position = 2 })
                with { NoLoad = new NoLoadLoss { I0Percent = 0.3, P0Kw = 40 } },
        ],
        ThreeWindingTransformers = [ThreeWindingStarTests.Bank() with { Hv = "B0", Mv = "B1", Lv = "B3" }],
        Lines = [new Line { Id = "F1", From = "B1", To = "B2", Km = 5.2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38, B = 3 } }],
        Loads = [new Load { Id = "L1", Bus = "B1", PMw = 12, QMvar = 4 }],
        Shunts = [new Shunt { Id = "C1", Bus = "B1", QMvar = 4 }],
        Generators = [new Generator { Id = "G1", Bus = "B3", PMw = 8, Mva = 10, Kv = 11, XdppPu = 0.18 }],
        Breakers = [new Breaker { Id = "CB1", Bus = "B3", InterruptingKa = 25, PeakKa = 63 }],
    };

    private static double Value(ElementExplanation e, string label) => e.Steps.Single(s => s.Label == label).Value;

    // The numbers of the 132/33 kV, 60 MVA, 12.5 %, X/R 25 bank on 100 MVA (base change, common practice):
    // z = 0.125 own, |z| = 0.2083333, r = 0.00832667, x = 0.2081668; t = 1.025 at +2 × 1.25 % (tap direction,
    // common practice); G_m = 40 kW / 100 MVA = 4e-4 pu (open-circuit test); z0 not given, so taken = z.
    [Fact]
    public void A_transformer_explanation_lists_each_step_with_its_numbers()
    {
        var e = Explainer.Explain(Sample(), "T1");
        Assert.Equal(ElementKind.Transformer, e.Kind);
        Assert.Contains("132/33 kV, 60 MVA", e.Title);
        Assert.Contains(e.Inputs, i => i.Name == "zPercent" && i.Value == "12.5" && i.Unit == "%");
        Assert.Equal(0.125, Value(e, "z (own base)"), 12);
        Assert.Equal(0.2083333, Value(e, "|z| (system base)"), 7);
        Assert.Equal(0.00832667, Value(e, "r"), 7);
        Assert.Equal(0.2081668, Value(e, "x"), 6);
        Assert.Equal(1.025, Value(e, "t"), 12);
        Assert.Equal(4e-4, Value(e, "G_m"), 12);
        var z0 = e.Steps.Single(s => s.Label == "z0Percent");
        Assert.Equal(TransformerImpedance.Z0DefaultNote, z0.Note);
        Assert.Equal(12.5, z0.Value);
        Assert.Contains("12.5 / 100", e.Steps.Single(s => s.Label == "z (own base)").Formula);
    }

    // Common practice: Z_base = 11² / 100 = 1.21 ohm and I_base = 100 MVA / (√3 · 11 kV) = 5248.6 A.
    [Fact]
    public void A_bus_explanation_gives_its_ohm_and_ampere_bases()
    {
        var e = Explainer.Explain(Sample(), "B3");
        Assert.Equal(1.21, Value(e, "Z_base"), 12);
        Assert.Equal(5248.6, Value(e, "I_base"), 1);
    }

    // IEC 60909-0 (from memory): Z_Q = c · U_n² / S''kQ = 1.1 · 132² / 3000 = 6.389 ohm at the maximum level.
    [Fact]
    public void A_supply_explanation_gives_the_feeder_impedance_at_both_fault_levels()
    {
        var e = Explainer.Explain(Sample(), "GRID");
        Assert.Equal(6.389, Value(e, "max: |Z_Q|"), 3);
        Assert.Equal(132.0 * 132 / 2000, Value(e, "min: |Z_Q|"), 9);
    }

    [Theory]
    [InlineData("F1", ElementKind.Line, "r1")]
    [InlineData("T3", ElementKind.ThreeWindingTransformer, "z_M")]
    [InlineData("L1", ElementKind.Load, "P")]
    [InlineData("C1", ElementKind.Shunt, "B")]
    [InlineData("G1", ElementKind.Generator, "x''d")]
    [InlineData("CB1", ElementKind.Breaker, "I_base")]
    public void Every_element_kind_can_be_explained(string id, ElementKind kind, string label)
    {
        var e = Explainer.Explain(Sample(), id);
        Assert.Equal(kind, e.Kind);
        Assert.Contains(e.Steps, s => s.Label == label);
    }

    [Fact]
    public void A_load_explained_in_a_scenario_shows_the_scaled_value()
    {
        var e = Explainer.Explain(Sample(), "L1", new Scenario { Name = "light", LoadScale = 0.35 });
        Assert.Equal(12 * 0.35 / 100, Value(e, "P"), 12);
    }

    [Fact]
    public void An_unknown_id_is_an_input_error_naming_it()
    {
        var ex = Assert.Throws<InputException>(() => Explainer.Explain(Sample(), "NOPE"));
        Assert.Equal("NOPE", ex.ElementId);
        Assert.Contains("no element with id NOPE", ex.Message);
    }
}
