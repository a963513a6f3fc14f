// Motor starting: the voltage at every bus at the instant one or more motors start, from a pre-start load flow.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Numerics;
using Study.Core.Units;

namespace Study.Core.Studies;

/// <summary>
/// The instant of starting (common practice; DEVELOPERS.md, Algorithms). A load flow without the motors to
/// be started fixes the state before: its voltages, its tap positions (held, the on-load changers have not
/// moved yet) and each source's EMF behind its impedance, E = V + Z·I: a supply behind
/// Z_Q = U_n²/S_k (S_k = scMvaMin, else scMvaMax; its X/R; no c), a generator behind x''d. Loads and the
/// motors already running become constant impedances at their pre-start voltage; sources without an
/// impedance (a supply without a fault level, a generator without x''d that controls its voltage) hold their
/// pre-start voltage, a PQ generator its pre-start current. The started motors are their locked-rotor
/// impedance as the starter presents it to the line: direct Z_LR, star-delta 3·Z_LR (one third of the
/// current), autotransformer Z_LR/k² (the line current k² of direct, k = tap/100), soft starter a constant
/// current at its limit with the locked-rotor power factor, or Z_LR when that draws less. One linear solve
/// of the network (Y of the load flow plus those admittances) gives the voltages during the start; with a
/// soft starter at its limit the current's angle follows the voltage, by a few fixed-point rounds.
/// </summary>
public static class MotorStart
{
    /// <summary>Admittance of a source that holds its voltage: large against any branch, small enough for pivoting.</summary>
    private const double StiffPu = 1e8;

    /// <exception cref="InputException">A motor is not in the model (unknown or out of service).</exception>
    public static MotorStartResult Run(PerUnitModel model, MotorStartRequest request, CancellationToken cancel = default)
    {
        request.Validate();
        var started = new List<PuMotor>();
        foreach (string id in request.Motors)
            started.Add(model.Motors.FirstOrDefault(m => m.Id == id)
                ?? throw new InputException($"motor {id} is not in service (or its bus is out of service): nothing to start", elementId: id));
        var startedIds = started.Select(m => m.Id).ToHashSet();
        var notes = new List<string>();

        PerUnitModel before = model with { Loads = model.Loads.Where(l => !(l.Motor && startedIds.Contains(l.Id))).ToList() };
        LoadFlowResult flow = LoadFlowSolver.Solve(before, request.Options with { IncludeInternalBuses = true }, cancel);
        if (!flow.Converged)
            return new MotorStartResult
            {
                Scenario = model.Scenario?.Name, Motors = request.Motors, MinTerminalPu = request.MinTerminalPu,
                Failure = $"the pre-start load flow did not converge: {flow.Message}",
            };
        before = before.WithSolvedTaps(flow);

        int n = model.Buses.Count;
        var v = new Complex[n];
        var energised = new bool[n];
        var sGen = new Complex[n];
        var sLoad = new Complex[n];
        foreach (BusResult b in flow.Buses)
        {
            if (!model.BusIndex.TryGetValue(b.Id, out int i) || !b.Energised) continue;
            energised[i] = true;
            v[i] = Complex.FromPolarCoordinates(b.VPu, b.AngleDeg * Math.PI / 180);
            sGen[i] = new Complex(b.PGenMw, b.QGenMvar) / model.BaseMva;
            sLoad[i] = new Complex(b.PLoadMw, b.QLoadMvar) / model.BaseMva;
        }

        // Norton equivalents of the sources, and the loads as impedances, at the pre-start state.
        var y = new Complex[n];
        var j = new Complex[n];
        var stiff = new bool[n];
        var behind = new Complex[n];
        foreach (PuSource s in model.Sources)
        {
            if (!energised[s.Bus]) continue;
            if (SourceImpedance(s, model.BaseMva, notes) is Complex z) behind[s.Bus] += 1.0 / z;
            else if (s.Mode != GeneratorMode.Pq || s.Kind == ElementKind.Supply) stiff[s.Bus] = true;
        }
        for (int i = 0; i < n; i++)
        {
            if (!energised[i])
            {
                y[i] = Complex.One; // a dead island: its rows stay regular and its voltage zero
                continue;
            }
            Complex current = Complex.Conjugate(sGen[i] / v[i]);
            if (stiff[i])
            {
                y[i] += StiffPu;
                j[i] += StiffPu * v[i];
            }
            else
            {
                y[i] += behind[i];
                j[i] += behind[i] * v[i] + current;
            }
            double vm = v[i].Magnitude;
            if (sLoad[i] != Complex.Zero) y[i] += Complex.Conjugate(sLoad[i]) / (vm * vm);
        }

        // The started motors as the starter presents them to the line; soft starters at their limit as currents.
        var atLimit = new bool[started.Count];
        Complex[] during = Solve(before, y, j, started, atLimit, null);
        for (int k = 0; k < started.Count; k++)
            if (started[k].Starter.Method == StarterMethod.SoftStarter && started[k].Starter.CurrentLimit is double limit
                && (during[started[k].Bus] / LineImpedance(started[k])).Magnitude > limit * started[k].RatedCurrentPu)
                atLimit[k] = true;
        if (atLimit.Any(a => a)) during = Solve(before, y, j, started, atLimit, during);

        if (behind.All(b => b == Complex.Zero) && !stiff.Any(s => s))
            notes.Add("no source has an impedance or holds its voltage: the start cannot be driven");
        notes.Add("loads and running motors as constant impedances at their pre-start voltage; taps held at their pre-start positions");

        var watch = request.WatchBuses.ToHashSet();
        var motorBuses = started.Select(m => m.Bus).ToHashSet();
        var buses = new List<StartBus>();
        for (int i = 0; i < n; i++)
        {
            PuBus bus = model.Buses[i];
            if (bus.IsInternal) continue;
            double pre = v[i].Magnitude, now = energised[i] ? during[i].Magnitude : 0;
            buses.Add(new StartBus(bus.Id, bus.BaseKv, pre, now, pre > 0 ? 100 * (pre - now) / pre : 0, watch.Contains(bus.Id), motorBuses.Contains(i)));
        }
        var motors = new List<StartedMotor>();
        for (int k = 0; k < started.Count; k++)
        {
            PuMotor m = started[k];
            PuBus bus = model.Buses[m.Bus];
            Complex vm = during[m.Bus];
            double current = atLimit[k] ? m.Starter.CurrentLimit!.Value * m.RatedCurrentPu : (vm / LineImpedance(m)).Magnitude;
            double? ka = bus.BaseKv > 0 ? current * model.BaseMva / (Math.Sqrt(3) * bus.BaseKv) : null;
            motors.Add(new StartedMotor(m.Id, bus.Id, m.Starter.Method, vm.Magnitude, current, ka,
                m.RatedCurrentPu > 0 ? current / m.RatedCurrentPu : 0, atLimit[k], vm.Magnitude >= request.MinTerminalPu));
        }
        return new MotorStartResult
        {
            Scenario = model.Scenario?.Name, Motors = request.Motors, MinTerminalPu = request.MinTerminalPu, Buses = buses, Started = motors,
            MotorTerminalPu = motors.Min(m => m.TerminalPu), Ok = motors.All(m => m.Ok), Notes = notes.Distinct().ToList(),
        };
    }

    /// <summary>The impedance a started motor presents to the line, by its starter.</summary>
    public static Complex LineImpedance(PuMotor m) => m.Starter.Method switch
    {
        StarterMethod.StarDelta => 3 * m.LockedRotorZPu,
        StarterMethod.Autotransformer when m.Starter.TapPercent is double tap => m.LockedRotorZPu / Math.Pow(tap / 100, 2),
        _ => m.LockedRotorZPu,
    };

    /// <summary>A supply's Z_Q = U_n²/S_k without c, or a generator's x''d; null when the source has none.</summary>
    private static Complex? SourceImpedance(PuSource s, double baseMva, List<string> notes)
    {
        if (s.Kind == ElementKind.Generator)
        {
            if (s.Z1 is Complex z) return z;
            notes.Add($"{s.Id}: no x''d: {(s.Mode == GeneratorMode.Pq ? "its pre-start current held" : "holds its pre-start voltage")}");
            return null;
        }
        SupplyFaultData data = s.FaultData!;
        if ((data.ScMvaMin ?? data.ScMvaMax) is not double sk || !(sk > 0))
        {
            notes.Add($"{s.Id}: no scMvaMin or scMvaMax: holds its pre-start voltage (an infinite source)");
            return null;
        }
        double xr = data.XOverR ?? SupplyImpedance.DefaultXOverR;
        double zPu = baseMva / sk;
        double r = zPu / Math.Sqrt(1 + xr * xr);
        return new Complex(r, r * xr);
    }

    /// <summary>Voltages with the started motors in: impedances, and currents for soft starters at their limit.</summary>
    private static Complex[] Solve(PerUnitModel model, Complex[] y, Complex[] j, List<PuMotor> started, bool[] atLimit, Complex[]? first)
    {
        int n = y.Length;
        var diagonal = (Complex[])y.Clone();
        for (int k = 0; k < started.Count; k++)
            if (!atLimit[k]) diagonal[started[k].Bus] += 1.0 / LineImpedance(started[k]);
        var admittance = new AdmittanceMatrix(model, AdmittanceOptions.LoadFlow, diagonal);
        var lu = SparseLu<Complex>.Analyse(admittance.Matrix);
        lu.Factor(admittance.Matrix);
        var x = new Complex[n];
        var previous = first is null ? new Complex[n] : (Complex[])first.Clone();
        for (int round = 0; round < 100; round++)
        {
            Array.Copy(j, x, n);
            for (int k = 0; k < started.Count; k++)
            {
                if (!atLimit[k]) continue;
                PuMotor m = started[k];
                Complex vm = previous[m.Bus] == Complex.Zero ? Complex.One : previous[m.Bus];
                double angle = Math.Atan2(m.LockedRotorZPu.Imaginary, m.LockedRotorZPu.Real);
                // The current drawn lags the terminal voltage by the locked-rotor angle.
                x[m.Bus] -= Complex.FromPolarCoordinates(m.Starter.CurrentLimit!.Value * m.RatedCurrentPu, vm.Phase - angle);
            }
            lu.Solve(x);
            if (!atLimit.Any(a => a)) return x;
            double change = 0;
            for (int i = 0; i < n; i++) change = Math.Max(change, (x[i] - previous[i]).Magnitude);
            Array.Copy(x, previous, n);
            if (change < 1e-12) break;
        }
        return x;
    }
}
