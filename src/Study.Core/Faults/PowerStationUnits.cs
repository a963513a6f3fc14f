// Generators with their own unit transformer: the correction factors IEC 60909-0 gives the unit as a whole.
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// A power-station unit: a generator whose bus has exactly one branch, a two-winding transformer with a
/// nameplate, and no other source. <see cref="Unit"/> is K_S (the transformer has an on-load tap changer)
/// or K_SO (it has not), applied to both the generator and the transformer in place of K_G and K_T;
/// <see cref="GeneratorAtTerminals"/> and <see cref="TransformerAtTerminals"/> are K_G,S and K_T,S for a
/// fault at the generator terminals, between the two.
/// </summary>
public sealed record PowerStationUnit(string Generator, string Transformer, int Source, int Branch, int GeneratorBus, bool OnLoad,
    double Unit, double GeneratorAtTerminals, double TransformerAtTerminals);

/// <summary>
/// IEC 60909-0:2016 §6.7 (from memory), with the generator side's rated transformer voltage U_rTLV, the
/// network side's U_rTHV, U_nQ the nominal voltage of the network bus and c_max of that network:
/// K_S = (U_nQ²/U_rG²)·(U_rTLV²/U_rTHV²)·c_max/(1 + |x''d − x_T|·sin φ_rG) with an on-load tap changer;
/// K_SO = (U_nQ/(U_rG·(1 + p_G)))·(U_rTLV/U_rTHV)·(1 ± p_T)·c_max/(1 + x''d·sin φ_rG) without, taken with
/// p_G = p_T = 0; at the generator terminals K_G,S = c_max/(1 + x''d·sin φ_rG) and
/// K_T,S = c_max/(1 − x_T·sin φ_rG), c_max of the generator's voltage.
/// </summary>
public static class PowerStationUnits
{
    public static IReadOnlyList<PowerStationUnit> Find(PerUnitModel model, List<string> notes)
    {
        int n = model.Buses.Count;
        var branchCount = new int[n];
        var lastBranch = new int[n];
        for (int k = 0; k < model.Branches.Count; k++)
        {
            PuBranch b = model.Branches[k];
            branchCount[b.From]++;
            branchCount[b.To]++;
            lastBranch[b.From] = lastBranch[b.To] = k;
        }
        var sourcesAt = new int[n];
        foreach (PuSource s in model.Sources)
            if (s.Kind == ElementKind.Supply || s.Z1 is not null) sourcesAt[s.Bus]++;

        var units = new List<PowerStationUnit>();
        for (int i = 0; i < model.Sources.Count; i++)
        {
            PuSource g = model.Sources[i];
            if (g.Kind != ElementKind.Generator || g.Z1 is null || g.Rating is not { } rating) continue;
            if (branchCount[g.Bus] != 1 || sourcesAt[g.Bus] != 1) continue;
            int k = lastBranch[g.Bus];
            PuBranch t = model.Branches[k];
            if (t.Kind != BranchKind.Transformer || t.Rating is not { } tr) continue;
            bool generatorOnLv = t.To == g.Bus;
            double genSideKv = generatorOnLv ? tr.LvKv : tr.HvKv, netSideKv = generatorOnLv ? tr.HvKv : tr.LvKv;
            double unKv = model.Buses[generatorOnLv ? t.From : t.To].BaseKv;
            double genBusKv = model.Buses[g.Bus].BaseKv;
            double urG = rating.Kv is double kv && kv > 0 ? kv : genBusKv;
            bool pfAssumed = rating.PowerFactor is not (> 0 and <= 1);
            double pf = pfAssumed ? ImpedanceCorrection.DefaultPowerFactor : rating.PowerFactor!.Value;
            double sinPhi = Math.Sqrt(1 - pf * pf);
            double xd = rating.XdppPu ?? 0, xT = tr.XPu;
            bool onLoad = t.Tap is int tap && model.Taps[tap].OnLoad;
            double voltage = unKv > 0 && urG > 0 ? unKv / urG * (genSideKv / netSideKv) : 1.0;
            double cNet = SupplyImpedance.CMax(unKv), cGen = SupplyImpedance.CMax(genBusKv);
            double unit = onLoad
                ? voltage * voltage * cNet / (1 + Math.Abs(xd - xT) * sinPhi)
                : voltage * cNet / (1 + xd * sinPhi);
            var u = new PowerStationUnit(g.Id, t.Id, i, k, g.Bus, onLoad, unit,
                cGen / (1 + xd * sinPhi), cGen / (1 - xT * sinPhi));
            units.Add(u);
            notes.Add($"{g.Id} with {t.Id}: power-station unit {(onLoad ? "with" : "without")} on-load tap changer, "
                + $"{(onLoad ? "K_S" : "K_SO")} = {F(u.Unit)} for both in place of K_G and K_T; at its terminals "
                + $"K_G,S = {F(u.GeneratorAtTerminals)}, K_T,S = {F(u.TransformerAtTerminals)}"
                + (pfAssumed ? $" (rated power factor not given: {F(ImpedanceCorrection.DefaultPowerFactor)} assumed)" : ""));
        }
        return units;
    }

    private static string F(double v) => v.ToString("0.####", System.Globalization.CultureInfo.InvariantCulture);
}
