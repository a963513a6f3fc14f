// The load flow: Newton-Raphson inside outer control loops for reactive limits and on-load taps.
using System.Diagnostics;
using Study.Core.Admittance;
using Study.Core.Units;

namespace Study.Core.LoadFlow;

/// <summary>
/// Solves a <see cref="PerUnitModel"/>. Controls run as outer loops around Newton-Raphson, warm
/// started from the previous state: PV buses switch to PQ at a reactive limit and back when the
/// voltage recovers; regulating taps move by whole steps toward their band until no tap moves.
/// Never throws for an unsolvable case: the result says it did not converge and where.
/// </summary>
public static class LoadFlowSolver
{
    public static LoadFlowResult Solve(PerUnitModel model, LoadFlowOptions? options = null, CancellationToken cancel = default) =>
        Solve(model, options ?? LoadFlowOptions.Default, cancel, out _);

    /// <summary>The load flow, and the solver that reached it (its state and factors seed outage solves).</summary>
    /// <param name="symbolic">
    /// The symbolic analysis of an earlier solve of a network of the same branches and buses (only loads,
    /// generation or tap positions changed): its Jacobian has the same pattern, so the analysis is reused.
    /// </param>
    internal static LoadFlowResult Solve(PerUnitModel model, LoadFlowOptions options, CancellationToken cancel, out NewtonRaphson solver,
        Numerics.LuSymbolic? symbolic = null)
    {
        long start = Stopwatch.GetTimestamp();
        var schedule = new BusSchedule(model);
        int[] island = Islands.Label(model);
        BusSchedule.MarkDead(schedule.Type, island);
        var y = new AdmittanceMatrix(model);
        long admittance = Stopwatch.GetTimestamp();
        var nr = new NewtonRaphson(y, schedule, symbolic);
        solver = nr;
        long analysed = Stopwatch.GetTimestamp();
        LoadFlowTimings Timings() => new()
        {
            AdmittanceMs = Ms(admittance - start), AnalyseMs = Ms(analysed - admittance),
            JacobianMs = Ms(nr.JacobianTicks), FactorMs = Ms(nr.FactorTicks), SolveMs = Ms(nr.SolveTicks),
            TotalMs = Ms(Stopwatch.GetTimestamp() - start),
            JacobianSize = nr.JacobianSize, JacobianNonZeros = nr.JacobianNonZeros, FactorNonZeros = nr.FactorNonZeros,
        };
        InitialState(model, schedule, island, nr, WarmState.Of(model, options.WarmStart));

        var log = new List<IterationRecord>();
        var controls = new ControlLoops(model, schedule, nr, options);
        InnerOutcome outcome = Iterate(nr, controls, y, options,
            (mismatch, bus) => log.Add(new IterationRecord(log.Count, mismatch, bus >= 0 ? model.Buses[bus].Id : "")),
            cancel, out int total);
        if (outcome != InnerOutcome.Converged)
            return Failed(model, nr, outcome, total, log) with { Jacobian = Capture(nr, options), Timings = Timings() };
        LoadFlowResult result = LoadFlowResults.Build(controls.Model, schedule, nr, y, controls, total, log, options)
            with { Jacobian = Capture(nr, options) };
        return result with { Timings = Timings() };
    }

    /// <summary>
    /// Newton-Raphson, then the control loops (reactive limits first, then taps) and Newton-Raphson
    /// again from the current state, until no control acts or the rounds run out.
    /// </summary>
    internal static InnerOutcome Iterate(NewtonRaphson nr, ControlLoops controls, AdmittanceMatrix y, LoadFlowOptions options,
        Action<double, int> onIteration, CancellationToken cancel, out int iterations)
    {
        iterations = 0;
        for (int round = 0; ; round++)
        {
            InnerOutcome outcome = nr.Solve(options.TolerancePu, options.MaxIterations, onIteration, cancel, out int inner);
            iterations += inner;
            if (outcome != InnerOutcome.Converged) return outcome;
            if (round >= options.MaxControlRounds) return outcome;
            bool changed = controls.AdjustReactiveLimits();
            if (!changed) changed = controls.AdjustTaps(y);
            if (!changed) return outcome;
        }
    }

    private static double Ms(long ticks) => ticks * 1000.0 / Stopwatch.Frequency;

    private static Numerics.CscMatrix<double>? Capture(NewtonRaphson nr, LoadFlowOptions options) =>
        options.CaptureJacobian && nr.JacobianSize > 0 ? nr.JacobianAtState() : null;

    /// <summary>
    /// The starting point: dead buses at zero; slack buses at their set point; PV buses at their set
    /// magnitude; PQ buses at 1 pu; angles those of their island's slack. A warm start replaces the PQ
    /// magnitudes and the PQ and PV angles where it knows the bus.
    /// </summary>
    internal static void InitialState(PerUnitModel model, BusSchedule schedule, int[] island, NewtonRaphson nr, WarmState? warm)
    {
        int n = model.Buses.Count;
        var slackAngle = new Dictionary<int, double>();
        var slackBuses = new List<int>();
        for (int i = 0; i < n; i++)
        {
            if (schedule.Type[i] != BusType.Slack) continue;
            slackBuses.Add(i);
            slackAngle.TryAdd(island[i], schedule.AngleSet[i]);
        }
        // A flat start puts each bus at its slack's angle less the phase shifts on the way (a Dyn1 bank's lv
        // side 30° behind): started at the slack's angle, Newton-Raphson can land on a low-voltage solution.
        double[] shifted = PhaseShifts.Accumulated(model, b => b.ShiftRad, slackBuses);
        for (int i = 0; i < n; i++)
        {
            BusType t = schedule.Type[i];
            if (t == BusType.Dead)
            {
                nr.SetState(i, 0, 0);
                continue;
            }
            double vm = t == BusType.Pq ? 1.0 : schedule.VSet[i];
            double angle = t == BusType.Slack ? schedule.AngleSet[i] : slackAngle[island[i]] - shifted[i];
            if (t == BusType.Pq && warm is not null && warm.Known[i] && warm.Magnitude[i] > 0)
            {
                vm = warm.Magnitude[i];
                angle = warm.Angle[i];
            }
            else if (t == BusType.Pv && warm is not null && warm.Known[i])
            {
                angle = warm.Angle[i];
            }
            nr.SetState(i, vm, angle);
        }
    }

    /// <summary>Why Newton-Raphson stopped short, in words, and the bus to look at.</summary>
    internal static (string Message, string WorstBus) Failure(PerUnitModel model, NewtonRaphson nr, InnerOutcome outcome)
    {
        string worst = nr.WorstBus >= 0 ? model.Buses[nr.WorstBus].Id : "";
        string singular = model.Buses[Math.Max(nr.SingularBus, 0)].Id;
        string message = outcome switch
        {
            InnerOutcome.Singular =>
                $"the Jacobian is singular near bus {singular}: part of the network has no voltage reference or no path for its power",
            InnerOutcome.Diverged =>
                $"the mismatch grew without bound (largest at bus {worst}): the load is probably beyond what the network can transfer",
            _ => $"no convergence in the iteration limit; the largest mismatch {nr.MaxMismatch:0.###e+0} pu is at bus {worst}",
        };
        return (message, outcome == InnerOutcome.Singular ? singular : worst);
    }

    private static LoadFlowResult Failed(PerUnitModel model, NewtonRaphson nr, InnerOutcome outcome, int iterations, List<IterationRecord> log)
    {
        (string message, string worst) = Failure(model, nr, outcome);
        return new LoadFlowResult
        {
            Converged = false,
            Iterations = iterations,
            MaxMismatchPu = double.IsFinite(nr.MaxMismatch) ? nr.MaxMismatch : double.MaxValue,
            WorstBus = worst,
            Message = message,
            Scenario = model.Scenario?.Name,
            Log = log.Select(r => double.IsFinite(r.MaxMismatchPu) ? r : r with { MaxMismatchPu = double.MaxValue }).ToList(),
        };
    }
}

/// <summary>A solved state to start from, by bus index: magnitudes, angles (radians), and which buses it knows.</summary>
internal sealed record WarmState(double[] Magnitude, double[] Angle, bool[] Known)
{
    /// <summary>The buses of a converged result matched to the model by id; null for no result or one that did not converge.</summary>
    public static WarmState? Of(PerUnitModel model, LoadFlowResult? result)
    {
        if (result?.Converged != true) return null;
        int n = model.Buses.Count;
        var warm = new WarmState(new double[n], new double[n], new bool[n]);
        foreach (BusResult b in result.Buses)
        {
            if (!model.BusIndex.TryGetValue(b.Id, out int i)) continue;
            if (warm.Known[i]) continue;
            warm.Known[i] = true;
            warm.Magnitude[i] = b.VPu;
            warm.Angle[i] = b.AngleDeg * Math.PI / 180;
        }
        return warm;
    }
}
