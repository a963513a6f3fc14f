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
/// iteration refactorises values in place and allocates nothing.
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

    public NewtonRaphson(AdmittanceMatrix y, BusSchedule schedule)
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
        lu = SparseLu<double>.Analyse(jacobian);
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

    public void SetState(int bus, double magnitude, double angle)
    {
        Magnitude[bus] = magnitude;
        Angle[bus] = angle;
        Voltage[bus] = Complex.FromPolarCoordinates(magnitude, angle);
    }

    /// <summary>Runs Newton iterations from the current state; <paramref name="onIteration"/> sees each mismatch.</summary>
    public InnerOutcome Solve(double tolerance, int maxIterations, Action<double, int> onIteration, CancellationToken cancel, out int iterations)
    {
        iterations = 0;
        while (true)
        {
            cancel.ThrowIfCancellationRequested();
            long t0 = System.Diagnostics.Stopwatch.GetTimestamp();
            ComputeMismatch();
            onIteration(MaxMismatch, WorstBus);
            if (!double.IsFinite(MaxMismatch) || MaxMismatch > 1e8) return InnerOutcome.Diverged;
            if (MaxMismatch < tolerance) return InnerOutcome.Converged;
            if (iterations >= maxIterations) return InnerOutcome.IterationLimit;
            iterations++;
            FillJacobian();
            long t1 = System.Diagnostics.Stopwatch.GetTimestamp();
            JacobianTicks += t1 - t0;
            int singular;
            bool ok = factorised ? lu.TryRefactor(jacobian, out singular) : lu.TryFactor(jacobian, out singular);
            long t2 = System.Diagnostics.Stopwatch.GetTimestamp();
            FactorTicks += t2 - t1;
            if (!ok)
            {
                SingularBus = order[singular % m];
                return InnerOutcome.Singular;
            }
            factorised = true;
            for (int r = 0; r < m; r++) step[r] = -Mismatch[r];
            for (int k = 0; k < m; k++) step[m + k] = -Mismatch[m + k] * voltageRowScale[k];
            lu.Solve(step);
            SolveTicks += System.Diagnostics.Stopwatch.GetTimestamp() - t2;
            for (int k = 0; k < m; k++)
            {
                int i = order[k];
                double vm = Magnitude[i] + step[m + k];
                // A Newton step that would reverse a voltage is cut back: magnitudes stay positive.
                if (vm <= 0.05 * Magnitude[i]) vm = 0.5 * Magnitude[i];
                SetState(i, vm, Angle[i] + step[k]);
            }
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
        double[] jx = jacobian.Values;
        Array.Clear(jx);
        CscMatrix<Complex> ybus = y.Matrix;
        int[] colPtr = ybus.ColPtr, rowIdx = ybus.RowIdx;
        Complex[] yx = ybus.Values;
        Complex[] v = Voltage;
        double[] vm = Magnitude;
        BusType[] type = schedule.Type;
        for (int j = 0; j < n; j++)
        {
            if (position[j] < 0) continue;
            Complex vj = v[j];
            double invVmj = 1.0 / vm[j];
            for (int p = colPtr[j]; p < colPtr[j + 1]; p++)
            {
                int pt = dPdTheta[p];
                if (pt < 0) continue;
                int i = rowIdx[p];
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
        }
        for (int k = 0; k < m; k++)
        {
            int i = order[k];
            Complex s = Power[i];
            double invVm = 1.0 / vm[i];
            Complex slope = schedule.LoadSlope(i, vm[i]);
            jx[diagPTheta[k]] -= s.Imaginary;
            jx[diagPV[k]] += s.Real * invVm + slope.Real;
            if (type[i] == BusType.Pq)
            {
                voltageRowScale[k] = 1.0;
                jx[diagQTheta[k]] += s.Real;
                jx[diagQV[k]] += s.Imaginary * invVm + slope.Imaginary;
            }
            else
            {
                // ΔV = 0 weighted by |Y_kk|: the same step, but a diagonal as large as the rest of its
                // column, so threshold pivoting keeps it and the factor keeps AMD's fill.
                double scale = Complex.Abs(yx[y.DiagonalPositions[i]]);
                scale = scale > 0 && double.IsFinite(scale) ? scale : 1.0;
                voltageRowScale[k] = scale;
                jx[diagQV[k]] = scale;
            }
        }
    }
}
