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
/// values for the same branches with other ratios without allocating a new pattern, and
/// <see cref="TakeOut"/> zeroes the entries of branches taken out (an outage changes values, not the pattern).
/// </summary>
public sealed class AdmittanceMatrix
{
    private readonly int[] slotPositions;
    private readonly Complex[] slotValues;
    // Slot values of the model given at construction, and the branches taken out (null: none).
    private readonly Complex[] builtSlotValues;
    private bool[]? open;
    // For TakeOut: the slots each entry sums, the branches out now, and whether a Refill came since
    // the last TakeOut (then every entry is summed again).
    private int[]? slotsOfEntryStart, slotsOfEntry;
    private readonly List<int> lastOut = [];
    private bool refilled = true;

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
        builtSlotValues = (Complex[])slotValues.Clone();
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
        for (int k = 0; k < model.Branches.Count; k++)
        {
            if (open?[k] == true)
            {
                slot += 4;
                continue;
            }
            var y = BranchAdmittance.Of(model.Branches[k], Options.IncludeCharging, Options.IncludeMagnetising);
            slotValues[slot++] = y.Yff;
            slotValues[slot++] = y.Yft;
            slotValues[slot++] = y.Ytf;
            slotValues[slot++] = y.Ytt;
        }
        Matrix.Refill(slotPositions, slotValues);
        refilled = true;
    }

    /// <summary>
    /// Back to the values of the model given at construction, with <paramref name="branches"/> (indices
    /// into its branches) taken out: their entries stay in the pattern, at zero, and later
    /// <see cref="Refill"/>s keep them out until the next call. Each entry sums the same terms in the same
    /// order as a matrix built without those branches, so the values are the same to the last bit.
    /// Only the entries of the branches taken out now and last time are recomputed, unless a
    /// <see cref="Refill"/> came between.
    /// </summary>
    public void TakeOut(IReadOnlyList<int> branches)
    {
        int diagonal = DiagonalPositions.Length, count = (slotValues.Length - diagonal) / 4;
        open ??= new bool[count];
        if (refilled)
        {
            Array.Clear(open);
            foreach (int k in branches) open[k] = true;
            Array.Copy(builtSlotValues, slotValues, slotValues.Length);
            foreach (int k in branches) Array.Clear(slotValues, diagonal + 4 * k, 4);
            Matrix.Refill(slotPositions, slotValues);
            if (slotsOfEntry is null) MapSlotsOfEntries();
        }
        else
        {
            foreach (int k in lastOut)
            {
                open[k] = false;
                Array.Copy(builtSlotValues, diagonal + 4 * k, slotValues, diagonal + 4 * k, 4);
                RestoreEntriesOf(k);
            }
            foreach (int k in branches)
            {
                open[k] = true;
                Array.Clear(slotValues, diagonal + 4 * k, 4);
            }
            foreach (int k in branches) RestoreEntriesOf(k);
        }
        refilled = false;
        lastOut.Clear();
        lastOut.AddRange(branches);
    }

    // Which slots add into each entry, in slot order.
    private void MapSlotsOfEntries()
    {
        int nnz = Matrix.NonZeros;
        slotsOfEntryStart = new int[nnz + 1];
        foreach (int p in slotPositions) slotsOfEntryStart[p + 1]++;
        for (int p = 0; p < nnz; p++) slotsOfEntryStart[p + 1] += slotsOfEntryStart[p];
        slotsOfEntry = new int[slotPositions.Length];
        int[] next = slotsOfEntryStart[..nnz];
        for (int slot = 0; slot < slotPositions.Length; slot++) slotsOfEntry[next[slotPositions[slot]]++] = slot;
    }

    // The four entries of branch k summed again from the slots, in slot order as Refill sums them.
    private void RestoreEntriesOf(int k)
    {
        int first = DiagonalPositions.Length + 4 * k;
        for (int slot = first; slot < first + 4; slot++)
        {
            int p = slotPositions[slot];
            Matrix.Values[p] = SumOfEntry(p, slotValues);
        }
    }

    private Complex SumOfEntry(int p, Complex[] slots)
    {
        Complex sum = Complex.Zero;
        for (int t = slotsOfEntryStart![p]; t < slotsOfEntryStart[p + 1]; t++) sum += slots[slotsOfEntry![t]];
        return sum;
    }
}
