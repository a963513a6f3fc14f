// Per-bus admittances to the reference in each sequence: supplies, generators, and (load-flow method) loads.
using System.Numerics;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// Supplies by Z_Q = c·U_n²/S''kQ with their X/R and Z0/Z1 (<see cref="SupplyImpedance"/>), Z2 = Z1;
/// generators by x''d, x2, x0 on the system base, corrected by K_G (IEC method), x0 only with an
/// earthed neutral (3Z_N in series); loads, for the load-flow method, as constant impedances
/// Y = S*(V)/|V|² at their solved voltage. All in pu on the system base.
/// </summary>
internal sealed class SourceAdmittances
{
    public required Complex[] Positive { get; init; }
    public required Complex[] Negative { get; init; }
    public required Complex[] Zero { get; init; }
    public required Complex[] EquivalentFrequency { get; init; }

    public static SourceAdmittances Build(PerUnitModel model, FaultMethod method, FaultLevel level, double[]? voltagePu,
        double fcOverF, List<string> notes)
    {
        Network network = model.Network;
        int n = model.Buses.Count;
        var pos = new Complex[n];
        var neg = new Complex[n];
        var zero = new Complex[n];
        var eqf = new Complex[n];
        bool iec = method == FaultMethod.Iec60909;
        var supplies = network.Supplies.ToDictionary(s => s.Id);
        var generators = network.Generators.ToDictionary(g => g.Id);
        foreach (PuSource source in model.Sources)
        {
            PuBus bus = model.Buses[source.Bus];
            double kv = bus.BaseKv;
            if (source.Kind == ElementKind.Supply)
            {
                Supply s = supplies[source.Id];
                // The load-flow method drives the fault from the solved voltages: no c in Z_Q either.
                double c = !iec ? 1.0 : level == FaultLevel.Max ? SupplyImpedance.CMax(kv) : SupplyImpedance.CMin(kv);
                var z = SupplyImpedance.Convert(s, network.FindBus(s.Bus)!, model.BaseMva, c, level);
                pos[source.Bus] += 1.0 / z.Z1Pu;
                neg[source.Bus] += 1.0 / z.Z1Pu;
                zero[source.Bus] += 1.0 / z.Z0Pu;
                eqf[source.Bus] += 1.0 / Faults.EquivalentFrequency.Series(z.Z1Pu, fcOverF);
                continue;
            }
            Generator g = generators[source.Id];
            if (source.Z1 is not Complex z1)
            {
                notes.Add($"{g.Id}: no x''d (xdppPu with mva): left out of the fault study");
                continue;
            }
            double kG = 1.0;
            if (iec)
            {
                kG = ImpedanceCorrection.Generator(g, kv, out bool assumed);
                if (assumed) notes.Add($"{g.Id}: rated power factor not given: {ImpedanceCorrection.DefaultPowerFactor} assumed for K_G");
            }
            pos[source.Bus] += 1.0 / (kG * z1);
            neg[source.Bus] += 1.0 / (kG * (source.Z2 ?? z1));
            eqf[source.Bus] += 1.0 / Faults.EquivalentFrequency.Series(kG * z1, fcOverF);
            if (source.Z0 is not Complex z0)
                notes.Add($"{g.Id}: no x0: contributes nothing to the zero sequence");
            else if (g.Neutral is not { Grounded: true } earthing)
                notes.Add($"{g.Id}: neutral not earthed{(g.Neutral is null ? " (no neutral data)" : "")}: contributes nothing to the zero sequence");
            else
            {
                var znOhm = new Complex(earthing.ROhm, earthing.XOhm);
                if (znOhm != Complex.Zero && !(kv > 0))
                    throw new InputException("the neutral impedance is in ohm but the bus kV is not stated", elementId: g.Id);
                Complex zn = znOhm == Complex.Zero ? Complex.Zero : znOhm / (kv * kv / model.BaseMva);
                zero[source.Bus] += 1.0 / (kG * z0 + 3 * zn);
            }
        }

        bool anySource = false;
        foreach (Complex y in pos) anySource |= y != Complex.Zero;
        if (!anySource)
            notes.Add("no source has fault data (a supply needs scMvaMax, a generator xdppPu and mva): every fault current is zero");

        if (voltagePu is not null)
            foreach (PuLoad load in model.Loads)
            {
                double v = voltagePu[load.Bus];
                if (!(v > 1e-6)) continue;
                // S(V) = S0·(z·V² + i·V + p), so Y = S*(V)/V² = S0*·(z + i/V + p/V²).
                ZipMix zip = load.Zip;
                Complex y = Complex.Conjugate(new Complex(load.P, load.Q)) * (zip.Z + zip.I / v + zip.P / (v * v));
                pos[load.Bus] += y;
                neg[load.Bus] += y;
                eqf[load.Bus] += Faults.EquivalentFrequency.Parallel(y, fcOverF);
            }
        return new SourceAdmittances { Positive = pos, Negative = neg, Zero = zero, EquivalentFrequency = eqf };
    }
}
