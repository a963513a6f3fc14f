// Small 33/11 kV networks built from valid parts, for properties of the load flow.
using CsCheck;
using Study.Core.Model;

namespace Study.Core.Tests.Properties;

/// <summary>
/// 2 to 12 buses at 33 and 11 kV: a 33 kV supply, a spanning tree of cables (same kV) and 33/11 kV
/// banks (different kV), a few extra cables for meshes, loads, capacitor banks and reactors, and a PV
/// generator. Every part has positive r and x and plausible nameplate data, so the network is valid;
/// one case in ten carries a load far beyond what the network can transfer, so both outcomes of the
/// load flow — converged and not — are exercised.
/// </summary>
internal static class SmallSolvableNetworks
{
    public static Gen<Network> Gen { get; } = Tape.Gen(20, 400).Select(values => Build(new Tape(values)));

    public static Network Build(Tape t)
    {
        int n = t.Int(2, 12);
        var buses = new List<Bus> { new() { Id = "B0", Kv = 33, VMin = 0.9, VMax = 1.1 } };
        for (int i = 1; i < n; i++)
            buses.Add(new Bus { Id = $"B{i}", Kv = t.Chance(55) ? 33 : 11, VMin = 0.9, VMax = 1.1 });

        var lines = new List<Line>();
        var transformers = new List<Transformer>();
        for (int i = 1; i < n; i++)
        {
            Bus to = buses[i];
            Bus from = buses[t.Int(0, i - 1)];
            if (from.Kv == to.Kv) lines.Add(Cable(t, $"F{lines.Count}", from, to));
            else transformers.Add(Bank(t, $"T{transformers.Count}", from.Kv > to.Kv ? from : to, from.Kv > to.Kv ? to : from));
        }
        int meshes = t.Int(0, Math.Min(3, n - 1));
        for (int k = 0; k < meshes; k++)
        {
            Bus a = t.Pick(buses), b = t.Pick(buses);
            if (a.Id != b.Id && a.Kv == b.Kv) lines.Add(Cable(t, $"F{lines.Count}", a, b));
        }

        var loads = new List<Load>();
        foreach (Bus bus in buses.Skip(1))
        {
            if (!t.Chance(70)) continue;
            double most = bus.Kv == 33 ? 8 : 3;
            loads.Add(new Load
            {
                Id = $"L{loads.Count}", Bus = bus.Id, PMw = t.Double(0, most), QMvar = t.Double(-0.2 * most, 0.5 * most),
                Zip = t.Chance(30) ? Zip(t) : null, InService = t.Chance(95),
            });
        }
        if (t.Chance(10))
            loads.Add(new Load { Id = "OVERLOAD", Bus = buses[^1].Id, PMw = t.Double(400, 5000), QMvar = t.Double(0, 2000) });

        var shunts = new List<Shunt>();
        int shuntCount = t.Int(0, 2);
        for (int k = 0; k < shuntCount; k++)
            shunts.Add(new Shunt
            {
                Id = $"C{k}", Bus = t.Pick(buses).Id, QMvar = t.Double(-2, 4), PMw = t.Double(0, 0.05), InService = t.Chance(90),
            });

        var generators = new List<Generator>();
        if (n > 2 && t.Chance(60))
        {
            bool limits = t.Chance(60);
            generators.Add(new Generator
            {
                Id = "G1", Bus = buses[t.Int(1, n - 1)].Id, Mode = GeneratorMode.Pv, PMw = t.Double(0, 6), VSet = t.Double(0.98, 1.03),
                QMinMvar = limits ? t.Double(-4, -0.5) : null, QMaxMvar = limits ? t.Double(0.5, 5) : null,
            });
        }

        return new Network
        {
            Name = $"generated {n}-bus",
            Buses = buses,
            Supplies = [new Supply { Id = "GRID", Bus = "B0", VSet = t.Double(0.98, 1.04), ScMvaMax = 1000, Xr = 10 }],
            Generators = generators,
            Loads = loads,
            Shunts = shunts,
            Lines = lines,
            Transformers = transformers,
        };
    }

    private static ZipMix Zip(Tape t)
    {
        double z = t.Double(0, 1, 2);
        double i = Math.Round(t.Double(0, 1 - z, 2), 2);
        return new ZipMix { Z = z, I = i, P = Math.Round(1 - z - i, 2) };
    }

    /// <summary>A cable with positive r and x per km, and some charging.</summary>
    private static Line Cable(Tape t, string id, Bus from, Bus to) => new()
    {
        Id = id, From = from.Id, To = to.Id, Km = t.Double(0.2, 10, 2),
        Z1 = new SequenceImpedance
        {
            Per = ImpedanceBasis.PerKm, R = t.Double(0.05, 0.5), X = t.Double(0.08, 0.45), B = t.Chance(50) ? t.Double(0, 60) : null,
        },
        RatingMva = t.Chance(50) ? t.Double(5, 40, 1) : null,
    };

    /// <summary>A 33/11 kV bank with nameplate data; sometimes a tap, sometimes on-load regulation of its lv bus.</summary>
    private static Transformer Bank(Tape t, string id, Bus hv, Bus lv)
    {
        TapChanger? tap = null;
        if (t.Chance(60))
        {
            int min = -t.Int(2, 8), max = t.Int(2, 8);
            tap = new TapChanger
            {
                Winding = t.Chance(80) ? TapWinding.Hv : TapWinding.Lv, PercentPerStep = t.Double(0.625, 2.5, 3), Range = new(min, max),
                Position = t.Int(min, max),
                Regulate = t.Chance(40) ? new TapRegulation { Bus = lv.Id, VTarget = t.Double(0.98, 1.02), BandPu = t.Double(0.02, 0.04) } : null,
            };
        }
        double mva = t.Double(5, 40, 1);
        double i0Percent = t.Double(0.3, 1, 2);
        // The iron loss is the in-phase part of the no-load current: p0 below i0 % of the rating.
        NoLoadLoss noLoad = new() { I0Percent = i0Percent, P0Kw = Math.Round(i0Percent / 100 * mva * 1000 * t.Double(0.05, 0.9), 1) };
        return new Transformer
        {
            Id = id, Hv = hv.Id, Lv = lv.Id, Mva = mva, HvKv = 33, LvKv = 11, ZPercent = t.Double(6, 12, 2),
            Xr = t.Double(5, 25, 1), Units = t.Chance(80) ? 1 : 2, VectorGroup = "Dyn11", Tap = tap,
            NoLoad = t.Chance(40) ? noLoad : null,
        };
    }
}
