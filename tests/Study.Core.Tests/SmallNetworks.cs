// Small networks built in code for checks against hand calculation and facts of the trade.
using Study.Core.Model;

namespace Study.Core.Tests;

internal static class SmallNetworks
{
    /// <summary>A 132 kV supply feeding a 132/33 kV unit, with an optional load at 33 kV.</summary>
    public static Network Transformer132To33(double loadMw = 0, double loadMvar = 0, double zPercent = 10, double xr = 20,
        TapChanger? tap = null, double hvKv = 132, double lvKv = 33) => new()
    {
        Name = "132/33 kV unit",
        Buses = [new Bus { Id = "HV", Kv = 132 }, new Bus { Id = "LV", Kv = 33, VMin = 0.5, VMax = 1.5 }],
        Supplies = [new Supply { Id = "GRID", Bus = "HV", ScMvaMax = 5000, Xr = 15 }],
        Transformers =
        [
            new Transformer
            {
                Id = "T1", Hv = "HV", Lv = "LV", Mva = 60, HvKv = hvKv, LvKv = lvKv, ZPercent = zPercent, Xr = xr,
                VectorGroup = "YNd11", Tap = tap,
            },
        ],
        Loads = loadMw == 0 && loadMvar == 0 ? [] : [new Load { Id = "L1", Bus = "LV", PMw = loadMw, QMvar = loadMvar }],
    };

    /// <summary>One line in ohms between a supply bus and a load bus at the given kV.</summary>
    public static Network OneLine(double kv, double loadMw, double loadMvar, double rOhm = 2.0, double xOhm = 4.0) => new()
    {
        Name = $"one line at {kv} kV",
        Buses = [new Bus { Id = "S", Kv = kv }, new Bus { Id = "R", Kv = kv, VMin = 0.5, VMax = 1.5 }],
        Supplies = [new Supply { Id = "GRID", Bus = "S" }],
        Lines = [new Line { Id = "F1", From = "S", To = "R", Z1 = new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = rOhm, X = xOhm } }],
        Loads = [new Load { Id = "L1", Bus = "R", PMw = loadMw, QMvar = loadMvar }],
    };
}
