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
    public static LoadFlowResult Solve(PerUnitModel model, LoadFlowOptions? options = null, CancellationToken cancel = default)
    {
        options ??= LoadFlowOptions.Default;
        long start = Stopwatch.GetTimestamp();
        var schedule = new BusSchedule(model);
        int[] island = Islands.Label(model);
        BusSchedule.MarkDead(schedule.Type, island);
        var y = new AdmittanceMatrix(model);
        long admittance = Stopwatch.GetTimestamp();
        var nr = new NewtonRaphson(y, schedule);
        long analysed = Stopwatch.GetTimestamp();
        LoadFlowTimings Timings() => new()
        {
            AdmittanceMs = Ms(admittance - start), AnalyseMs = Ms(analysed - admittance),
            JacobianMs = Ms(nr.JacobianTicks), FactorMs = Ms(nr.FactorTicks), SolveMs = Ms(nr.SolveTicks),
            TotalMs = Ms(Stopwatch.GetTimestamp() - start),
            JacobianSize = nr.JacobianSize, JacobianNonZeros = nr.JacobianNonZeros, FactorNonZeros = nr.FactorNonZeros,
        };
        InitialState(model, schedule, island, nr, options.WarmStart);

        var log = new List<IterationRecord>();
        var controls = new ControlLoops(model, schedule, nr, options);
        int total = 0;
        for (int round = 0; ; round++)
        {
            InnerOutcome outcome = nr.Solve(options.TolerancePu, options.MaxIterations,
                (mismatch, bus) => log.Add(new IterationRecord(log.Count, mismatch, bus >= 0 ? model.Buses[bus].Id : "")),
                cancel, out int iterations);
            total += iterations;
            if (outcome != InnerOutcome.Converged)
                return Failed(model, nr, outcome, total, log, controls.Model) with { Jacobian = Capture(nr, options), Timings = Timings() };
            if (round >= options.MaxControlRounds) break;
            bool changed = controls.AdjustReactiveLimits();
            if (!changed) changed = controls.AdjustTaps(y);
            if (!changed) break;
        }
        LoadFlowResult result = LoadFlowResults.Build(controls.Model, schedule, nr, y, controls, total, log, options)
            with { Jacobian = Capture(nr, options) };
        return result with { Timings = Timings() };
    }

    private static double Ms(long ticks) => ticks * 1000.0 / Stopwatch.Frequency;

    private static Numerics.CscMatrix<double>? Capture(NewtonRaphson nr, LoadFlowOptions options) =>
        options.CaptureJacobian && nr.JacobianSize > 0 ? nr.JacobianAtState() : null;

    private static void InitialState(PerUnitModel model, BusSchedule schedule, int[] island, NewtonRaphson nr, LoadFlowResult? warm)
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
        Dictionary<string, BusResult>? previous = warm?.Converged == true
            ? warm.Buses.ToDictionary(b => b.Id) : null;
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
            if (t == BusType.Pq && previous is not null && previous.TryGetValue(model.Buses[i].Id, out var b) && b.VPu > 0)
            {
                vm = b.VPu;
                angle = b.AngleDeg * Math.PI / 180;
            }
            else if (t == BusType.Pv && previous is not null && previous.TryGetValue(model.Buses[i].Id, out var pv))
            {
                angle = pv.AngleDeg * Math.PI / 180;
            }
            nr.SetState(i, vm, angle);
        }
    }

    private static LoadFlowResult Failed(PerUnitModel original, NewtonRaphson nr, InnerOutcome outcome, int iterations,
        List<IterationRecord> log, PerUnitModel model)
    {
        string worst = nr.WorstBus >= 0 ? model.Buses[nr.WorstBus].Id : "";
        string message = outcome switch
        {
            InnerOutcome.Singular =>
                $"the Jacobian is singular near bus {model.Buses[Math.Max(nr.SingularBus, 0)].Id}: part of the network has no voltage reference or no path for its power",
            InnerOutcome.Diverged =>
                $"the mismatch grew without bound (largest at bus {worst}): the load is probably beyond what the network can transfer",
            _ => $"no convergence in the iteration limit; the largest mismatch {nr.MaxMismatch:0.###e+0} pu is at bus {worst}",
        };
        return new LoadFlowResult
        {
            Converged = false,
            Iterations = iterations,
            MaxMismatchPu = double.IsFinite(nr.MaxMismatch) ? nr.MaxMismatch : double.MaxValue,
            WorstBus = outcome == InnerOutcome.Singular ? model.Buses[Math.Max(nr.SingularBus, 0)].Id : worst,
            Message = message,
            Scenario = original.Scenario?.Name,
            Log = log.Select(r => double.IsFinite(r.MaxMismatchPu) ? r : r with { MaxMismatchPu = double.MaxValue }).ToList(),
        };
    }
}
