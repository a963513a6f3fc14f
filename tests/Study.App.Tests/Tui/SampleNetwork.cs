// A small network for the TUI tests: a supply, a 33/11 kV bank, a feeder and a load.
using Study.Core.Model;

namespace Study.App.Tests.Tui;

public static class SampleNetwork
{
    public static Network Build() => new()
    {
        Name = "sample",
        Buses = [new Bus { Id = "B33", Kv = 33 }, new Bus { Id = "B11", Kv = 11 }, new Bus { Id = "B11F", Kv = 11 }],
        Supplies = [new Supply { Id = "GRID", Bus = "B33", ScMvaMax = 500, Xr = 10 }],
        Transformers = [new Transformer { Id = "T1", Hv = "B33", Lv = "B11", Mva = 10, HvKv = 33, LvKv = 11, ZPercent = 8, Xr = 10 }],
        Lines = [new Line { Id = "F1", From = "B11", To = "B11F", Km = 2, Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.2, X = 0.3 } }],
        Loads = [new Load { Id = "L1", Bus = "B11F", PMw = 4, QMvar = 1.5 }],
        Breakers = [new Breaker { Id = "CB1", Bus = "B11", InterruptingKa = 25, PeakKa = 63 }],
    };
}
