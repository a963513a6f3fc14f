// Polar Newton-Raphson on a sparse Jacobian with a fixed pattern, re-filled in place every iteration.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.Numerics;

namespace Study.Core.LoadFlow;

/// <summary>How one inner Newton-Raphson solve ended.</summary>
internal enum InnerOutcome
{
    Converged,
    IterationLimit,
    Diverged,
    Singular,
}

/// <summary>
/// The polar Newton-Raphson load flow (Tinney &amp; Hart, "Power flow solution by Newton's method",
/// IEEE Trans. PAS-86, 1967). Unknowns are the angle and magnitude of every live non-slack bus; a PV
/// bus keeps its magnitude row but as the equation ΔV = 0, so switching PV↔PQ at a reactive limit
/// changes values only, never the Jacobian pattern. The symbolic LU analysis is done once; each
/// iteration refactorises values in place and allocates nothing. A bus left without a source by an
/// outage (marked dead in the schedule after construction) keeps its two unknowns as the equations
/// Δθ = 0 and Δ|V| = 0, so an outage changes values only too.
/// </summary>
internal sealed class NewtonRaphson
{
    private readonly AdmittanceMatrix y;
    private readonly BusSchedule schedule;
    private readonly int n;
    private readonly int m;
    private readonly int[] order;      // k -> bus
    private readonly int[] position;   // bus -> k, or -1 for slack and dead buses
    private readonly CscMatrix<double> jacobian;
    // For each value position p of Y: where its four partial derivatives land in the Jacobian (-1: none).
    private readonly int[] dPdTheta, dPdV, dQdTheta, dQdV;
    private readonly int[] diagPTheta, diagPV, diagQTheta, diagQV;
    private readonly SparseLu<double> lu;
    private readonly Complex[] current;
    private readonly double[] step;
    private readonly double[] voltageRowScale;  // weight of each PV bus's ΔV = 0 row, 1 for PQ buses
    private bool factorised;
    private double[]? savedMagnitude, savedAngle;  // the state before a step on trial (ReuseFactors)
    private readonly BusType[] filledType;          // the bus types of the last Jacobian filled
    private readonly List<int> changedBuses = [];   // buses whose columns differ from the adopted template's (MarkChanged)
    private bool partialFirst;                      // the next factorisation may be partial (AdoptFactors)
    private int[]? factorColumns, changedColumns;
    private readonly int[] busStamp;                // marks of buses already refilled in one partial fill
    private int fillStamp;
    private readonly int[] changedMark;             // changedMark[bus] == changeStamp: in changedBuses
    private int changeStamp;

    /// <param name="symbolic">The analysis of this Jacobian pattern when one exists (another solver of the same model); null analyses it.</param>
    public NewtonRaphson(AdmittanceMatrix y, BusSchedule schedule, LuSymbolic? symbolic = null)
    {
        this.y = y;
        this.schedule = schedule;
        n = y.Size;
        position = new int[n];
        var live = new List<int>();
        for (int i = 0; i < n; i++)
        {
            bool unknown = schedule.Type[i] is BusType.Pq or BusType.Pv;
            position[i] = unknown ? live.Count : -1;
            if (unknown) live.Add(i);
        }
        order = live.ToArray();
        m = order.Length;
        Voltage = new Complex[n];
        Magnitude = new double[n];
        Angle = new double[n];
        Power = new Complex[n];
        current = new Complex[n];
        Mismatch = new double[2 * m];
        step = new double[2 * m];
        voltageRowScale = new double[m];

        CscMatrix<Complex> ybus = y.Matrix;
        int nnz = ybus.NonZeros;
        dPdTheta = new int[nnz];
        dPdV = new int[nnz];
        dQdTheta = new int[nnz];
        dQdV = new int[nnz];
        var builder = new TripletBuilder<double>(2 * m, 2 * m, 4 * nnz);
        var slots = new int[nnz];
        for (int j = 0; j < n; j++)
        {
            for (int p = ybus.ColPtr[j]; p < ybus.ColPtr[j + 1]; p++)
            {
                int i = ybus.RowIdx[p];
                int row = position[i], col = position[j];
                slots[p] = -1;
                if (row < 0 || col < 0) continue;
                slots[p] = builder.Add(row, col, 0);
                builder.Add(row, m + col, 0);
                builder.Add(m + row, col, 0);
                builder.Add(m + row, m + col, 0);
            }
        }
        jacobian = builder.ToCsc(out int[] where);
        for (int p = 0; p < nnz; p++)
        {
            int s = slots[p];
            dPdTheta[p] = s < 0 ? -1 : where[s];
            dPdV[p] = s < 0 ? -1 : where[s + 1];
            dQdTheta[p] = s < 0 ? -1 : where[s + 2];
            dQdV[p] = s < 0 ? -1 : where[s + 3];
        }
        diagPTheta = new int[m];
        diagPV = new int[m];
        diagQTheta = new int[m];
        diagQV = new int[m];
        for (int k = 0; k < m; k++)
        {
            int p = y.DiagonalPositions[order[k]];
            diagPTheta[k] = dPdTheta[p];
            diagPV[k] = dPdV[p];
            diagQTheta[k] = dQdTheta[p];
            diagQV[k] = dQdV[p];
        }
        // Minimum degree on the 2m-node pattern: on the generated grids it fills less than minimum
        // degree on the bus graph expanded to 2×2 blocks (BlockOrdering; DEVELOPERS.md, "Measured speed").
        lu = symbolic is null ? SparseLu<double>.Analyse(jacobian) : new SparseLu<double>(symbolic);
        filledType = new BusType[n];
        busStamp = new int[n];
        changedMark = new int[n];
    }

    /// <summary>The symbolic analysis of the Jacobian pattern, for other solvers of the same model.</summary>
    public LuSymbolic Symbolic => lu.Symbolic;

    /// <summary>
    /// Takes over the pivot sequence and factor patterns of another solver of the same model (whose
    /// analysis this one shares), so the next factorisation replays them with new values exactly as that
    /// solver would. With <see cref="ReuseFactors"/> the factors' numbers and the last Jacobian's row
    /// weights and bus types come too, so the next solve can start with a partial refactorisation.
    /// </summary>
    public void AdoptFactors(NewtonRaphson template)
    {
        factorised = template.factorised && lu.AdoptPivots(template.lu, ReuseFactors);
        changedBuses.Clear();
        changeStamp++;
        partialFirst = false;
        if (!factorised || !ReuseFactors || !lu.HasDiagonalPivots) return;
        // The template's last Jacobian, as factorised, stands for every column the changes below do not reach.
        Array.Copy(template.voltageRowScale, voltageRowScale, m);
        Array.Copy(template.filledType, filledType, n);
        partialFirst = true;
    }

    /// <summary>
    /// Marks a bus whose Jacobian columns differ from the adopted template's: a terminal of a branch
    /// taken out (buses whose type differs from the template's, a bus left dead say, are found without
    /// being marked). The first step of the next solve then refactorises only the columns of the
    /// factors that depend on them (partial refactorisation), the rest coming from the template.
    /// </summary>
    public void MarkChanged(int bus)
    {
        if (position[bus] < 0 || changedMark[bus] == changeStamp) return;
        changedMark[bus] = changeStamp;
        changedBuses.Add(bus);
    }

    /// <summary>Bus voltages (phasors), magnitudes and angles: the state, kept between solves for warm starts.</summary>
    public Complex[] Voltage { get; }
    public double[] Magnitude { get; }
    public double[] Angle { get; }

    /// <summary>Complex power injected into the network at each bus, S = V·conj(Y·V), after the last solve.</summary>
    public Complex[] Power { get; }

    /// <summary>Last mismatch vector: ΔP rows then ΔQ (or ΔV for PV buses) rows.</summary>
    public double[] Mismatch { get; }

    public int UnknownBuses => m;
    public int JacobianSize => 2 * m;
    public int JacobianNonZeros => jacobian.NonZeros;
    public int FactorNonZeros => lu.NonZerosLU;
    public int BusOfUnknown(int k) => order[k];

    /// <summary>Accumulated stage times, in Stopwatch ticks.</summary>
    public long JacobianTicks { get; private set; }
    public long FactorTicks { get; private set; }
    public long SolveTicks { get; private set; }

    public double MaxMismatch { get; private set; }
    public int WorstBus { get; private set; } = -1;
    public int SingularBus { get; private set; } = -1;

    /// <summary>
    /// Starts from another solver's state of the same model (a warm start matched bus for bus): what
    /// <see cref="LoadFlowSolver.InitialState"/> gives from that state, for this schedule's types —
    /// dead buses at zero, PV buses at their set magnitude with the state's angle, the rest as they are.
    /// </summary>
    public void StartFrom(NewtonRaphson source)
    {
        Array.Copy(source.Magnitude, Magnitude, n);
        Array.Copy(source.Angle, Angle, n);
        Array.Copy(source.Voltage, Voltage, n);
        BusType[] type = schedule.Type;
        for (int i = 0; i < n; i++)
        {
            if (type[i] == BusType.Dead) SetState(i, 0, 0);
            else if (type[i] == BusType.Pv && Magnitude[i] != schedule.VSet[i]) SetState(i, schedule.VSet[i], Angle[i]);
        }
    }

    public void SetState(int bus, double magnitude, double angle)
    {
        Magnitude[bus] = magnitude;
        Angle[bus] = angle;
        Voltage[bus] = Complex.FromPolarCoordinates(magnitude, angle);
    }

    /// <summary>
    /// When true, a step may use factors of a Jacobian from another state: right after
    /// <see cref="AdoptFactors"/>, the template's factors with only the columns of the changed buses
    /// (and what depends on them) refactorised; later, while the iterations contract fast, the factors
    /// of the last Jacobian of this solve (a chord step). Such a step is on trial: it is kept only when
    /// it cuts the largest mismatch at least <see cref="TrialContraction"/>-fold; otherwise the state
    /// goes back and a full Newton step is taken from it. Only full Newton steps count toward the
    /// iteration limit, so the solve never gives up sooner than plain Newton-Raphson would. The answer
    /// is a state within the same tolerance; only the path to it is cheaper when the state moves
    /// little, as in an outage solved from the intact solution.
    /// </summary>
    public bool ReuseFactors { get; set; }

    /// <summary>How much a step on other factors must cut the largest mismatch to be kept.</summary>
    public const double TrialContraction = 4;

    /// <summary>Runs Newton iterations from the current state; <paramref name="onIteration"/> sees each mismatch.</summary>
    public InnerOutcome Solve(double tolerance, int maxIterations, Action<double, int> onIteration, CancellationToken cancel, out int iterations)
    {
        iterations = 0;
        bool current = false;                     // the factors are of a Jacobian from this solve
        bool trial = false;                       // the last step used other factors and is on trial
        bool contracting = false;                 // the last step kept cut the mismatch TrialContraction-fold
        double before = double.PositiveInfinity;  // the largest mismatch before the last step
        while (true)
        {
            cancel.ThrowIfCancellationRequested();
            long t0 = System.Diagnostics.Stopwatch.GetTimestamp();
            ComputeMismatch();
            contracting = MaxMismatch * TrialContraction <= before;
            if (trial && !contracting)
            {
                RestoreState();
                ComputeMismatch();
                current = false;
            }
            trial = false;
            onIteration(MaxMismatch, WorstBus);
            if (!double.IsFinite(MaxMismatch) || MaxMismatch > 1e8) return InnerOutcome.Diverged;
            if (MaxMismatch < tolerance) return InnerOutcome.Converged;
            if (iterations >= maxIterations) return InnerOutcome.IterationLimit;
            before = MaxMismatch;
            long t2;
            if (ReuseFactors && partialFirst && RefactorPartially(ref t0))
            {
                trial = current = true;
                t2 = System.Diagnostics.Stopwatch.GetTimestamp();
                FactorTicks += t2 - t0;
            }
            else if (ReuseFactors && current && contracting)
            {
                trial = true;
                t2 = System.Diagnostics.Stopwatch.GetTimestamp();
                JacobianTicks += t2 - t0;
            }
            else
            {
                iterations++;
                FillJacobian();
                long t1 = System.Diagnostics.Stopwatch.GetTimestamp();
                JacobianTicks += t1 - t0;
                int singular;
                bool ok = factorised ? lu.TryRefactor(jacobian, out singular) : lu.TryFactor(jacobian, out singular);
                t2 = System.Diagnostics.Stopwatch.GetTimestamp();
                FactorTicks += t2 - t1;
                if (!ok)
                {
                    SingularBus = order[singular % m];
                    return InnerOutcome.Singular;
                }
                factorised = true;
                current = true;
            }
            partialFirst = false;
            if (trial) SaveState();
            for (int r = 0; r < m; r++) step[r] = -Mismatch[r];
            for (int k = 0; k < m; k++) step[m + k] = -Mismatch[m + k] * voltageRowScale[k];
            lu.Solve(step);
            SolveTicks += System.Diagnostics.Stopwatch.GetTimestamp() - t2;
            for (int k = 0; k < m; k++)
            {
                int i = order[k];
                if (schedule.Type[i] == BusType.Dead) continue;
                double vm = Magnitude[i] + step[m + k];
                // A Newton step that would reverse a voltage is cut back: magnitudes stay positive.
                if (vm <= 0.05 * Magnitude[i]) vm = 0.5 * Magnitude[i];
                SetState(i, vm, Angle[i] + step[k]);
            }
        }
    }

    // Fills the Jacobian columns of the marked buses and of every bus whose factor columns depend on
    // them, and refactorises those factor columns only. False when that cannot be done; the caller
    // then fills and refactorises the whole Jacobian.
    private bool RefactorPartially(ref long t0)
    {
        // A bus whose type differs from the template's changes its row: every column with an entry in it.
        for (int i = 0; i < n; i++)
        {
            if (position[i] < 0 || schedule.Type[i] == filledType[i]) continue;
            MarkChanged(i);
            for (int p = y.Matrix.ColPtr[i]; p < y.Matrix.ColPtr[i + 1]; p++) MarkChanged(y.Matrix.RowIdx[p]);
        }
        factorColumns ??= new int[2 * m];
        changedColumns ??= new int[2 * m];
        int changed = 0;
        foreach (int bus in changedBuses)
        {
            changedColumns[changed++] = position[bus];
            changedColumns[changed++] = m + position[bus];
        }
        int count = lu.ColumnsDependingOn(changedColumns.AsSpan(0, changed), factorColumns);
        // Both columns of each bus reached, so every entry of a filled column is current.
        int stamp = ++fillStamp;
        for (int t = 0; t < count; t++)
        {
            int bus = order[lu.ColumnOfA(factorColumns[t]) % m];
            if (busStamp[bus] == stamp) continue;
            busStamp[bus] = stamp;
            FillJacobianColumns(bus);
        }
        long t1 = System.Diagnostics.Stopwatch.GetTimestamp();
        JacobianTicks += t1 - t0;
        t0 = t1;
        return lu.TryRefactorColumns(jacobian, factorColumns.AsSpan(0, count));
    }

    private void SaveState()
    {
        savedMagnitude ??= new double[m];
        savedAngle ??= new double[m];
        for (int k = 0; k < m; k++)
        {
            savedMagnitude[k] = Magnitude[order[k]];
            savedAngle[k] = Angle[order[k]];
        }
    }

    private void RestoreState()
    {
        for (int k = 0; k < m; k++)
        {
            int i = order[k];
            if (schedule.Type[i] != BusType.Dead) SetState(i, savedMagnitude![k], savedAngle![k]);
        }
    }

    /// <summary>A copy of the Jacobian at the current state (for diagnosis: Matrix Market export).</summary>
    public CscMatrix<double> JacobianAtState()
    {
        ComputeMismatch();
        FillJacobian();
        return new CscMatrix<double>(jacobian.Rows, jacobian.Cols, (int[])jacobian.ColPtr.Clone(),
            (int[])jacobian.RowIdx.Clone(), (double[])jacobian.Values.Clone());
    }

    /// <summary>Computes S = V·conj(Y·V) and the mismatch against the schedule.</summary>
    public void ComputeMismatch()
    {
        y.Matrix.Multiply(Voltage, current);
        for (int i = 0; i < n; i++) Power[i] = Voltage[i] * Complex.Conjugate(current[i]);
        double worst = 0;
        int worstBus = order.Length > 0 ? order[0] : -1;
        BusType[] type = schedule.Type;
        for (int k = 0; k < m; k++)
        {
            int i = order[k];
            if (type[i] == BusType.Dead)
            {
                Mismatch[k] = Mismatch[m + k] = 0;
                continue;
            }
            Complex spec = new Complex(schedule.PGen[i], schedule.QGen[i]) - schedule.LoadAt(i, Magnitude[i]);
            double dp = Power[i].Real - spec.Real;
            Mismatch[k] = dp;
            double a = Math.Abs(dp);
            if (type[i] == BusType.Pq)
            {
                double dq = Power[i].Imaginary - spec.Imaginary;
                Mismatch[m + k] = dq;
                a = Math.Max(a, Math.Abs(dq));
            }
            else
            {
                Mismatch[m + k] = Magnitude[i] - schedule.VSet[i];
            }
            if (a > worst || double.IsNaN(a))
            {
                worst = double.IsNaN(a) ? double.NaN : a;
                worstBus = i;
                if (double.IsNaN(a)) break;
            }
        }
        MaxMismatch = worst;
        WorstBus = worstBus;
    }

    /// <summary>
    /// Fills ∂(P,Q)/∂(θ,|V|) in place from dS/dθ = j·diag(V)·conj(diag(I) − Y·diag(V)) and
    /// dS/d|V| = diag(V)·conj(Y·diag(V/|V|)) + conj(diag(I))·diag(V/|V|) (complex-form derivatives,
    /// as in Zimmerman, "AC power flows, generalized OPF costs and their derivatives", 2010).
    /// </summary>
    private void FillJacobian()
    {
        Array.Clear(jacobian.Values);
        for (int j = 0; j < n; j++)
            if (position[j] >= 0) FillBus(j);
        Array.Copy(schedule.Type, filledType, n);
    }

    // Refills the two Jacobian columns of one bus (θ and |V|), which no other bus writes to.
    private void FillJacobianColumns(int bus)
    {
        int k = position[bus];
        int[] cp = jacobian.ColPtr;
        Array.Clear(jacobian.Values, cp[k], cp[k + 1] - cp[k]);
        Array.Clear(jacobian.Values, cp[m + k], cp[m + k + 1] - cp[m + k]);
        FillBus(bus);
        filledType[bus] = schedule.Type[bus];
    }

    // Adds the entries of bus j's two columns into cleared storage: the terms of column j of Y, then
    // the diagonal's own terms.
    private void FillBus(int j)
    {
        double[] jx = jacobian.Values;
        CscMatrix<Complex> ybus = y.Matrix;
        int[] colPtr = ybus.ColPtr, rowIdx = ybus.RowIdx;
        Complex[] yx = ybus.Values;
        Complex[] v = Voltage;
        double[] vm = Magnitude;
        BusType[] type = schedule.Type;
        int k = position[j];
        if (type[j] == BusType.Dead)
        {
            // Δθ = 0 and Δ|V| = 0: the bus stays at zero, apart from the rest.
            voltageRowScale[k] = 1.0;
            jx[diagPTheta[k]] = 1.0;
            jx[diagQV[k]] = 1.0;
            return;
        }
        Complex vj = v[j];
        double invVmj = 1.0 / vm[j];
        for (int p = colPtr[j]; p < colPtr[j + 1]; p++)
        {
            int pt = dPdTheta[p];
            if (pt < 0) continue;
            int i = rowIdx[p];
            if (type[i] == BusType.Dead) continue;
            Complex a = v[i] * Complex.Conjugate(yx[p] * vj);
            // dS_i/dθ_j = −j·a, dS_i/d|V_j| = a/|V_j|
            jx[pt] += a.Imaginary;
            jx[dPdV[p]] += a.Real * invVmj;
            if (type[i] == BusType.Pq)
            {
                jx[dQdTheta[p]] -= a.Real;
                jx[dQdV[p]] += a.Imaginary * invVmj;
            }
        }
        Complex s = Power[j];
        double invVm = 1.0 / vm[j];
        Complex slope = schedule.LoadSlope(j, vm[j]);
        jx[diagPTheta[k]] -= s.Imaginary;
        jx[diagPV[k]] += s.Real * invVm + slope.Real;
        if (type[j] == BusType.Pq)
        {
            voltageRowScale[k] = 1.0;
            jx[diagQTheta[k]] += s.Real;
            jx[diagQV[k]] += s.Imaginary * invVm + slope.Imaginary;
        }
        else
        {
            // ΔV = 0 weighted by |Y_kk|: the same step, but a diagonal as large as the rest of its
            // column, so threshold pivoting keeps it and the factor keeps AMD's fill.
            double scale = Complex.Abs(yx[y.DiagonalPositions[j]]);
            scale = scale > 0 && double.IsFinite(scale) ? scale : 1.0;
            voltageRowScale[k] = scale;
            jx[diagQV[k]] = scale;
        }
    }
}
