// Faults at one bus after another on factorised sequence networks: one Z-bus column per network per bus.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// For a faulted bus k: the entries of columns k of Z1, Z2, Z0 and Z_c that the results read (the
/// diagonal, and the neighbours when voltages or contributions are asked for), each from two sparse
/// triangular solves rather than a full column; the Thevenin impedances are the diagonal entries; the sequence currents follow from <see cref="SymmetricalComponents"/>;
/// by superposition the fault changes bus voltages by ΔV_s = −Z_s[:, k]·I_s, and branch currents by the
/// branch two-ports applied to ΔV. Column buffers are allocated once for the whole scan.
/// </summary>
internal sealed partial class FaultScan
{
    private static readonly double Sqrt2 = Math.Sqrt(2), Sqrt3 = Math.Sqrt(3);
    private readonly PerUnitModel model;
    private readonly SequenceNetworks networks;
    private readonly FaultRequest request;
    private readonly Complex[]? preFault;
    private readonly Complex[] z1, z2, z0, zc;
    private readonly int[][] adjacent;
    private readonly (int Bus, int Lag)[][] neighbours;
    private readonly int[][] rowsRead;     // per bus: the Z entries its results read, the bus first
    private readonly bool unbalanced;     // a kind other than 3ph: negative and zero sequence carry current

    /// <param name="preFault">Solved pre-fault voltages (load-flow method); null: the equivalent source c at every bus.</param>
    public FaultScan(PerUnitModel model, SequenceNetworks networks, FaultRequest request, Complex[]? preFault)
    {
        this.model = model;
        this.networks = networks;
        this.request = request;
        this.preFault = preFault;
        int n = model.Buses.Count;
        z1 = new Complex[n];
        z2 = new Complex[n];
        z0 = new Complex[n];
        zc = new Complex[n];
        var lists = new List<int>[n];
        for (int i = 0; i < n; i++) lists[i] = [];
        for (int b = 0; b < model.Branches.Count; b++)
        {
            lists[model.Branches[b].From].Add(b);
            lists[model.Branches[b].To].Add(b);
        }
        adjacent = lists.Select(l => l.ToArray()).ToArray();
        neighbours = new (int, int)[n][];
        for (int i = 0; i < n; i++) neighbours[i] = NeighboursOf(i);
        unbalanced = request.Kinds.Any(k => k != FaultKind.ThreePhase);
        InitialiseDuty();
        rowsRead = new int[n][];
        for (int i = 0; i < n; i++) rowsRead[i] = RowsRead(i);
    }

    // The bus, its neighbours (voltages) and the ends of its branches (contributions), once each.
    private int[] RowsRead(int bus)
    {
        var rows = new List<int> { bus };
        void Add(int r)
        {
            if (!rows.Contains(r)) rows.Add(r);
        }
        if (request.IncludeVoltages) foreach (var (other, _) in neighbours[bus]) Add(other);
        if (request.IncludeContributions)
        {
            foreach (int b in adjacent[bus])
            {
                Add(model.Branches[b].From);
                Add(model.Branches[b].To);
            }
        }
        foreach (int end in BreakerBranchEnds(bus)) Add(end);
        return rows.ToArray();
    }

    public void At(int bus, List<ShortCircuitLevel> into)
    {
        PuBus pu = model.Buses[bus];
        double kv = pu.BaseKv, baseMva = model.BaseMva;
        double? baseKa = kv > 0 ? baseMva / (Sqrt3 * kv) : null;
        double zBaseOhm = kv * kv / baseMva;
        // A three-phase fault drives no negative or zero sequence current: those networks need only Z(k, k).
        ReadOnlySpan<int> rows = rowsRead[bus], diagonal = rows[..1];
        networks.Positive.Entries(bus, rows, z1);
        networks.Negative.Entries(bus, unbalanced ? rows : diagonal, z2);
        networks.EquivalentFrequency.Entries(bus, diagonal, zc);
        SequenceNetwork? zero = networks.Zero;
        zero?.Entries(bus, unbalanced ? rows : diagonal, z0);
        Complex? zk1 = networks.Positive.IsFed(bus) ? z1[bus] : null;
        Complex? zk2 = networks.Negative.IsFed(bus) ? z2[bus] : null;
        Complex? zk0 = zero is not null && zero.IsFed(bus) ? z0[bus] : null;
        PrepareDuty(bus);

        Complex zf = Complex.Zero;
        if (request.FaultImpedanceOhm != Complex.Zero)
        {
            if (!(kv > 0)) throw new InputException("a fault impedance in ohm needs the bus kV, which this case does not state", elementId: pu.Id);
            zf = request.FaultImpedanceOhm / zBaseOhm;
        }
        double c = request.Level == FaultLevel.Max ? SupplyImpedance.CMax(kv) : SupplyImpedance.CMin(kv);
        Complex e = preFault is null ? new Complex(c, 0) : preFault[bus];

        double rOverX = 0, kappaROverX = 0;
        double? xOverR = null;
        if (zk1 is Complex zp)
        {
            rOverX = zp.Imaginary != 0 ? zp.Real / zp.Imaginary : 0;
            xOverR = zp.Real > 0 ? zp.Imaginary / zp.Real : null;
            Complex zcK = zc[bus];
            kappaROverX = zcK.Imaginary > 0 ? zcK.Real / zcK.Imaginary * EquivalentFrequency.Ratio : 0;
        }
        double kappa = zk1 is null ? 0 : SymmetricalComponents.PeakFactor(kappaROverX);
        Complex? Ohm(Complex? z) => z is Complex v && kv > 0 ? v * zBaseOhm : null;

        foreach (FaultKind kind in request.Kinds)
        {
            SequenceValues current = SymmetricalComponents.FaultCurrents(kind, e, zk1, zk2, zk0, zf);
            double ik = current.LargestPhaseMagnitude;
            double earth = (3 * current.Zero).Magnitude;
            into.Add(WithDuty(bus, e, zf, current, zk0, new ShortCircuitLevel
            {
                Bus = pu.Id, Kv = kv, Kind = kind, VoltageFactor = preFault is null ? c : e.Magnitude,
                IkPu = ik, IkKa = ik * baseKa, EarthCurrentPu = earth, EarthCurrentKa = earth * baseKa,
                SkMva = ik * baseMva,
                ROverX = rOverX, XOverR = xOverR, KappaROverX = kappaROverX, Kappa = kappa,
                IpPu = kappa * Sqrt2 * ik, IpKa = kappa * Sqrt2 * ik * baseKa,
                Z1Pu = zk1, Z2Pu = zk2, Z0Pu = zk0, Z1Ohm = Ohm(zk1), Z2Ohm = Ohm(zk2), Z0Ohm = Ohm(zk0),
                Voltages = request.IncludeVoltages ? Voltages(bus, kind, e, current) : [],
                Contributions = request.IncludeContributions ? Contributions(bus, current, baseKa) : [],
            }));
        }
    }

    private PhaseVoltages[] Voltages(int bus, FaultKind kind, Complex e, SequenceValues current)
    {
        var list = neighbours[bus];
        var result = new PhaseVoltages[list.Length + 1];
        Complex? floating = FloatingZeroSequence(bus, kind, e, current);
        result[0] = VoltageAt(bus, bus, 0, true, e, current, floating);
        for (int i = 0; i < list.Length; i++) result[i + 1] = VoltageAt(list[i].Bus, bus, list[i].Lag, false, e, current, floating);
        return result;
    }

    /// <summary>
    /// An earth fault at a bus with no zero-sequence path to earth (an isolated-neutral part of the network)
    /// draws no current, yet it ties a phase to earth: the neutral shifts. V0 then follows from the fault
    /// condition, not from −Z0·I0 with I0 = 0 (symmetrical components; any protection text on isolated
    /// neutral systems): line-to-earth on phase a, V_a = 0, so V0 = −(V1 + V2); double line-to-earth on b
    /// and c, V_b = V_c = 0, so V0 = −(a²·V1 + a·V2), which equals V1 = V2 there. The whole part of the
    /// network joined to the bus in the zero sequence shifts with it. Null when the bus has a path to earth.
    /// </summary>
    private Complex? FloatingZeroSequence(int bus, FaultKind kind, Complex e, SequenceValues current)
    {
        if (!kind.InvolvesEarth() || networks.Zero is not { } zero || zero.IsFed(bus)) return null;
        Complex pre = preFault is null ? e : preFault[bus];
        Complex v1 = pre - z1[bus] * current.Positive;
        Complex v2 = -z2[bus] * current.Negative;
        Complex a = SequenceValues.A;
        return kind == FaultKind.LineToEarth ? -(v1 + v2) : -(a * a * v1 + a * v2);
    }

    // Sequence voltages come from networks without the vector groups' clock shifts; across a transformer
    // the positive sequence lags by the clock angle and the negative sequence leads by it (IEC 60076-1).
    private PhaseVoltages VoltageAt(int i, int faultedBus, int lag, bool faulted, Complex e, SequenceValues current, Complex? floating)
    {
        Complex pre = preFault is null ? e : preFault[i];
        Complex v1 = pre - z1[i] * current.Positive;
        Complex v2 = -z2[i] * current.Negative;
        Complex v0 = networks.Zero is not { } zero ? Complex.Zero
            : floating is Complex shift ? (zero.Joined(i, faultedBus) ? shift : Complex.Zero)
            : -z0[i] * current.Zero;
        if (lag != 0)
        {
            Complex turn = Complex.FromPolarCoordinates(1, -lag * Math.PI / 6);
            v1 *= turn;
            v2 *= Complex.Conjugate(turn);
        }
        var v = new SequenceValues(v0, v1, v2);
        return new PhaseVoltages(model.Buses[i].Id, faulted, v.PhaseA.Magnitude, v.PhaseB.Magnitude, v.PhaseC.Magnitude);
    }

    private BranchContribution[] Contributions(int bus, SequenceValues fault, double? baseKa)
    {
        int[] branches = adjacent[bus];
        var result = new BranchContribution[branches.Length];
        int phase = fault.LargestPhase;
        Complex faultPhase = fault.Phase(phase);
        for (int j = 0; j < branches.Length; j++)
        {
            int b = branches[j];
            PuBranch branch = model.Branches[b];
            bool atFrom = branch.From == bus;
            Complex i1 = IntoBus(networks.Positive.TwoPort(b), z1, branch, atFrom, fault.Positive);
            Complex i2 = IntoBus(networks.Negative.TwoPort(b), z2, branch, atFrom, fault.Negative);
            Complex i0 = networks.Zero is { } zero ? IntoBus(zero.TwoPort(b), z0, branch, atFrom, fault.Zero) : Complex.Zero;
            var flow = new SequenceValues(i0, i1, i2);
            double ik = flow.LargestPhaseMagnitude;
            var direction = ik <= 1e-9 * fault.LargestPhaseMagnitude ? ContributionDirection.None
                : (flow.Phase(phase) * Complex.Conjugate(faultPhase)).Real >= 0 ? ContributionDirection.IntoFault
                : ContributionDirection.AwayFromFault;
            string other = model.Buses[atFrom ? branch.To : branch.From].Id;
            result[j] = new BranchContribution(branch.Id, other, ik, ik * baseKa, direction);
        }
        return result;
    }

    // Current from the branch into the faulted bus: minus the current entering the branch at that end.
    private static Complex IntoBus(BranchAdmittance y, Complex[] column, PuBranch branch, bool atFrom, Complex faultCurrent)
    {
        if (faultCurrent == Complex.Zero) return Complex.Zero;
        Complex dvFrom = -column[branch.From] * faultCurrent;
        Complex dvTo = -column[branch.To] * faultCurrent;
        return atFrom ? -(y.Yff * dvFrom + y.Yft * dvTo) : -(y.Ytf * dvFrom + y.Ytt * dvTo);
    }

    // Buses one branch away (through a three-winding bank's star point to its other terminals), with the clock lag.
    private (int Bus, int Lag)[] NeighboursOf(int bus)
    {
        var found = new List<(int Bus, int Lag)>();
        void Add(int other, int lag)
        {
            if (other == bus) return;
            foreach (var f in found) if (f.Bus == other) return;
            found.Add((other, lag));
        }
        foreach (int b in adjacent[bus])
        {
            var (other, lag) = Across(b, bus);
            if (!model.Buses[other].IsInternal)
            {
                Add(other, lag);
                continue;
            }
            foreach (int b2 in adjacent[other])
            {
                if (b2 == b) continue;
                var (far, lag2) = Across(b2, other);
                if (!model.Buses[far].IsInternal) Add(far, lag + lag2);
            }
        }
        return found.ToArray();
    }

    private (int Other, int Lag) Across(int branch, int from)
    {
        PuBranch b = model.Branches[branch];
        int lag = networks.ClockLag[branch];
        return b.From == from ? (b.To, lag) : (b.From, -lag);
    }
}
