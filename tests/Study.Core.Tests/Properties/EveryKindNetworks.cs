// Networks that hold every element kind with random field values, optional fields present or absent.
using CsCheck;
using Study.Core.Model;

namespace Study.Core.Tests.Properties;

/// <summary>
/// Built from a <see cref="Tape"/>: not meant to be solvable or even valid, only to be a network a
/// file can hold — every kind, every nested object (tap, regulate, noLoad, neutral, zip), inService
/// false, absent and present optional keys, finite numbers of any size.
/// </summary>
internal static class EveryKindNetworks
{
    public static Gen<Network> Gen { get; } = Tape.Gen(0, 600).Select(values => Build(new Tape(values)));

    public static Network Build(Tape t)
    {
        int busCount = t.Int(1, 5);
        var buses = Enumerable.Range(0, busCount).Select(i => Bus(t, i)).ToList();
        string BusId() => t.Chance(90) ? t.Pick(buses).Id : t.Text();
        return new Network
        {
            Name = t.Text(),
            Version = Network.CurrentVersion,
            BaseMva = Number(t, 1, 1000),
            FrequencyHz = t.Chance(70) ? 50 : Number(t, 1, 400),
            Buses = buses,
            Supplies = Many(t, i => new Supply
            {
                Id = t.Id("S", i), Bus = BusId(), VSet = Number(t, 0.9, 1.1), AngleDeg = Number(t, -30, 30),
                ScMvaMax = Optional(t, 10, 50000), ScMvaMin = Optional(t, 10, 50000), Xr = Optional(t, 1, 40),
                Z0Z1 = Optional(t, 0.1, 3), InService = t.Chance(80),
            }),
            Generators = Many(t, i => new Generator
            {
                Id = t.Id("G", i), Bus = BusId(), Mode = t.Pick([GeneratorMode.Slack, GeneratorMode.Pv, GeneratorMode.Pq]),
                PMw = Number(t, -50, 50), QMvar = Number(t, -20, 20), VSet = Number(t, 0.9, 1.1),
                QMinMvar = Optional(t, -50, 0), QMaxMvar = Optional(t, 0, 50), Mva = Optional(t, 1, 500), Kv = Optional(t, 0.4, 33),
                XdppPu = Optional(t, 0.05, 0.4), X2Pu = Optional(t, 0.05, 0.4), X0Pu = Optional(t, 0.01, 0.2), Xr = Optional(t, 5, 80),
                PowerFactor = Optional(t, 0.7, 1), Neutral = t.Chance(50) ? Earthing(t) : null, InService = t.Chance(80),
            }),
            Loads = Many(t, i => new Load
            {
                Id = t.Id("L", i), Bus = BusId(), PMw = Number(t, -10, 100), QMvar = Number(t, -10, 50),
                Zip = t.Chance(50) ? new ZipMix { Z = Number(t, 0, 1), I = Number(t, 0, 1), P = Number(t, 0, 1) } : null,
                InService = t.Chance(80),
            }),
            Shunts = Many(t, i => new Shunt
            {
                Id = t.Id("C", i), Bus = BusId(), QMvar = Number(t, -20, 20), PMw = Number(t, 0, 1), InService = t.Chance(80),
            }),
            Lines = Many(t, i => Line(t, i, BusId(), BusId())),
            Transformers = Many(t, i => Transformer(t, i, BusId(), BusId(), BusId())),
            ThreeWindingTransformers = Many(t, i => new ThreeWindingTransformer
            {
                Id = t.Id("T3-", i), Hv = BusId(), Mv = BusId(), Lv = BusId(),
                HvKv = Number(t, 66, 400), MvKv = Number(t, 11, 66), LvKv = Number(t, 0.4, 11),
                MvaHv = Number(t, 5, 500), MvaMv = Number(t, 5, 500), MvaLv = Number(t, 1, 100),
                ZHmPercent = Number(t, 5, 20), ZHlPercent = Number(t, 5, 30), ZMlPercent = Number(t, 3, 15),
                ZBaseMva = Number(t, 5, 500), Xr = Number(t, 5, 60), VectorGroup = t.Chance(60) ? t.Pick(["YNyn0d1", "YNd1d1", "Yyn0d11"]) : null,
                HvNeutral = t.Chance(40) ? Earthing(t) : null, MvNeutral = t.Chance(40) ? Earthing(t) : null,
                LvNeutral = t.Chance(40) ? Earthing(t) : null, Tap = t.Chance(50) ? Tap(t, BusId(), withMv: true) : null,
                NoLoad = t.Chance(40) ? new NoLoadLoss { I0Percent = Number(t, 0, 2), P0Kw = Number(t, 0, 200) } : null,
                InService = t.Chance(80),
            }),
            Breakers = Many(t, i => new Breaker
            {
                Id = t.Id("CB", i), Bus = BusId(), InterruptingKa = Number(t, 0, 63), PeakKa = Number(t, 0, 160), InService = t.Chance(80),
            }),
            Scenarios = Many(t, i => new Scenario
            {
                Name = t.Id("case", i), LoadScale = Number(t, 0, 2), GenerationScale = Optional(t, 0, 2),
                Description = t.Chance(50) ? t.Text() : null,
            }),
            PublishedSolution = t.Chance(20)
                ? new PublishedSolution
                {
                    Source = t.Chance(50) ? t.Text() : null,
                    Buses = Many(t, i => new PublishedBus
                    {
                        Id = t.Id("B", i), VPu = Number(t, 0.9, 1.1), AngleDeg = Number(t, -40, 40),
                        PGenMw = Number(t, 0, 100), QGenMvar = Number(t, -50, 50),
                    }),
                }
                : null,
        };
    }

    private static List<T> Many<T>(Tape t, Func<int, T> make) => Enumerable.Range(0, t.Int(0, 3)).Select(make).ToList();

    /// <summary>Mostly engineering values; sometimes any finite double, to check that every bit survives.</summary>
    private static double Number(Tape t, double min, double max) => t.Chance(85) ? t.Double(min, max) : t.AnyFinite();

    private static double? Optional(Tape t, double min, double max) => t.Chance(50) ? Number(t, min, max) : null;

    private static Bus Bus(Tape t, int i) => new()
    {
        Id = t.Id("B", i), Kv = t.Chance(90) ? t.Pick([0.4, 11, 33, 66, 132]) : Number(t, 0, 400),
        VMin = t.Chance(70) ? 0.95 : Number(t, 0.8, 1), VMax = t.Chance(70) ? 1.05 : Number(t, 1, 1.2),
        Zone = t.Chance(40) ? t.Text() : null, Name = t.Chance(60) ? t.Text() : null, InService = t.Chance(85),
    };

    private static Earthing Earthing(Tape t) => new()
    {
        Grounded = t.Chance(70), ROhm = Number(t, 0, 50), XOhm = Number(t, 0, 50),
    };

    private static TapChanger Tap(Tape t, string regulatedBus, bool withMv)
    {
        int min = t.Int(-16, 0), max = t.Int(0, 16);
        return new TapChanger
        {
            Winding = withMv ? t.Pick([TapWinding.Hv, TapWinding.Mv, TapWinding.Lv]) : t.Pick([TapWinding.Hv, TapWinding.Lv]),
            PercentPerStep = Number(t, 0.5, 2.5), Range = new(min, max),
            Position = t.Int(min, max),
            Regulate = t.Chance(50)
                ? new TapRegulation { Bus = regulatedBus, VTarget = Number(t, 0.95, 1.05), BandPu = Number(t, 0.005, 0.05) }
                : null,
        };
    }

    /// <summary>A line with each sequence on a basis of its own (or absent), and the length present or absent.</summary>
    private static Line Line(Tape t, int i, string from, string to) => new()
    {
        Id = t.Id("F", i), From = from, To = to, Km = Optional(t, 0.1, 40, 80), RatingMva = Optional(t, 1, 200), InService = t.Chance(80),
        Z1 = t.Chance(95) ? Sequence(t, 0.01, 1, 0.05, 0.5, 300) : null,
        Z0 = t.Chance(60) ? Sequence(t, 0.05, 2, 0.1, 2, 200) : null,
    };

    private static SequenceImpedance Sequence(Tape t, double rLow, double rHigh, double xLow, double xHigh, double bHigh)
    {
        ImpedanceBasis per = t.Pick([ImpedanceBasis.PerKm, ImpedanceBasis.WholeLine, ImpedanceBasis.PerUnit]);
        double scale = per == ImpedanceBasis.PerUnit ? 0.2 : per == ImpedanceBasis.WholeLine ? 10 : 1;
        return new SequenceImpedance
        {
            Per = per, R = Number(t, rLow * scale, rHigh * scale), X = Number(t, xLow * scale, xHigh * scale),
            B = Optional(t, 0, bHigh * (per == ImpedanceBasis.PerUnit ? 0.001 : per == ImpedanceBasis.WholeLine ? 10 : 1)),
        };
    }

    private static double? Optional(Tape t, double min, double max, int percent) => t.Chance(percent) ? Number(t, min, max) : null;

    private static Transformer Transformer(Tape t, int i, string hv, string lv, string regulated)
    {
        var common = new Transformer
        {
            Id = t.Id("T", i), Hv = hv, Lv = lv, Units = t.Chance(80) ? 1 : t.Int(1, 4),
            VectorGroup = t.Chance(60) ? t.Pick(["YNd11", "Dyn1", "YNyn0", "Yzn11", "Dyn11"]) : null,
            HvNeutral = t.Chance(40) ? Earthing(t) : null, LvNeutral = t.Chance(40) ? Earthing(t) : null,
            Tap = t.Chance(50) ? Tap(t, regulated, withMv: false) : null,
            PhaseShiftDeg = t.Chance(80) ? 0 : Number(t, -30, 30), RatingMva = Optional(t, 1, 500),
            InService = t.Chance(80),
        };
        return t.Chance(60)
            ? common with
            {
                Mva = Optional(t, 1, 500, 95), HvKv = Optional(t, 11, 400, 95), LvKv = Optional(t, 0.4, 132, 95),
                ZPercent = Optional(t, 4, 20, 95), Xr = Optional(t, 5, 60, 95), Z0Percent = Optional(t, 3, 20),
                NoLoad = t.Chance(40) ? new NoLoadLoss { I0Percent = Number(t, 0, 2), P0Kw = Number(t, 0, 200) } : null,
            }
            : common with
            {
                RPu = Optional(t, 0, 0.05, 90), XPu = Optional(t, -0.05, 0.5, 95), BPu = Optional(t, 0, 0.1),
                Ratio = Optional(t, 0.9, 1.1), HvKv = Optional(t, 11, 400, 10), LvKv = Optional(t, 0.4, 132, 10),
            };
    }
}
