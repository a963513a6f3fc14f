// Turns the solved state into result records: bus voltages, branch flows at both ends, totals, violations.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.LoadFlow;

internal static class LoadFlowResults
{
    public static LoadFlowResult Build(PerUnitModel model, BusSchedule schedule, NewtonRaphson nr, AdmittanceMatrix y,
        ControlLoops controls, int iterations, List<IterationRecord> log, LoadFlowOptions options)
    {
        nr.ComputeMismatch();
        double baseMva = model.BaseMva;
        int n = model.Buses.Count;
        var buses = new List<BusResult>(n);
        var violations = new List<Violation>();
        double genP = 0, genQ = 0, loadP = 0, loadQ = 0, shuntQ = 0, shuntP = 0;
        for (int i = 0; i < n; i++)
        {
            PuBus bus = model.Buses[i];
            double vm = nr.Magnitude[i];
            Complex load = schedule.Type[i] == BusType.Dead ? Complex.Zero : schedule.LoadAt(i, vm);
            Complex gen = schedule.HasSource[i] && schedule.Type[i] != BusType.Dead ? nr.Power[i] + load : Complex.Zero;
            genP += gen.Real; genQ += gen.Imaginary; loadP += load.Real; loadQ += load.Imaginary;
            bool energised = schedule.Type[i] != BusType.Dead;
            ViolationKind violation = !energised || bus.IsInternal ? ViolationKind.None
                : vm < bus.VMin ? ViolationKind.Low : vm > bus.VMax ? ViolationKind.High : ViolationKind.None;
            if (violation != ViolationKind.None)
                violations.Add(new Violation
                {
                    Element = bus.Id, Kind = ElementKind.Bus, Type = violation, Value = vm,
                    Limit = violation == ViolationKind.Low ? bus.VMin : bus.VMax,
                });
            if (bus.IsInternal && !options.IncludeInternalBuses) continue;
            buses.Add(new BusResult
            {
                Id = bus.Id, Kv = bus.BaseKv, VPu = vm, VKv = bus.BaseKv > 0 ? vm * bus.BaseKv : null,
                AngleDeg = nr.Angle[i] * 180 / Math.PI,
                PGenMw = gen.Real * baseMva, QGenMvar = gen.Imaginary * baseMva,
                PLoadMw = load.Real * baseMva, QLoadMvar = load.Imaginary * baseMva,
                Violation = violation, VMin = bus.VMin, VMax = bus.VMax, Energised = energised,
            });
        }
        foreach (PuShunt s in model.Shunts)
        {
            double v2 = nr.Magnitude[s.Bus] * nr.Magnitude[s.Bus];
            shuntQ += s.B * v2;
            shuntP += s.G * v2;
        }

        var branches = new List<BranchResult>(model.Branches.Count);
        double lossP = 0, lossQ = 0;
        foreach (PuBranch b in model.Branches)
        {
            BranchResult r = Flow(model, b, nr.Voltage, y.Options);
            lossP += r.LossMw; lossQ += r.LossMvar;
            branches.Add(r);
            if (r.LoadingPercent > 100)
                violations.Add(new Violation
                {
                    Element = r.Id, Kind = KindOf(r.Kind), Type = ViolationKind.Overload, Value = r.LoadingPercent.Value, Limit = 100,
                });
        }

        var taps = new List<TapResult>();
        for (int k = 0; k < model.Taps.Count; k++)
        {
            PuTap t = model.Taps[k];
            taps.Add(new TapResult
            {
                Id = t.Id, Position = controls.Position(k), Ratio = model.Branches[t.Branch].Ratio,
                Regulating = controls.IsRegulating(k), AtLimit = controls.AtLimit[k],
                RegulatedBus = t.RegulatedBus is int rb ? model.Buses[rb].Id : null,
            });
        }
        var limits = new List<ReactiveLimitState>();
        for (int i = 0; i < n; i++)
            if (controls.ReactiveLimit(i) is ReactiveLimitSide side) limits.Add(new ReactiveLimitState(model.Buses[i].Id, side));

        return new LoadFlowResult
        {
            Converged = true, Iterations = iterations, MaxMismatchPu = nr.MaxMismatch,
            WorstBus = nr.WorstBus >= 0 ? model.Buses[nr.WorstBus].Id : null,
            Scenario = model.Scenario?.Name,
            Buses = buses, Branches = branches, Taps = taps, Violations = violations, Log = log,
            BusesAtReactiveLimit = limits,
            Totals = new LoadFlowTotals
            {
                GenerationMw = genP * baseMva, GenerationMvar = genQ * baseMva,
                LoadMw = loadP * baseMva, LoadMvar = loadQ * baseMva,
                LossMw = lossP, LossMvar = lossQ, ShuntMvar = shuntQ * baseMva, ShuntMw = shuntP * baseMva,
            },
        };
    }

    /// <summary>Flows at both ends from the branch two-port; loss = sum of the two end injections.</summary>
    internal static BranchResult Flow(PerUnitModel model, PuBranch b, Complex[] v, AdmittanceOptions options)
    {
        var (iFrom, iTo, sFrom, sTo) = EndFlows(model, b, v, options);
        PuBus from = model.Buses[b.From], to = model.Buses[b.To];
        double? CurrentA(PuBus bus, Complex i) =>
            bus.BaseKv > 0 ? i.Magnitude * model.BaseMva / (Math.Sqrt(3) * bus.BaseKv) * 1000 : null;
        return new BranchResult
        {
            Id = b.Winding is null ? b.Id : $"{b.Id}/{b.Winding}",
            Kind = b.Kind,
            From = from.Id, To = to.Id,
            PFromMw = sFrom.Real, QFromMvar = sFrom.Imaginary, PToMw = sTo.Real, QToMvar = sTo.Imaginary,
            SFromMva = sFrom.Magnitude, SToMva = sTo.Magnitude,
            IFromA = CurrentA(from, iFrom), IToA = CurrentA(to, iTo),
            LossMw = sFrom.Real + sTo.Real, LossMvar = sFrom.Imaginary + sTo.Imaginary,
            RatingMva = b.RatingMva,
            LoadingPercent = Loading(b, sFrom, sTo),
        };
    }

    /// <summary>The larger end MVA over the rating, percent; null without a rating (the same figure as <see cref="Flow"/>'s).</summary>
    internal static double? LoadingPercent(PerUnitModel model, PuBranch b, Complex[] v, AdmittanceOptions options)
    {
        if (b.RatingMva is not > 0) return null;
        var (_, _, sFrom, sTo) = EndFlows(model, b, v, options);
        return Loading(b, sFrom, sTo);
    }

    private static double? Loading(PuBranch b, Complex sFrom, Complex sTo) =>
        b.RatingMva is > 0 ? Math.Max(sFrom.Magnitude, sTo.Magnitude) / b.RatingMva.Value * 100 : null;

    /// <summary>Currents (pu) and powers (MVA) into the branch at both ends.</summary>
    private static (Complex IFrom, Complex ITo, Complex SFrom, Complex STo) EndFlows(PerUnitModel model, PuBranch b, Complex[] v, AdmittanceOptions options)
    {
        var y = BranchAdmittance.Of(b, options.IncludeCharging, options.IncludeMagnetising);
        Complex vf = v[b.From], vt = v[b.To];
        Complex iFrom = y.Yff * vf + y.Yft * vt;
        Complex iTo = y.Ytf * vf + y.Ytt * vt;
        Complex sFrom = vf * Complex.Conjugate(iFrom) * model.BaseMva;
        Complex sTo = vt * Complex.Conjugate(iTo) * model.BaseMva;
        return (iFrom, iTo, sFrom, sTo);
    }

    /// <summary>The element kind a branch's violation names.</summary>
    internal static ElementKind KindOf(BranchKind kind) => kind switch
    {
        BranchKind.Line => ElementKind.Line,
        BranchKind.Transformer => ElementKind.Transformer,
        _ => ElementKind.ThreeWindingTransformer,
    };
}
