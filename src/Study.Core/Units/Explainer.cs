// Finds an element by id and traces it from its data to the per-unit values the engine uses.
using System.Globalization;
using Study.Core.Model;
using static Study.Core.Units.Derivation;

namespace Study.Core.Units;

/// <summary>
/// `study explain FILE ID`: the same conversion routines the model builder calls, returning their
/// steps. Ids are unique within a family; when two families share an id, the first found in the order
/// buses, sources, branches, loads, shunts and motors, breakers is explained.
/// </summary>
public static class Explainer
{
    public static ElementExplanation Explain(Network network, string id, Scenario? scenario = null)
    {
        double s = network.BaseMva;
        if (network.FindBus(id) is { } bus) return Bus(bus, s);
        if (network.Supplies.FirstOrDefault(e => e.Id == id) is { } supply) return Supply(network, supply, s);
        if (network.Generators.FirstOrDefault(e => e.Id == id) is { } gen) return Generator(network, gen, s, scenario);
        if (network.Lines.FirstOrDefault(e => e.Id == id) is { } line) return Line(network, line, s);
        if (network.Transformers.FirstOrDefault(e => e.Id == id) is { } t) return Transformer(network, t, s);
        if (network.ThreeWindingTransformers.FirstOrDefault(e => e.Id == id) is { } t3) return ThreeWinding(network, t3, s);
        if (network.Loads.FirstOrDefault(e => e.Id == id) is { } load) return Load(load, s, scenario);
        if (network.Shunts.FirstOrDefault(e => e.Id == id) is { } shunt) return Shunt(shunt, s);
        if (network.Motors.FirstOrDefault(e => e.Id == id) is { } motor) return Motor(network, motor, s, scenario);
        if (network.Breakers.FirstOrDefault(e => e.Id == id) is { } breaker) return Breaker(network, breaker, s);
        throw new InputException($"no element with id {id}", elementId: id);
    }

    private static ElementExplanation Bus(Bus bus, double s)
    {
        var inputs = new Inputs().Num("kv", bus.Kv, "kV").Num("vMin", bus.VMin, "pu").Num("vMax", bus.VMax, "pu").Text("zone", bus.Zone);
        string kv = bus.Kv > 0 ? $"{N(bus.Kv)} kV" : "kV not stated";
        return new(bus.Id, ElementKind.Bus, $"Bus {bus.Id}, {kv}", inputs.List, BaseQuantities.ForBus(bus, s).Steps);
    }

    private static ElementExplanation Line(Network n, Line l, double s)
    {
        var inputs = new Inputs().Text("from", l.From).Text("to", l.To).Num("km", l.Km, "km");
        AddSequence(inputs, "z1", l.Z1);
        AddSequence(inputs, "z0", l.Z0);
        inputs.Num("ratingMva", l.RatingMva, "MVA").Text("conductor", l.Conductor switch
        {
            ConductorMaterial.Copper => "copper",
            ConductorMaterial.Aluminium => "aluminium",
            _ => null,
        });
        var c = LineImpedance.Convert(l, BusOf(n, l.From, l.Id), s);
        var steps = c.Steps.ToList();
        double alpha = ConductorResistance.Coefficient(l.Conductor);
        string alphaWhy = l.Conductor is null ? "conductor not given" : $"{(l.Conductor == ConductorMaterial.Copper ? "copper" : "aluminium")}";
        steps.Add(l.Conductor is null
            ? new DerivationStep("α", "conductor not given: 0.004 /K", alpha, "/K",
                "conductor not given: α = 0.004 /K taken for the resistance at the end-of-fault temperature (default, not data)")
            : new DerivationStep("α", $"{alphaWhy} at 20 °C", alpha, "/K"));
        steps.Add(new DerivationStep("R at 80 °C", $"minimum fault levels: [1 + α·(80 − 20)] · r = [1 + {N(alpha)}·60] · r",
            ConductorResistance.Factor(alpha, 80), "× r"));
        return new(l.Id, ElementKind.Line, $"Line {l.Id}, {l.From} – {l.To}", inputs.List, steps);
    }

    private static ElementExplanation Transformer(Network n, Transformer t, double s)
    {
        var inputs = new Inputs().Text("hv", t.Hv).Text("lv", t.Lv).Num("mva", t.Mva, "MVA").Num("hvKv", t.HvKv, "kV").Num("lvKv", t.LvKv, "kV")
            .Num("zPercent", t.ZPercent, "%").Num("xr", t.Xr, "").Num("z0Percent", t.Z0Percent, "%").Num("units", t.Units, "")
            .Text("vectorGroup", t.VectorGroup).Num("phaseShiftDeg", t.PhaseShiftDeg, "°")
            .Num("rPu", t.RPu, "pu").Num("xPu", t.XPu, "pu").Num("bPu", t.BPu, "pu").Num("ratio", t.Ratio, "pu")
            .Num("ratingMva", t.RatingMva, "MVA");
        AddTap(inputs, t.Tap);
        if (t.NoLoad is { } nl) inputs.Num("noLoad.i0Percent", nl.I0Percent, "%").Num("noLoad.p0Kw", nl.P0Kw, "kW");
        var c = TransformerImpedance.Convert(t, BusOf(n, t.Hv, t.Id), BusOf(n, t.Lv, t.Id), s);
        var steps = c.Steps.ToList();
        if (t.Units > 1)
            foreach (var (side, neutral) in new[] { ("hv", t.HvNeutral), ("lv", t.LvNeutral) })
                if (neutral is { Grounded: true } e)
                    steps.Add(new DerivationStep($"Z_N {side} (bank)", $"one neutral impedance per unit, in parallel: Z_N / units = {N(e.ROhm)} + j{N(e.XOhm)} ohm / {t.Units}",
                        Math.Sqrt(e.ROhm * e.ROhm + e.XOhm * e.XOhm) / t.Units, "ohm"));
        string rating = t.Mva is double mva ? $", {N(t.HvKv ?? 0)}/{N(t.LvKv ?? 0)} kV, {N(mva)} MVA" + (t.Units > 1 ? $" × {t.Units}" : "") : ", per-unit data";
        return new(t.Id, ElementKind.Transformer, $"Transformer {t.Id}, {t.Hv} (hv) – {t.Lv} (lv){rating}", inputs.List, steps);
    }

    private static ElementExplanation ThreeWinding(Network n, ThreeWindingTransformer t, double s)
    {
        var inputs = new Inputs().Text("hv", t.Hv).Text("mv", t.Mv).Text("lv", t.Lv)
            .Num("hvKv", t.HvKv, "kV").Num("mvKv", t.MvKv, "kV").Num("lvKv", t.LvKv, "kV")
            .Num("mvaHv", t.MvaHv, "MVA").Num("mvaMv", t.MvaMv, "MVA").Num("mvaLv", t.MvaLv, "MVA")
            .Num("zHmPercent", t.ZHmPercent, "%").Num("zHlPercent", t.ZHlPercent, "%").Num("zMlPercent", t.ZMlPercent, "%")
            .Num("zBaseMva", t.ZBaseMva, "MVA").Num("xr", t.Xr, "").Text("vectorGroup", t.VectorGroup);
        AddTap(inputs, t.Tap);
        if (t.NoLoad is { } nl) inputs.Num("noLoad.i0Percent", nl.I0Percent, "%").Num("noLoad.p0Kw", nl.P0Kw, "kW");
        var c = ThreeWindingStar.Convert(t, BusOf(n, t.Hv, t.Id), BusOf(n, t.Mv, t.Id), BusOf(n, t.Lv, t.Id), s);
        return new(t.Id, ElementKind.ThreeWindingTransformer,
            $"Three-winding transformer {t.Id}, {N(t.HvKv)}/{N(t.MvKv)}/{N(t.LvKv)} kV, star bus {ThreeWindingStar.StarBusId(t.Id)}",
            inputs.List, c.Steps);
    }

    private static ElementExplanation Supply(Network n, Supply sp, double s)
    {
        var inputs = new Inputs().Text("bus", sp.Bus).Num("vSet", sp.VSet, "pu").Num("angleDeg", sp.AngleDeg, "°")
            .Num("scMvaMax", sp.ScMvaMax, "MVA").Num("scMvaMin", sp.ScMvaMin, "MVA").Num("xr", sp.Xr, "").Num("z0z1", sp.Z0Z1, "");
        var bus = BusOf(n, sp.Bus, sp.Id);
        var steps = new List<DerivationStep>
        {
            new("V_set", "vSet given (slack)", sp.VSet, "pu"),
            new("angle", $"angleDeg · π / 180 = {N(sp.AngleDeg)} · π / 180", sp.AngleDeg * Math.PI / 180.0, "rad"),
        };
        if (sp.ScMvaMax is not null)
        {
            foreach (var (level, c) in new[] { (FaultLevel.Max, SupplyImpedance.CMax(bus.Kv)), (FaultLevel.Min, SupplyImpedance.CMin(bus.Kv)) })
            {
                string tag = level == FaultLevel.Max ? "max" : "min";
                steps.AddRange(SupplyImpedance.Convert(sp, bus, s, c, level).Steps.Select(st => st with { Label = $"{tag}: {st.Label}" }));
            }
        }
        return new(sp.Id, ElementKind.Supply, $"Supply {sp.Id} at {sp.Bus} (slack)", inputs.List, steps);
    }

    private static ElementExplanation Generator(Network n, Generator g, double s, Scenario? scenario)
    {
        var inputs = new Inputs().Text("bus", g.Bus).Text("mode", g.Mode.ToString().ToLowerInvariant()).Num("pMw", g.PMw, "MW").Num("qMvar", g.QMvar, "Mvar")
            .Num("vSet", g.VSet, "pu").Num("angleDeg", g.AngleDeg, "°").Num("qMinMvar", g.QMinMvar, "Mvar").Num("qMaxMvar", g.QMaxMvar, "Mvar")
            .Num("mva", g.Mva, "MVA").Num("kv", g.Kv, "kV").Num("xdppPu", g.XdppPu, "pu").Num("x2Pu", g.X2Pu, "pu")
            .Num("x0Pu", g.X0Pu, "pu").Num("xr", g.Xr, "").Text("scenario", scenario?.Name);
        var c = GeneratorConversion.Convert(g, BusOf(n, g.Bus, g.Id), s, scenario?.GenerationScale ?? 1.0);
        return new(g.Id, ElementKind.Generator, $"Generator {g.Id} at {g.Bus} ({g.Mode.ToString().ToLowerInvariant()})", inputs.List, c.Steps);
    }

    private static ElementExplanation Load(Load l, double s, Scenario? scenario)
    {
        var inputs = new Inputs().Text("bus", l.Bus).Num("pMw", l.PMw, "MW").Num("qMvar", l.QMvar, "Mvar").Text("scenario", scenario?.Name);
        var c = LoadConversion.Convert(l, scenario?.LoadScale ?? 1.0, s);
        return new(l.Id, ElementKind.Load, $"Load {l.Id} at {l.Bus}", inputs.List, c.Steps);
    }

    private static ElementExplanation Shunt(Shunt sh, double s)
    {
        var inputs = new Inputs().Text("bus", sh.Bus).Num("qMvar", sh.QMvar, "Mvar").Num("pMw", sh.PMw, "MW");
        string kind = sh.QMvar >= 0 ? "capacitor" : "reactor";
        return new(sh.Id, ElementKind.Shunt, $"Shunt {sh.Id} at {sh.Bus} ({kind})", inputs.List, ShuntConversion.Convert(sh, s).Steps);
    }

    private static ElementExplanation Motor(Network n, Motor m, double s, Scenario? scenario)
    {
        var inputs = new Inputs().Text("bus", m.Bus).Num("mw", m.Mw, "MW").Num("kv", m.Kv, "kV").Num("powerFactor", m.PowerFactor, "")
            .Num("efficiency", m.Efficiency, "").Num("polePairs", m.PolePairs, "").Num("units", m.Units, "")
            .Text("lowVoltageGroup", m.LowVoltageGroup ? "true" : null).Num("loadPercent", m.LoadPercent, "%")
            .Num("lockedRotor.currentRatio", m.LockedRotor?.CurrentRatio, "").Num("lockedRotor.powerFactor", m.LockedRotor?.PowerFactor, "")
            .Text("starter.method", m.Starter is { } st ? StarterName(st.Method) : null)
            .Num("starter.tapPercent", m.Starter?.TapPercent, "%").Num("starter.currentLimit", m.Starter?.CurrentLimit, "× rated")
            .Text("scenario", scenario?.Name);
        var c = MotorConversion.Convert(m, BusOf(n, m.Bus, m.Id), s, scenario?.LoadScale ?? 1.0);
        var steps = c.Steps.ToList();
        if (m.Starter is null)
            steps.Add(new DerivationStep("starter", "not given: direct on line", 1.0, "", "starter not given: started direct on line (default, not data)"));
        string units = m.Units > 1 ? $" × {m.Units}" : "";
        string group = m.LowVoltageGroup ? "low-voltage motor group" : "motor";
        return new(m.Id, ElementKind.Motor, $"{char.ToUpperInvariant(group[0])}{group[1..]} {m.Id} at {m.Bus}, {N(m.Mw ?? 0)} MW{units}", inputs.List, steps);
    }

    private static string StarterName(StarterMethod method) => method switch
    {
        StarterMethod.Direct => "direct",
        StarterMethod.StarDelta => "starDelta",
        StarterMethod.Autotransformer => "autotransformer",
        _ => "softStarter",
    };

    private static ElementExplanation Breaker(Network n, Breaker b, double s)
    {
        var inputs = new Inputs().Text("bus", b.Bus).Text("branch", b.Branch).Num("interruptingKa", b.InterruptingKa, "kA").Num("peakKa", b.PeakKa, "kA")
            .Num("dcPercent", b.DcPercent, "%").Num("shortTimeKa", b.ShortTimeKa, "kA").Num("shortTimeS", b.ShortTimeS, "s").Num("minTripS", b.MinTripS, "s");
        var steps = BaseQuantities.ForBus(BusOf(n, b.Bus, b.Id), s).Steps.ToList();
        if (b.ShortTimeKa is not null && b.ShortTimeS is null)
            steps.Add(new DerivationStep("shortTimeS", "= 1", 1.0, "s", "shortTimeS not given: 1 s taken (the usual rated duration, default, not data)"));
        if (b.MinTripS is null)
            steps.Add(new DerivationStep("t_min", "the study's --tmin (0.1 s unless given)", 0.1, "s", "minTripS not given: the study's minimum time delay is used"));
        if (b.DcPercent is not null && b.InterruptingKa > 0)
            steps.Add(new DerivationStep("I_b,asym rated", $"interruptingKa · √(1 + 2·(dcPercent/100)²) = {N(b.InterruptingKa)} · √(1 + 2·({N(b.DcPercent.Value)}/100)²)",
                b.InterruptingKa * Math.Sqrt(1 + 2 * Math.Pow(b.DcPercent.Value / 100, 2)), "kA"));
        string what = b.Branch is null ? "" : $", switching {b.Branch}";
        return new(b.Id, ElementKind.Breaker, $"Breaker {b.Id} at {b.Bus}{what}", inputs.List, steps);
    }

    private static void AddSequence(Inputs inputs, string key, SequenceImpedance? z)
    {
        if (z is null) return;
        (string ohm, string siemens, string per) = z.Per switch
        {
            ImpedanceBasis.PerKm => ("ohm/km", "µS/km", "km"),
            ImpedanceBasis.WholeLine => ("ohm", "µS", "line"),
            _ => ("pu", "pu", "pu"),
        };
        inputs.Text($"{key}.per", per).Num($"{key}.r", z.R, ohm).Num($"{key}.x", z.X, ohm).Num($"{key}.b", z.B, siemens);
    }

    private static void AddTap(Inputs inputs, TapChanger? tap)
    {
        if (tap is null) return;
        inputs.Text("tap.winding", tap.Winding.ToString().ToLowerInvariant()).Num("tap.percentPerStep", tap.PercentPerStep, "%")
            .Text("tap.range", $"[{tap.Range.Lowest}, {tap.Range.Highest}]").Num("tap.position", tap.Position, "");
        if (tap.Regulate is { } r)
            inputs.Text("tap.regulate.bus", r.Bus).Num("tap.regulate.vTarget", r.VTarget, "pu").Num("tap.regulate.bandPu", r.BandPu, "pu");
    }

    private static Bus BusOf(Network n, string busId, string elementId) =>
        n.FindBus(busId) ?? throw new InputException($"bus {busId} not found", elementId: elementId);

    /// <summary>Collects the inputs that are present, skipping absent optional fields.</summary>
    private sealed class Inputs
    {
        private readonly List<ExplainedInput> list = [];

        public IReadOnlyList<ExplainedInput> List => list.ToArray();

        public Inputs Num(string name, double? value, string unit)
        {
            if (value is double v) list.Add(new ExplainedInput(name, v.ToString(CultureInfo.InvariantCulture), unit));
            return this;
        }

        public Inputs Text(string name, string? value)
        {
            if (value is not null) list.Add(new ExplainedInput(name, value, ""));
            return this;
        }
    }
}

/// <summary>One input as the file gives it, value already formatted (invariant culture) with its unit.</summary>
public sealed record ExplainedInput(string Name, string Value, string Unit);

/// <summary>
/// An element traced from its data to the system-base per-unit values the engine uses. Steps whose
/// <see cref="DerivationStep.Note"/> is set are defaults or assumptions, not data.
/// </summary>
public sealed record ElementExplanation(
    string Id, ElementKind Kind, string Title, IReadOnlyList<ExplainedInput> Inputs, IReadOnlyList<DerivationStep> Steps);
