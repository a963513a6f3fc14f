// The outer control loops of the load flow: generator reactive limits and on-load tap regulation.
using Study.Core.Admittance;
using Study.Core.Units;

namespace Study.Core.LoadFlow;

/// <summary>
/// Adjusts the schedule between Newton-Raphson solves. Each method returns true when it changed
/// something, so the solver runs again from the current (warm) state.
/// </summary>
internal sealed class ControlLoops
{
    private const double LimitSlackPu = 1e-6;
    private readonly BusSchedule schedule;
    private readonly NewtonRaphson nr;
    private readonly LoadFlowOptions options;
    private readonly PerUnitModel original;
    private readonly bool[] voltageControlled;
    private readonly double[] fixedQ;
    private readonly int[] positions;
    private readonly int[] lastMove;
    private readonly int[] reversals;
    private readonly List<int[]> groups;

    public ControlLoops(PerUnitModel model, BusSchedule schedule, NewtonRaphson nr, LoadFlowOptions options)
    {
        Model = model;
        original = model;
        this.schedule = schedule;
        this.nr = nr;
        this.options = options;
        int n = model.Buses.Count;
        voltageControlled = new bool[n];
        fixedQ = new double[n];
        positions = new int[model.Taps.Count];
        lastMove = new int[positions.Length];
        reversals = new int[positions.Length];
        AtLimit = new TapLimit?[positions.Length];
        groups = [];
        Reset(null);
    }

    /// <summary>
    /// Back to the state of construction for the schedule as it now stands (types and set points
    /// restored, dead buses marked): taps at the model's positions, no move made. Taps on the branches
    /// marked in <paramref name="open"/> (taken out by an outage) do not regulate.
    /// </summary>
    public void Reset(bool[]? open)
    {
        Model = original;
        for (int i = 0; i < voltageControlled.Length; i++) voltageControlled[i] = schedule.Type[i] == BusType.Pv;
        Array.Copy(schedule.QGen, fixedQ, fixedQ.Length);
        for (int k = 0; k < positions.Length; k++) positions[k] = original.Taps[k].Position;
        Array.Clear(lastMove);
        Array.Clear(reversals);
        Array.Clear(AtLimit);
        // Parallel banks regulating one bus form one group and move together, so they cannot hunt
        // against each other.
        groups.Clear();
        groups.AddRange(original.Taps.Select((t, k) => (t, k)).Where(x => x.t.RegulatedBus is not null && open?[x.t.Branch] != true)
            .GroupBy(x => x.t.RegulatedBus!.Value).Select(g => g.Select(x => x.k).ToArray()));
    }

    /// <summary>The model with the current tap positions.</summary>
    public PerUnitModel Model { get; private set; }

    /// <summary>Per tap: the end of its range it sits at while it wants to move past it, else null.</summary>
    public TapLimit?[] AtLimit { get; }

    public bool IsRegulating(int tap) => options.RegulateTaps && Model.Taps[tap].RegulatedBus is not null;

    /// <summary>Buses originally PV that now sit at a reactive limit ("min" or "max").</summary>
    public ReactiveLimitSide? ReactiveLimit(int bus) =>
        !voltageControlled[bus] || schedule.Type[bus] == BusType.Pv ? null
        : Math.Abs(schedule.QGen[bus] - fixedQ[bus] - schedule.QMax[bus]) < 1e-12 ? ReactiveLimitSide.Max : ReactiveLimitSide.Min;

    /// <summary>PV → PQ at a limit; PQ at a limit → PV when the voltage moves back to the set point's side.</summary>
    public bool AdjustReactiveLimits()
    {
        if (!options.EnforceQLimits) return false;
        bool changed = false;
        for (int i = 0; i < voltageControlled.Length; i++)
        {
            if (!voltageControlled[i]) continue;
            double qGen = nr.Power[i].Imaginary + schedule.LoadAt(i, nr.Magnitude[i]).Imaginary - fixedQ[i];
            if (schedule.Type[i] == BusType.Pv)
            {
                if (qGen > schedule.QMax[i] + LimitSlackPu) Hold(i, schedule.QMax[i]);
                else if (qGen < schedule.QMin[i] - LimitSlackPu) Hold(i, schedule.QMin[i]);
                else continue;
                changed = true;
            }
            else
            {
                ReactiveLimitSide? limit = ReactiveLimit(i);
                double v = nr.Magnitude[i], set = schedule.VSet[i];
                if ((limit == ReactiveLimitSide.Max && v > set + 1e-6) || (limit == ReactiveLimitSide.Min && v < set - 1e-6))
                {
                    schedule.Type[i] = BusType.Pv;
                    nr.SetState(i, set, nr.Angle[i]);
                    changed = true;
                }
            }
        }
        return changed;
    }

    private void Hold(int bus, double limit)
    {
        schedule.Type[bus] = BusType.Pq;
        schedule.QGen[bus] = fixedQ[bus] + limit;
    }

    /// <summary>
    /// Moves each regulating group by the whole steps that bring its bus nearest the target, when the
    /// bus is outside its dead band. Returns true when any tap moved (Y is refilled then).
    /// </summary>
    public bool AdjustTaps(AdmittanceMatrix y)
    {
        if (!options.RegulateTaps || groups.Count == 0) return false;
        bool moved = false;
        foreach (int[] group in groups)
        {
            PuTap lead = Model.Taps[group[0]];
            int bus = lead.RegulatedBus!.Value;
            double v = nr.Magnitude[bus];
            double low = lead.VTarget - lead.BandPu / 2, high = lead.VTarget + lead.BandPu / 2;
            foreach (int k in group) AtLimit[k] = null;
            if (v >= low && v <= high) continue;
            double stepPu = Math.Abs(lead.PercentPerStep) / 100.0;
            // Clamped before the cast: a zero step would otherwise ask for more steps than an int holds.
            int wantedSteps = (int)Math.Clamp(Math.Round((lead.VTarget - v) / Math.Max(stepPu * v, 1e-9), MidpointRounding.AwayFromZero), -1e6, 1e6);
            if (wantedSteps == 0) wantedSteps = v < low ? 1 : -1;
            foreach (int k in group)
            {
                PuTap tap = Model.Taps[k];
                int direction = VoltageDirection(tap, bus);
                int delta = wantedSteps * direction;
                // A tap that has reversed twice is hunting across a band narrower than its step:
                // from then on it moves one step at a time and stops at the next reversal.
                if (reversals[k] >= 2) delta = Math.Sign(delta) == -Math.Sign(lastMove[k]) ? 0 : Math.Sign(delta);
                int target = (int)Math.Clamp((long)positions[k] + delta, tap.Min, tap.Max);
                if (target == positions[k])
                {
                    if (delta != 0) AtLimit[k] = delta > 0 ? TapLimit.Highest : TapLimit.Lowest;
                    continue;
                }
                int move = target - positions[k];
                if (lastMove[k] != 0 && Math.Sign(move) != Math.Sign(lastMove[k])) reversals[k]++;
                lastMove[k] = move;
                positions[k] = target;
                Model = Model.WithTapPosition(k, target);
                moved = true;
            }
        }
        if (moved) y.Refill(Model);
        return moved;
    }

    public int Position(int tap) => positions[tap];

    /// <summary>+1 when raising the position raises the regulated bus voltage, −1 when it lowers it.</summary>
    private int VoltageDirection(PuTap tap, int regulatedBus)
    {
        int ratioSign = tap.RatioAt(tap.Position + 1) > tap.RatioAt(tap.Position) ? 1 : -1;
        PuBranch branch = Model.Branches[tap.Branch];
        // The ratio sits at the From terminal: a larger ratio lowers the far side's voltage.
        return branch.From == regulatedBus ? ratioSign : -ratioSign;
    }
}
