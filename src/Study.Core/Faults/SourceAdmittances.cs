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
        int n = model.Buses.Count;
        var pos = new Complex[n];
        var neg = new Complex[n];
        var zero = new Complex[n];
        var eqf = new Complex[n];
        bool iec = method == FaultMethod.Iec60909;
        foreach (PuSource source in model.Sources)
        {
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
                eqf[source.Bus] += 1.0 / Faults.EquivalentFrequency.Series(z.Z1Pu, fcOverF);
                continue;
            }
            if (source.Z1 is not Complex z1)
            {
                notes.Add($"{source.Id}: no x''d (xdppPu with mva): left out of the fault study");
                continue;
            }
            double kG = 1.0;
            if (iec)
            {
                kG = ImpedanceCorrection.Generator(source.Rating!, kv, out bool assumed);
                if (assumed) notes.Add($"{source.Id}: rated power factor not given: {ImpedanceCorrection.DefaultPowerFactor} assumed for K_G");
            }
            pos[source.Bus] += 1.0 / (kG * z1);
            neg[source.Bus] += 1.0 / (kG * (source.Z2 ?? z1));
            eqf[source.Bus] += 1.0 / Faults.EquivalentFrequency.Series(kG * z1, fcOverF);
            if (source.Z0 is not Complex z0)
                notes.Add($"{source.Id}: no x0: contributes nothing to the zero sequence");
            else if (source.Neutral is not { Stated: true, Earthed: true } neutral)
                notes.Add($"{source.Id}: neutral not earthed{(source.Neutral is { Stated: false } ? " (no neutral data)" : "")}: contributes nothing to the zero sequence");
            else
            {
                zero[source.Bus] += 1.0 / (kG * z0 + 3 * neutral.ZPu);
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
