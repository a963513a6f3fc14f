// One sequence network assembled and factorised once: Z-bus columns by one solve per faulted bus.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.LoadFlow;
using Study.Core.Numerics;
using Study.Core.Units;

namespace Study.Core.Faults;

public enum Sequence
{
    Positive,
    Negative,
    Zero,
}

/// <summary>
/// A sequence admittance matrix Y_s, assembled by the one admittance builder
/// (<see cref="AdmittanceMatrix"/>) from the branches that carry this sequence plus per-bus source and
/// earthing admittances, and factorised once by the sparse LU. Column k of Z_s = Y_s⁻¹ comes from one
/// solve with the unit vector e_k, so an all-bus scan costs one factorisation and n solves — never a
/// dense inverse. A bus whose part of the network reaches no source or earth is "not fed": its
/// Thevenin impedance is infinite (an open circuit) and its row is the identity, keeping Y_s regular.
/// </summary>
public sealed class SequenceNetwork
{
    private readonly SparseLu<Complex> lu;
    private readonly bool[] fed;
    private readonly int[] island;
    private readonly BranchAdmittance[] twoPorts;
    private Complex[] scratch = new Complex[16];

    /// <param name="model">The model whose buses are used; its branches are replaced by <paramref name="branches"/>.</param>
    /// <param name="branches">Every branch of the model for this sequence, aligned with model.Branches; null where it carries nothing in series.</param>
    /// <param name="earth">Per-bus admittance to the reference (sources, earthing, loads as impedances); overwritten.</param>
    /// <param name="samePattern">A network whose symbolic analysis to reuse when its matrix has this one's pattern (the
    /// same network at another frequency, or without some sources): the ordering is done once.</param>
    internal SequenceNetwork(Sequence sequence, PerUnitModel model, IReadOnlyList<PuBranch?> branches, Complex[] earth,
        Complex[] earthAtFrom, Complex[] earthAtTo, AdmittanceOptions options, SequenceNetwork? samePattern = null)
    {
        Sequence = sequence;
        int n = model.Buses.Count;
        var series = new List<PuBranch>();
        foreach (PuBranch? b in branches) if (b is not null) series.Add(b);
        var seriesModel = model with { Branches = series };
        island = Islands.Label(seriesModel);
        fed = FedBuses(seriesModel, island, earth, options);
        for (int i = 0; i < n; i++) if (!fed[i]) earth[i] += Complex.One;

        // Branches inside an unfed part carry no current; leaving them out makes those rows the identity.
        var live = new List<PuBranch>(series.Count);
        foreach (PuBranch b in series) if (fed[b.From]) live.Add(b);
        Admittance = new AdmittanceMatrix(model with { Branches = live }, options, earth);
        lu = samePattern is not null && SamePattern(samePattern.Admittance.Matrix, Admittance.Matrix)
            ? new SparseLu<Complex>(samePattern.lu.Symbolic)
            : SparseLu<Complex>.Analyse(Admittance.Matrix);
        lu.Factor(Admittance.Matrix);

        twoPorts = new BranchAdmittance[branches.Count];
        for (int k = 0; k < branches.Count; k++)
        {
            PuBranch? b = branches[k];
            PuBranch original = model.Branches[k];
            if (!fed[original.From] && !fed[original.To]) continue;
            BranchAdmittance y = b is not null && fed[b.From]
                ? BranchAdmittance.Of(b, options.IncludeCharging, options.IncludeMagnetising)
                : default;
            twoPorts[k] = new BranchAdmittance(y.Yff + earthAtFrom[k], y.Yft, y.Ytf, y.Ytt + earthAtTo[k]);
        }
    }

    public Sequence Sequence { get; }

    /// <summary>Y_s as assembled (with the identity rows of unfed buses).</summary>
    public AdmittanceMatrix Admittance { get; }

    public int Size => fed.Length;

    /// <summary>True when bus i reaches a source (positive, negative) or earth (zero) in this sequence.</summary>
    public bool IsFed(int bus) => fed[bus];

    /// <summary>True when two buses are joined by this sequence's series branches (one island of the sequence network).</summary>
    public bool Joined(int a, int b) => island[a] == island[b];

    /// <summary>
    /// The two-port of model branch k in this sequence, including a transformer's earthing at either
    /// end (zero sequence), so that I_from = Yff·V_from + Yft·V_to gives its current at the From end.
    /// </summary>
    public BranchAdmittance TwoPort(int branch) => twoPorts[branch];

    /// <summary>
    /// Entries rows[t] of column k of Z_s into column[rows[t]], other entries untouched: two sparse
    /// triangular solves per row instead of a full solve (<see cref="SparseLu{T}.InverseEntries"/>).
    /// </summary>
    public void Entries(int bus, ReadOnlySpan<int> rows, Span<Complex> column)
    {
        if (scratch.Length < rows.Length) scratch = new Complex[Math.Max(rows.Length, 2 * scratch.Length)];
        Span<Complex> values = scratch.AsSpan(0, rows.Length);
        lu.InverseEntries(bus, rows, values);
        for (int t = 0; t < rows.Length; t++) column[rows[t]] = values[t];
    }

    /// <summary>Column k of Z_s into <paramref name="column"/> (n entries): Y_s·z = e_k.</summary>
    public void Column(int bus, Span<Complex> column)
    {
        column.Clear();
        column[bus] = Complex.One;
        lu.Solve(column);
    }

    private static bool SamePattern(CscMatrix<Complex> a, CscMatrix<Complex> b) =>
        a.Rows == b.Rows && a.ColPtr.AsSpan().SequenceEqual(b.ColPtr) && a.RowIdx.AsSpan(0, a.NonZeros).SequenceEqual(b.RowIdx.AsSpan(0, b.NonZeros));

    // A bus is fed when its island (over this sequence's series branches) holds any admittance to the reference.
    private static bool[] FedBuses(PerUnitModel seriesModel, int[] island, Complex[] earth, AdmittanceOptions options)
    {
        int n = seriesModel.Buses.Count;
        var toEarth = new bool[n];
        for (int i = 0; i < n; i++) toEarth[i] = earth[i] != Complex.Zero;
        if (options.IncludeShunts)
            foreach (PuShunt s in seriesModel.Shunts) toEarth[s.Bus] |= s.G != 0 || s.B != 0;
        foreach (PuBranch b in seriesModel.Branches)
        {
            if (options.IncludeCharging && b.B != 0) toEarth[b.From] = toEarth[b.To] = true;
            if (options.IncludeMagnetising && b.MagnetisingY != Complex.Zero) toEarth[b.From] = true;
        }
        var fedIsland = new bool[n];
        for (int i = 0; i < n; i++) if (toEarth[i]) fedIsland[island[i]] = true;
        var fed = new bool[n];
        for (int i = 0; i < n; i++) fed[i] = fedIsland[island[i]];
        return fed;
    }
}
