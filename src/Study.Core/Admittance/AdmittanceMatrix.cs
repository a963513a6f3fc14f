// The bus admittance matrix Y (complex, sparse), built once per pattern and re-filled when taps move.
using System.Numerics;
using Study.Core.Numerics;
using Study.Core.Units;

namespace Study.Core.Admittance;

/// <summary>What goes into Y besides the branch series admittances.</summary>
public sealed record AdmittanceOptions
{
    public static AdmittanceOptions LoadFlow { get; } = new();

    public bool IncludeCharging { get; init; } = true;
    public bool IncludeMagnetising { get; init; } = true;
    public bool IncludeShunts { get; init; } = true;
}

/// <summary>
/// Y = Σ branch two-ports + shunts, in compressed columns with an explicit diagonal for every bus.
/// The one admittance builder used by the load flow and (with other options and extra diagonal
/// terms) by the fault solver. The pattern is fixed at construction; <see cref="Refill"/> recomputes
/// values for the same branches with other ratios without allocating a new pattern.
/// </summary>
public sealed class AdmittanceMatrix
{
    private readonly int[] slotPositions;
    private readonly Complex[] slotValues;

    public AdmittanceMatrix(PerUnitModel model, AdmittanceOptions? options = null, IReadOnlyList<Complex>? extraDiagonal = null)
    {
        Options = options ?? AdmittanceOptions.LoadFlow;
        int n = model.Buses.Count;
        var builder = new TripletBuilder<Complex>(n, n, n + 4 * model.Branches.Count);
        for (int i = 0; i < n; i++) builder.Add(i, i, Complex.Zero);
        foreach (PuBranch b in model.Branches)
        {
            builder.Add(b.From, b.From, Complex.Zero);
            builder.Add(b.From, b.To, Complex.Zero);
            builder.Add(b.To, b.From, Complex.Zero);
            builder.Add(b.To, b.To, Complex.Zero);
        }
        Matrix = builder.ToCsc(out slotPositions);
        slotValues = new Complex[builder.Count];
        DiagonalPositions = new int[n];
        for (int i = 0; i < n; i++) DiagonalPositions[i] = slotPositions[i];
        Refill(model, extraDiagonal);
    }

    public AdmittanceOptions Options { get; }
    public CscMatrix<Complex> Matrix { get; }
    public int Size => Matrix.Rows;

    /// <summary>Index into <c>Matrix.Values</c> of each bus's diagonal entry.</summary>
    public int[] DiagonalPositions { get; }

    /// <summary>Recomputes every value from the model (same buses and branches, e.g. new tap ratios).</summary>
    public void Refill(PerUnitModel model, IReadOnlyList<Complex>? extraDiagonal = null)
    {
        int n = model.Buses.Count;
        Array.Clear(slotValues);
        foreach (PuShunt s in Options.IncludeShunts ? model.Shunts : [])
            slotValues[s.Bus] += new Complex(s.G, s.B);
        if (extraDiagonal is not null)
            for (int i = 0; i < n; i++) slotValues[i] += extraDiagonal[i];
        int slot = n;
        foreach (PuBranch b in model.Branches)
        {
            var y = BranchAdmittance.Of(b, Options.IncludeCharging, Options.IncludeMagnetising);
            slotValues[slot++] = y.Yff;
            slotValues[slot++] = y.Yft;
            slotValues[slot++] = y.Ytf;
            slotValues[slot++] = y.Ytt;
        }
        Matrix.Refill(slotPositions, slotValues);
    }
}
