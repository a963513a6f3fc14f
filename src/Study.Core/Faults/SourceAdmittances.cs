// Per-bus admittances to the reference in each sequence: supplies, generators, motors and (load-flow method) loads.
using System.Numerics;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// Supplies by Z_Q = c·U_n²/S''kQ with their X/R and Z0/Z1 (<see cref="SupplyImpedance"/>), Z2 = Z1;
/// generators by x''d, x2, x0 on the system base, corrected by K_G (IEC method) or, in a power-station
/// unit, by its own factor; x0 only with an earthed neutral (3Z_N in series); motors by Z_M in the
/// positive and negative sequence, open in the zero sequence, in maximum levels only (IEC 60909-0:2016,
/// from memory); loads, for the load-flow method, as constant impedances Y = S*(V)/|V|² at their solved
/// voltage (a motor's running load excepted: the motor is its own impedance). All in pu on the system base.
/// </summary>
internal sealed class SourceAdmittances
{
    private readonly List<(int Bus, Complex Z)> series = [];
    private readonly List<(int Bus, Complex Y)> loads = [];

    public required Complex[] Positive { get; init; }
    public required Complex[] Negative { get; init; }
    public required Complex[] Zero { get; init; }
    /// <summary>The positive sequence at f_c/f = 0.4, for κ.</summary>
    public required Complex[] EquivalentFrequency { get; init; }
    /// <summary>Positive and negative sequence with the motors left out (steady-state I_k); null when no motor is in.</summary>
    public Complex[]? PositiveWithoutMotors { get; private set; }
    public Complex[]? NegativeWithoutMotors { get; private set; }
    /// <summary>Every generator with x''d and every motor in the study, with its impedance in the network.</summary>
    public required IReadOnlyList<FaultMachine> Machines { get; init; }

    /// <param name="generatorFactors">Power-station units: the factor that replaces K_G, by source index.</param>
    public static SourceAdmittances Build(PerUnitModel model, FaultMethod method, FaultLevel level, double[]? voltagePu,
        double fcOverF, List<string> notes, IReadOnlyDictionary<int, double>? generatorFactors = null)
    {
        int n = model.Buses.Count;
        var pos = new Complex[n];
        var neg = new Complex[n];
        var zero = new Complex[n];
        var machines = new List<FaultMachine>();
        var series = new List<(int Bus, Complex Z)>();
        bool iec = method == FaultMethod.Iec60909;
        for (int s = 0; s < model.Sources.Count; s++)
        {
            PuSource source = model.Sources[s];
            PuBus bus = model.Buses[source.Bus];
            double kv = bus.BaseKv;
            if (source.Kind == ElementKind.Supply)
            {
                // The load-flow method drives the fault from the solved voltages: no c in Z_Q either.
                double c = !iec ? 1.0 : level == FaultLevel.Max ? SupplyImpedance.CMax(kv) : SupplyImpedance.CMin(kv);
                var z = SupplyImpedance.Convert(source.Id, source.FaultData!, kv, model.BaseMva, c, level);
                pos[source.Bus] += 1.0 / z.Z1Pu;
                neg[source.Bus] += 1.0 / z.Z1Pu;
                zero[source.Bus] += 1.0 / z.Z0Pu;
                series.Add((source.Bus, z.Z1Pu));
                continue;
            }
            if (source.Z1 is not Complex z1)
            {
                notes.Add($"{source.Id}: no x''d (xdppPu with mva): left out of the fault study");
                continue;
            }
            double kG = 1.0;
            if (iec && generatorFactors is not null && generatorFactors.TryGetValue(s, out double unit))
                kG = unit;
            else if (iec)
            {
                kG = ImpedanceCorrection.Generator(source.Rating!, kv, out bool assumed);
                if (assumed) notes.Add($"{source.Id}: rated power factor not given: {ImpedanceCorrection.DefaultPowerFactor} assumed for K_G");
            }
            pos[source.Bus] += 1.0 / (kG * z1);
            neg[source.Bus] += 1.0 / (kG * (source.Z2 ?? z1));
            series.Add((source.Bus, kG * z1));
            machines.Add(new FaultMachine(source.Id, false, source.Bus, kG * z1, RatedCurrent(source.Rating!, kv, model.BaseMva), 0));
            if (source.Z0 is not Complex z0)
                notes.Add($"{source.Id}: no x0: contributes nothing to the zero sequence");
            else if (source.Neutral is not { Stated: true, Earthed: true } neutral)
                notes.Add($"{source.Id}: neutral not earthed{(source.Neutral is { Stated: false } ? " (no neutral data)" : "")}: contributes nothing to the zero sequence");
            else
            {
                zero[source.Bus] += 1.0 / (kG * z0 + 3 * neutral.ZPu);
            }
        }

        Complex[]? posWithout = null, negWithout = null;
        if (model.Motors.Count > 0 && level == FaultLevel.Min)
            notes.Add("minimum levels: motors left out (IEC 60909-0)");
        else if (model.Motors.Count > 0)
        {
            posWithout = (Complex[])pos.Clone();
            negWithout = (Complex[])neg.Clone();
            foreach (PuMotor m in model.Motors)
            {
                pos[m.Bus] += 1.0 / m.ZPu;
                neg[m.Bus] += 1.0 / m.ZPu;
                series.Add((m.Bus, m.ZPu));
                machines.Add(new FaultMachine(m.Id, true, m.Bus, m.ZPu, m.RatedCurrentPu, m.MwPerPolePair));
            }
        }

        bool anySource = false;
        foreach (Complex y in pos) anySource |= y != Complex.Zero;
        if (!anySource)
            notes.Add("no source has fault data (a supply needs scMvaMax, a generator xdppPu and mva): every fault current is zero");

        var loads = new List<(int Bus, Complex Y)>();
        if (voltagePu is not null)
            foreach (PuLoad load in model.Loads)
            {
                double v = voltagePu[load.Bus];
                if (!(v > 1e-6) || load.Motor) continue;
                // S(V) = S0·(z·V² + i·V + p), so Y = S*(V)/V² = S0*·(z + i/V + p/V²).
                ZipMix zip = load.Zip;
                Complex y = Complex.Conjugate(new Complex(load.P, load.Q)) * (zip.Z + zip.I / v + zip.P / (v * v));
                pos[load.Bus] += y;
                neg[load.Bus] += y;
                if (posWithout is not null)
                {
                    posWithout[load.Bus] += y;
                    negWithout![load.Bus] += y;
                }
                loads.Add((load.Bus, y));
            }
        var result = new SourceAdmittances
        {
            Positive = pos, Negative = neg, Zero = zero, Machines = machines,
            EquivalentFrequency = AtFrequency(n, series, loads, fcOverF),
            PositiveWithoutMotors = posWithout, NegativeWithoutMotors = negWithout,
        };
        result.series.AddRange(series);
        result.loads.AddRange(loads);
        return result;
    }

    /// <summary>The positive-sequence admittances with every reactance at f_c/f = <paramref name="fcOverF"/> (method C).</summary>
    public Complex[] EquivalentFrequencyAt(double fcOverF) => AtFrequency(Positive.Length, series, loads, fcOverF);

    private static Complex[] AtFrequency(int n, List<(int Bus, Complex Z)> series, List<(int Bus, Complex Y)> loads, double fcOverF)
    {
        var eqf = new Complex[n];
        foreach (var (bus, z) in series) eqf[bus] += 1.0 / Faults.EquivalentFrequency.Series(z, fcOverF);
        foreach (var (bus, y) in loads) eqf[bus] += Faults.EquivalentFrequency.Parallel(y, fcOverF);
        return eqf;
    }

    /// <summary>I_rG = S_rG/(√3·U_rG) in pu of the bus base current: (S_rG/S_base)·(U_bus/U_rG).</summary>
    private static double RatedCurrent(GeneratorRating g, double busKv, double baseMva)
    {
        double mva = g.Mva ?? 0;
        double voltage = g.Kv is double kv && kv > 0 && busKv > 0 ? busKv / kv : 1.0;
        return mva / baseMva * voltage;
    }
}
