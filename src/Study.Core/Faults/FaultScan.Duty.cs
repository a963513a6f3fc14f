// The figures a breaker is rated against, per fault: I_b, i_DC, I_b,asym, I_k and I_th, and each breaker's own currents.
using System.Numerics;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// The duty part of the scan (DEVELOPERS.md, Algorithms). For a three-phase fault each machine's own current
/// is I''k_i = y_i·Z1(i, k)·I''k (superposition, y_i its admittance in the network), so the breaking current
/// I_b = I''k − Σ ΔU''_i/(c·U_n/√3)·(1 − μ_i·q_i)·I''k_i (IEC 60909-0:2016 §9.1.3 for meshed networks, from
/// memory) with ΔU''_i = |X_i·I''k_i| and c the source voltage; unbalanced faults take I_b = I''k. The DC
/// component uses R/X from the positive sequence at the equivalent frequency that f·t_min calls for; the
/// steady-state current leaves the motors out; I_th uses the bus's κ. A breaker that switches a branch
/// carries, for a fault on its bus side, that branch's contribution, and for one on its branch side, the
/// bus total minus it (phasor difference, largest phase); when the branch splits the network in two, the
/// machines beyond it decay on the first side and the others on the second.
/// </summary>
internal sealed partial class FaultScan
{
    private static readonly IReadOnlyList<BreakerCurrents> NoBreakers = [];
    private FaultMachine[] machines = [];
    private int[] machineRows = [];
    private Complex[] zm = [];                          // Z1 entries at the machine buses for the bus being faulted
    private PuBreaker[][] breakersAt = [];
    private bool[]?[] farSide = [];                      // per model breaker: machines beyond its branch; null when it splits nothing
    private readonly Dictionary<double, (SequenceNetwork Network, double[] ROverX)> dcByRatio = [];
    private double rowRatio;
    private Complex[] zd = [];                          // one diagonal entry at a time
    private Complex? zs1, zs2;                           // Thevenin impedances without motors at the bus being faulted (null: open)
    private int breakerCount;

    private void InitialiseDuty()
    {
        int n = model.Buses.Count;
        machines = networks.Machines.ToArray();
        machineRows = machines.Select(m => m.Bus).Distinct().ToArray();
        zm = new Complex[n];
        zd = new Complex[n];
        var lists = new List<PuBreaker>[n];
        foreach (PuBreaker b in model.Breakers) (lists[b.Bus] ??= []).Add(b);
        breakersAt = lists.Select(l => l?.ToArray() ?? []).ToArray();
        breakerCount = model.Breakers.Count;
        farSide = new bool[]?[model.Breakers.Count];
        for (int k = 0; k < model.Breakers.Count; k++) farSide[k] = FarSide(model.Breakers[k]);
        double f = model.FrequencyHz;
        rowRatio = DcComponent.FrequencyRatio(f, request.TMinS);
        foreach (double ratio in model.Breakers.Select(b => DcComponent.FrequencyRatio(f, b.MinTripS ?? request.TMinS)).Append(rowRatio).Distinct())
            dcByRatio[ratio] = (networks.AtEquivalentFrequency(ratio), new double[1]);
    }

    private IEnumerable<int> BreakerBranchEnds(int bus)
    {
        foreach (PuBreaker b in breakersAt[bus])
        {
            if (b.Branch is not int k) continue;
            yield return model.Branches[k].From;
            yield return model.Branches[k].To;
        }
    }

    private bool DecayWanted => request.Breaking == BreakingCurrent.Decay && machines.Length > 0;

    /// <summary>The Z entries only the duty figures read: Z1 at the machines' buses, the diagonal at each f_c, the diagonal without motors.</summary>
    private void PrepareDuty(int bus)
    {
        if (DecayWanted && request.Kinds.Contains(FaultKind.ThreePhase)) networks.Positive.Entries(bus, machineRows, zm);
        ReadOnlySpan<int> diagonal = [bus];
        foreach (var (ratio, (network, rOverX)) in dcByRatio)
        {
            Complex zc = Complex.Zero;
            if (network.IsFed(bus))
            {
                network.Entries(bus, diagonal, zd);
                zc = zd[bus];
            }
            rOverX[0] = zc.Imaginary > 0 ? zc.Real / zc.Imaginary * ratio : 0;
        }
        if (!networks.HasMotors) return;
        SequenceNetwork p = networks.PositiveWithoutMotors, q = networks.NegativeWithoutMotors;
        zs1 = zs2 = null;
        if (p.IsFed(bus))
        {
            p.Entries(bus, diagonal, zd);
            zs1 = zd[bus];
        }
        if (unbalanced && q.IsFed(bus))
        {
            q.Entries(bus, diagonal, zd);
            zs2 = zd[bus];
        }
    }

    private ShortCircuitLevel WithDuty(int bus, Complex e, Complex zf, SequenceValues current, Complex? zk0, ShortCircuitLevel level)
    {
        double f = model.FrequencyHz, c = e.Magnitude, ik = level.IkPu;
        MachineContribution[] own = level.Kind == FaultKind.ThreePhase && DecayWanted ? Contributions(current.Positive, c) : [];
        double ib = AfterDecay(ik, own, request.TMinS, _ => true);
        double rOverX = dcByRatio[rowRatio].ROverX[0];
        double idc = DcComponent.Current(ik, f, request.TMinS, rOverX);
        double steady = ik;
        if (networks.HasMotors)
            steady = SymmetricalComponents.FaultCurrents(level.Kind, e, zs1, zs2, zk0, zf).LargestPhaseMagnitude;
        double m = ThermalEquivalent.M(level.Kappa, f, request.DurationS);
        double ith = ik * Math.Sqrt(m + ThermalEquivalent.FarFromGenerators);
        double? baseKa = level.Kv > 0 ? model.BaseMva / (Math.Sqrt(3) * level.Kv) : null;
        return level with
        {
            IbPu = ib, IbKa = ib * baseKa, IdcPu = idc, IdcKa = idc * baseKa, DcROverX = rOverX,
            IbAsymPu = Math.Sqrt(ib * ib + idc * idc), IbAsymKa = Math.Sqrt(ib * ib + idc * idc) * baseKa,
            IkSteadyPu = steady, IkSteadyKa = steady * baseKa, IthPu = ith, IthKa = ith * baseKa, ThermalM = m,
            Machines = own,
            BreakerCurrents = breakersAt[bus].Length == 0 ? NoBreakers : Breakers(bus, current, level, own),
        };
    }

    /// <summary>Each machine's own current for a three-phase fault whose positive-sequence current is <paramref name="i1"/>.</summary>
    private MachineContribution[] Contributions(Complex i1, double c)
    {
        var own = new MachineContribution[machines.Length];
        for (int j = 0; j < machines.Length; j++)
        {
            FaultMachine m = machines[j];
            double current = (zm[m.Bus] * i1 / m.ZPu).Magnitude;
            double drop = c > 0 ? Math.Abs(m.ZPu.Imaginary) * current / c : 0;
            double ratio = m.RatedCurrentPu > 0 ? current / m.RatedCurrentPu : double.PositiveInfinity;
            own[j] = new MachineContribution(m.Id, m.Asynchronous, current, drop, ratio, m.MwPerPolePair);
        }
        return own;
    }

    /// <summary>I_b = I''k − the decay of the machines <paramref name="counted"/> picks, within 0..I''k.</summary>
    private static double AfterDecay(double ik, MachineContribution[] own, double tMinS, Func<int, bool> counted)
    {
        double decay = 0;
        for (int j = 0; j < own.Length; j++)
            if (counted(j)) decay += own[j].DecayPu(tMinS);
        return Math.Clamp(ik - decay, 0, ik);
    }

    private BreakerCurrents[] Breakers(int bus, SequenceValues fault, ShortCircuitLevel level, MachineContribution[] own)
    {
        PuBreaker[] here = breakersAt[bus];
        var result = new BreakerCurrents[here.Length];
        double f = model.FrequencyHz;
        for (int j = 0; j < here.Length; j++)
        {
            PuBreaker b = here[j];
            double t = b.MinTripS ?? request.TMinS;
            double rOverX = dcByRatio[DcComponent.FrequencyRatio(f, t)].ROverX[0];
            SideCurrents Side(DutySide side, double ik, Func<int, bool> counted)
            {
                double ib = AfterDecay(ik, own, t, counted);
                double idc = DcComponent.Current(ik, f, t, rOverX);
                return new SideCurrents(side, ik, ib, idc, Math.Sqrt(ib * ib + idc * idc), level.Kappa * Math.Sqrt(2) * ik,
                    ThermalEquivalent.Current(ik, level.Kappa, f, request.DurationS));
            }
            if (b.Branch is not int k)
            {
                result[j] = new BreakerCurrents(b.Id, t, rOverX, [Side(DutySide.Bus, level.IkPu, _ => true)]);
                continue;
            }
            SequenceValues through = BranchFlow(k, bus, fault);
            var rest = new SequenceValues(fault.Zero - through.Zero, fault.Positive - through.Positive, fault.Negative - through.Negative);
            bool[]? beyond = farSide[IndexOf(b)];
            // Without a split, a machine's current runs on both sides: no decay is credited to either (conservative).
            Func<int, bool> onBranch = beyond is null ? _ => false : m => beyond[m];
            Func<int, bool> onBus = beyond is null ? _ => false : m => !beyond[m];
            result[j] = new BreakerCurrents(b.Id, t, rOverX,
                [Side(DutySide.BusSideFault, through.LargestPhaseMagnitude, onBranch), Side(DutySide.BranchSideFault, rest.LargestPhaseMagnitude, onBus)],
                DecayCredited: beyond is not null || own.Length == 0);
        }
        return result;
    }

    /// <summary>The sequence currents from branch <paramref name="k"/> into the faulted bus.</summary>
    private SequenceValues BranchFlow(int k, int bus, SequenceValues fault)
    {
        PuBranch branch = model.Branches[k];
        bool atFrom = branch.From == bus;
        Complex i1 = IntoBus(networks.Positive.TwoPort(k), z1, branch, atFrom, fault.Positive);
        Complex i2 = IntoBus(networks.Negative.TwoPort(k), z2, branch, atFrom, fault.Negative);
        Complex i0 = networks.Zero is { } zero ? IntoBus(zero.TwoPort(k), z0, branch, atFrom, fault.Zero) : Complex.Zero;
        return new SequenceValues(i0, i1, i2);
    }

    private int IndexOf(PuBreaker b)
    {
        for (int k = 0; k < breakerCount; k++) if (ReferenceEquals(model.Breakers[k], b)) return k;
        return -1;
    }

    /// <summary>
    /// The machines beyond a breaker's branch: those reached from the branch's far end without crossing it,
    /// when that search does not come back to the breaker's bus; null when the branch splits nothing.
    /// </summary>
    private bool[]? FarSide(PuBreaker b)
    {
        if (b.Branch is not int k) return null;
        PuBranch branch = model.Branches[k];
        int start = branch.From == b.Bus ? branch.To : branch.From;
        var seen = new bool[model.Buses.Count];
        var stack = new Stack<int>();
        stack.Push(start);
        seen[start] = true;
        while (stack.Count > 0)
        {
            int i = stack.Pop();
            if (i == b.Bus) return null;
            foreach (int a in adjacent[i])
            {
                if (a == k) continue;
                PuBranch next = model.Branches[a];
                int other = next.From == i ? next.To : next.From;
                if (seen[other]) continue;
                seen[other] = true;
                stack.Push(other);
            }
        }
        return machines.Select(m => seen[m.Bus]).ToArray();
    }
}
