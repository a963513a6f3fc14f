// Small networks for the validation tests: a clean 132/33/11 kV system to break one rule at a time.
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.Core.Tests.Model;

internal static class ValidationNetworks
{
    /// <summary>Grid infeed at Harrowby 132 kV, a 132/33 kV bank, a 33 kV feeder to Quarrend, a 33/11 kV bank to the mill.</summary>
    public static Network Clean() => new()
    {
        Name = "Harrowby primary",
        Buses =
        [
            new Bus { Id = "GRID", Kv = 132 },
            new Bus { Id = "MAIN", Kv = 33 },
            new Bus { Id = "QUARREND", Kv = 33 },
            new Bus { Id = "MILL", Kv = 11 },
        ],
        Supplies = [new Supply { Id = "SUPPLY", Bus = "GRID", ScMvaMax = 3000, ScMvaMin = 2000, Xr = 12, Z0Z1 = 1.0 }],
        Generators =
        [
            new Generator { Id = "G1", Bus = "MILL", Mode = GeneratorMode.Pv, PMw = 4, VSet = 1.01, QMinMvar = -3, QMaxMvar = 5, Mva = 10, Kv = 11, XdppPu = 0.18 },
        ],
        Loads = [new Load { Id = "L1", Bus = "MILL", PMw = 12, QMvar = 4, Zip = new ZipMix { Z = 0.2, I = 0.3, P = 0.5 } }],
        Shunts = [new Shunt { Id = "C1", Bus = "QUARREND", QMvar = 4 }],
        Lines =
        [
            new Line { Id = "F1", From = "MAIN", To = "QUARREND", Km = 5.2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38, B = 3.0 }, RatingMva = 30 },
        ],
        Transformers =
        [
            new Transformer
            {
                Id = "T1", Hv = "GRID", Lv = "MAIN", Mva = 60, HvKv = 132, LvKv = 33, ZPercent = 12.5, Xr = 25, VectorGroup = "YNd11",
                Tap = new TapChanger
                {
                    Winding = TapWinding.Hv, PercentPerStep = 1.25, Range = new(-8, 8),
                    Regulate = new TapRegulation { Bus = "MAIN", VTarget = 1.0, BandPu = 0.015 },
                },
            },
            new Transformer { Id = "T2", Hv = "QUARREND", Lv = "MILL", Mva = 20, HvKv = 33, LvKv = 11, ZPercent = 8, Xr = 15, VectorGroup = "Dyn11" },
        ],
        Breakers = [new Breaker { Id = "CB1", Bus = "MILL", InterruptingKa = 25, PeakKa = 63 }],
        Scenarios = [new Scenario { Name = "peak", LoadScale = 1.0 }, new Scenario { Name = "light", LoadScale = 0.35 }],
    };

    /// <summary>An archive-style case: every base kV 0 ("not stated"), branches in system per unit, one slack generator.</summary>
    public static Network PerUnitOnly() => new()
    {
        Name = "Per-unit case",
        Buses = [new Bus { Id = "1" }, new Bus { Id = "2" }, new Bus { Id = "3" }, new Bus { Id = "4" }],
        Generators =
        [
            new Generator { Id = "G1", Bus = "1", Mode = GeneratorMode.Slack, VSet = 1.06 },
            new Generator { Id = "G2", Bus = "2", Mode = GeneratorMode.Pv, PMw = 40, VSet = 1.045, QMinMvar = 0, QMaxMvar = 0 },
        ],
        Loads = [new Load { Id = "L3", Bus = "3", PMw = 94.2, QMvar = 19 }, new Load { Id = "L4", Bus = "4", PMw = 47.8, QMvar = -3.9 }],
        Lines =
        [
            new Line { Id = "1-2", From = "1", To = "2", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0.01938, X = 0.05917, B = 0.0528 } },
            new Line { Id = "2-3", From = "2", To = "3", Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0.04699, X = 0.19797, B = 0.0438 } },
        ],
        Transformers = [new Transformer { Id = "3-4", Hv = "3", Lv = "4", RPu = 0, XPu = 0.20912, Ratio = 0.978 }],
    };

    /// <summary>The list with entry <paramref name="index"/> changed: <c>net.Lines.Change(0, l => l with { ... })</c>.</summary>
    public static IReadOnlyList<T> Change<T>(this IReadOnlyList<T> list, int index, Func<T, T> change) =>
        list.Select((item, i) => i == index ? change(item) : item).ToList();

    public static Problem Single(ValidationReport report, ElementKind kind, string id, string field)
    {
        var matches = report.Problems.Where(p => p.Kind == kind && p.ElementId == id && p.Field == field).ToList();
        Assert.True(matches.Count == 1,
            $"expected one problem for {kind} {id} ({field}), found {matches.Count}:\n{report.Describe()}");
        return matches[0];
    }

    public static void AssertClean(ValidationReport report) =>
        Assert.True(report.Problems.Count == 0, "expected no problems:\n" + report.Describe());
}
