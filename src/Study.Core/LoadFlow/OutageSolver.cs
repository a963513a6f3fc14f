// Load flows of one intact case with branches taken out: an outage changes values, not the pattern,
// so every outage solve reuses the intact case's admittance pattern, Jacobian pattern, symbolic
// analysis and pivot sequence, and starts from the intact solution.
using Study.Core.Admittance;
using Study.Core.Units;

namespace Study.Core.LoadFlow;

/// <summary>
/// The intact load flow of one model, and what every outage solve of it shares, read only: the
/// symbolic analysis of the Jacobian, the pivot sequence and factor patterns of the intact solve, and
/// the intact solution to start from. Each thread solves outages on its own <see cref="OutageWorker"/>.
/// </summary>
internal sealed class OutageSolver
{
    private readonly NewtonRaphson template;

    /// <summary>Solves the intact case (<see cref="LoadFlowSolver.Solve(PerUnitModel, LoadFlowOptions?, CancellationToken)"/>, the same result).</summary>
    public OutageSolver(PerUnitModel model, LoadFlowOptions options, CancellationToken cancel)
    {
        Model = model;
        Options = options with { WarmStart = null, CaptureJacobian = false };
        Intact = LoadFlowSolver.Solve(model, Options, cancel, out template);
        Bridges = Islands.Bridges(model);
    }

    public PerUnitModel Model { get; }
    public LoadFlowOptions Options { get; }
    public LoadFlowResult Intact { get; }
    internal NewtonRaphson Template => template;

    /// <summary>Per branch: taking it out alone splits its island (otherwise the islands stay as they are).</summary>
    internal bool[] Bridges { get; }

    /// <summary>A solver of outages for one thread.</summary>
    public OutageWorker CreateWorker() => new(this);
}

/// <summary>
/// Solves one outage after another on its own copies of the values (admittance matrix, Jacobian,
/// factors, schedule); allocates nothing per outage beyond what the control loops need. Each outage
/// starts from the same state whatever was solved before it on this worker: the intact schedule,
/// the model's tap positions, the intact solution and the intact solve's pivots, so a result never
/// depends on which worker solved it or in what order.
/// </summary>
internal sealed class OutageWorker
{
    private readonly OutageSolver solver;
    private readonly PerUnitModel model;
    private readonly BusSchedule schedule;
    private readonly BusType[] builtType, liveType;
    private readonly double[] builtQGen;
    private readonly AdmittanceMatrix y;
    private readonly NewtonRaphson nr;
    private readonly ControlLoops controls;
    private readonly bool[] open;
    private readonly int[] parent, island, intactIsland;
    private InnerOutcome outcome;

    public OutageWorker(OutageSolver solver)
    {
        this.solver = solver;
        model = solver.Model;
        int n = model.Buses.Count;
        schedule = new BusSchedule(model);
        builtType = (BusType[])schedule.Type.Clone();
        builtQGen = (double[])schedule.QGen.Clone();
        parent = new int[n];
        island = new int[n];
        open = new bool[model.Branches.Count];
        Islands.Label(model, null, parent, island);
        BusSchedule.MarkDead(schedule.Type, island);
        liveType = (BusType[])schedule.Type.Clone();
        intactIsland = (int[])island.Clone();
        y = new AdmittanceMatrix(model);
        // Chord steps and a partial first factorisation only from a solved intact case: from a flat
        // start (the intact case did not converge) each outage is a plain Newton solve.
        nr = new NewtonRaphson(y, schedule, solver.Template.Symbolic) { ReuseFactors = solver.Intact.Converged };
        controls = new ControlLoops(model, schedule, nr, solver.Options);
    }

    /// <summary>Newton iterations of the last solve, control rounds included.</summary>
    public int Iterations { get; private set; }

    public bool Converged => outcome == InnerOutcome.Converged;

    /// <summary>
    /// Solves the model with <paramref name="branches"/> (indices into its branches) taken out: the same
    /// load flow as <see cref="LoadFlowSolver"/> on the model without them, warm started from the intact
    /// case. The state it leaves is read through this worker until the next call.
    /// </summary>
    public void Solve(IReadOnlyList<int> branches, CancellationToken cancel)
    {
        Array.Clear(open);
        foreach (int k in branches) open[k] = true;
        Array.Copy(builtQGen, schedule.QGen, builtQGen.Length);
        // Only a bridge, or an element of several branches, can split an island.
        if (branches.Count > 1 || (branches.Count == 1 && solver.Bridges[branches[0]]))
        {
            Array.Copy(builtType, schedule.Type, builtType.Length);
            Islands.Label(model, open, parent, island);
            BusSchedule.MarkDead(schedule.Type, island);
        }
        else
        {
            Array.Copy(liveType, schedule.Type, liveType.Length);
            Array.Copy(intactIsland, island, island.Length);
        }
        y.TakeOut(branches);
        nr.AdoptFactors(solver.Template);
        foreach (int k in branches)
        {
            nr.MarkChanged(model.Branches[k].From);
            nr.MarkChanged(model.Branches[k].To);
        }
        if (solver.Intact.Converged) nr.StartFrom(solver.Template);
        else LoadFlowSolver.InitialState(model, schedule, island, nr, null);
        controls.Reset(open);
        outcome = LoadFlowSolver.Iterate(nr, controls, y, solver.Options, static (_, _) => { }, cancel, out int iterations);
        Iterations = iterations;
    }

    /// <summary>Why the last solve did not converge (null when it did).</summary>
    public string? Message => Converged ? null : LoadFlowSolver.Failure(model, nr, outcome).Message;

    /// <summary>True when the bus is energised (its island has a slack source) with the branches out.</summary>
    public bool IsLive(int bus) => schedule.Type[bus] != BusType.Dead;

    public bool IsOut(int branch) => open[branch];

    /// <summary>Voltage magnitude, pu (0 on a dead bus).</summary>
    public double VPu(int bus) => nr.Magnitude[bus];

    /// <summary>Loading of a branch left in, percent of its rating at the tap positions reached; null without a rating.</summary>
    public double? LoadingPercent(int branch) =>
        LoadFlowResults.LoadingPercent(controls.Model, controls.Model.Branches[branch], nr.Voltage, y.Options);

    /// <summary>The load the energised buses draw at their voltages, MW (the result's total load).</summary>
    public double LoadMw()
    {
        double load = 0;
        for (int i = 0; i < model.Buses.Count; i++)
            load += schedule.Type[i] == BusType.Dead ? 0 : schedule.LoadAt(i, nr.Magnitude[i]).Real;
        return load * model.BaseMva;
    }
}
