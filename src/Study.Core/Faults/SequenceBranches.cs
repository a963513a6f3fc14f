// The branches of each sequence network: corrected impedances, rated ratios, zero-sequence paths by vector group.
using System.Numerics;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// Per model branch (aligned with model.Branches): its positive-, negative-sequence and
/// equivalent-frequency π branches, its zero-sequence path, and the clock lag (in 30° steps) of its
/// To end behind its From end, which the phase voltages across a transformer need.
/// </summary>
internal sealed class SequenceBranches
{
    public required PuBranch[] Positive { get; init; }
    public required PuBranch[] Negative { get; init; }
    /// <summary>Positive sequence with every reactance at f_c/f (IEC 60909-0 §8.1.3 method C).</summary>
    public required PuBranch[] EquivalentFrequency { get; init; }
    /// <summary>Null when the zero sequence was not built: some element lacks the data (see <see cref="ZeroProblems"/>).</summary>
    public ZeroSequencePath[]? Zero { get; init; }
    /// <summary>Every element whose zero-sequence data is missing or unreadable, one problem each, in branch order.</summary>
    public required IReadOnlyList<InputException> ZeroProblems { get; init; }
    public required int[] ClockLag { get; init; }

    /// <param name="zeroRequired">
    /// True: missing zero-sequence data is an input error (the first problem is thrown); false: the
    /// zero sequence is left out and <see cref="ZeroProblems"/> lists every element that lacks it.
    /// </param>
    /// <param name="transformerFactors">Power-station units: the factor that replaces K_T, by branch index.</param>
    /// <param name="lineResistanceC">Minimum levels: lines at this conductor temperature (their data at 20 °C); null to take the data as given.</param>
    public static SequenceBranches Build(PerUnitModel model, FaultMethod method, bool zeroRequired, double fcOverF, List<string> notes,
        IReadOnlyDictionary<int, double>? transformerFactors = null, double? lineResistanceC = null)
    {
        var kThree = new Dictionary<string, (double Hv, double Mv, double Lv)>();
        bool iec = method == FaultMethod.Iec60909;
        int m = model.Branches.Count;
        var pos = new PuBranch[m];
        var neg = new PuBranch[m];
        var eqf = new PuBranch[m];
        var lag = new int[m];
        var zero = new ZeroSequencePath[m];
        var zeroProblems = new List<InputException>();
        // Earthing notes concern the zero sequence: they are kept only when it is built.
        var zeroNotes = new List<string>();

        for (int k = 0; k < m; k++)
        {
            PuBranch b = model.Branches[k];
            // IEC 60909 takes transformers at their rated ratio, i.e. the tap at its neutral position (from memory).
            double ratio = iec && b.Tap is int tap ? model.Taps[tap].RatioAt(0) : b.Ratio;
            double kT = 1.0;
            VectorGroup? group = null;
            if (b.Kind == BranchKind.Transformer)
            {
                if (iec && transformerFactors is not null && transformerFactors.TryGetValue(k, out double unit))
                    kT = unit;
                else if (iec)
                {
                    double? corrected = ImpedanceCorrection.TwoWinding(b.Rating, model.Buses[b.To].BaseKv);
                    if (corrected is double value) kT = value;
                    else notes.Add($"{b.Id}: per-unit data without a rating: K_T not applied");
                }
                group = GroupOf(b, threeWinding: false, zeroProblems);
                if (group is not null) lag[k] = group.LvClock;
            }
            else if (b.Kind == BranchKind.ThreeWindingTransformer && b.ThreeWindingRating is { } rating)
            {
                if (iec && !kThree.ContainsKey(b.Id)) kThree[b.Id] = ImpedanceCorrection.ThreeWinding(rating);
                if (iec)
                {
                    var s = kThree[b.Id];
                    kT = b.Winding == "hv" ? s.Hv : b.Winding == "mv" ? s.Mv : s.Lv;
                }
                group = GroupOf(b, threeWinding: true, zeroProblems);
                // The star point is at the hv reference, so it leads the winding's terminal by that winding's clock.
                if (group is not null) lag[k] = -(b.Winding == "mv" ? group.MvClock : b.Winding == "lv" ? group.LvClock : 0);
            }

            // R_L = [1 + α·(θ_e − 20 °C)]·R_L20 for minimum levels (IEC 60909-0, from memory; DEVELOPERS.md, Algorithms).
            double rFactor = lineResistanceC is double theta && b.ResistanceCoefficient is double alpha
                ? ConductorResistance.Factor(alpha, theta) : 1.0;
            if (rFactor != 1.0) b = b with { Z = new Complex(b.Z.Real * rFactor, b.Z.Imaginary), Z0 = b.Z0 is Complex l0 ? new Complex(l0.Real * rFactor, l0.Imaginary) : null };
            // The vector group's displacement enters through the clock lag of the phase voltages, not the networks.
            pos[k] = b with { Z = b.Z * kT, Ratio = ratio, ShiftRad = b.ShiftRad - b.GroupShiftRad, GroupShiftRad = 0 };
            neg[k] = pos[k] with { ShiftRad = -pos[k].ShiftRad };
            eqf[k] = AtFrequency(pos[k], fcOverF);
            zero[k] = ZeroPath(model, pos[k], b, kT, group, zeroNotes, zeroProblems);
        }
        if (zeroProblems.Count == 0) notes.AddRange(zeroNotes);

        if (lineResistanceC is double c && model.Branches.Any(b => b.ResistanceCoefficient is not null))
            notes.Add(FormattableString.Invariant($"minimum levels: line resistance at {c:0.#} °C, the end-of-fault temperature (the data taken at 20 °C)"));
        if (zeroProblems.Count > 0 && zeroRequired) throw zeroProblems[0];
        return new SequenceBranches
        {
            Positive = pos, Negative = neg, EquivalentFrequency = eqf, ClockLag = lag,
            Zero = zeroProblems.Count == 0 ? zero : null, ZeroProblems = zeroProblems,
        };
    }

    /// <summary>A positive-sequence branch with its reactances at f_c/f (IEC 60909-0 §8.1.3 method C): the charging scales with f, the magnetising inversely.</summary>
    public static PuBranch AtFrequency(PuBranch positive, double fcOverF) => positive with
    {
        Z = Faults.EquivalentFrequency.Series(positive.Z, fcOverF),
        B = positive.B * fcOverF,
        MagnetisingY = Faults.EquivalentFrequency.Parallel(positive.MagnetisingY, fcOverF),
    };

    /// <summary>The vector group, or null with a problem added (once per element: a three-winding bank has three star branches).</summary>
    private static VectorGroup? GroupOf(PuBranch b, bool threeWinding, List<InputException> problems)
    {
        PuWindings? w = b.Windings;
        InputException? problem = null;
        if (w?.GroupText is null)
            problem = new InputException(
                $"transformer {b.Id} has no vector group: an earth-fault study needs it to decide the zero-sequence circuit (e.g. \"vectorGroup\": \"{(threeWinding ? "YNyn0d1" : "Dyn11")}\")",
                elementId: b.Id);
        else if (w.Group is null)
            problem = new InputException(w.GroupProblem ?? $"vector group '{w.GroupText}' cannot be read", elementId: b.Id);
        if (problem is not null && !problems.Any(p => p.ElementId == b.Id)) problems.Add(problem);
        return w?.Group;
    }

    private static ZeroSequencePath ZeroPath(PerUnitModel model, PuBranch corrected, PuBranch b, double kT, VectorGroup? group,
        List<string> notes, List<InputException> problems)
    {
        switch (b.Kind)
        {
            case BranchKind.Line:
                if (b.Z0 is Complex z0Line) return ZeroSequencePath.Line(corrected, z0Line);
                problems.Add(new InputException(
                    $"line {b.Id} has no zero-sequence data (z0): an earth-fault study needs it; give z0 with per, r and x", elementId: b.Id));
                return ZeroSequencePath.Open;
            case BranchKind.Transformer when group is not null:
            {
                PuWindings w = b.Windings!;
                Complex z0 = (b.Z0 ?? b.Z) * kT;
                Complex? hv = Neutral(b.Id, "hv", group.Hv, w.HvNeutral, notes);
                Complex? lv = Neutral(b.Id, "lv", group.Lv, w.LvNeutral, notes);
                // A bank of parallel units has one neutral impedance per unit: the bank's is Z_N/units (DEVELOPERS.md, Per-unit rules).
                if (b.Units > 1)
                {
                    hv /= b.Units;
                    lv /= b.Units;
                }
                return ZeroSequencePath.TwoWinding(corrected, z0, group, hv, lv);
            }
            case BranchKind.ThreeWindingTransformer when group is not null:
            {
                PuWindings w = b.Windings!;
                var (connection, earthing) = b.Winding switch
                {
                    "hv" => (group.Hv, w.HvNeutral),
                    "mv" => (group.Mv!.Value, w.MvNeutral),
                    _ => (group.Lv, w.LvNeutral),
                };
                Complex? zn = Neutral(b.Id, b.Winding ?? "", connection, earthing, notes);
                return ZeroSequencePath.Winding(corrected, (b.Z0 ?? b.Z) * kT, connection, zn);
            }
            default:
                return ZeroSequencePath.Open;
        }
    }

    /// <summary>
    /// Neutral impedance in pu of the terminal bus base, or null when the winding is not earthed: no N in
    /// the vector group, or "grounded": false. An N winding without neutral data is taken as solidly earthed.
    /// </summary>
    private static Complex? Neutral(string id, string winding, WindingConnection connection, PuNeutral earthing, List<string> notes)
    {
        if (connection is not (WindingConnection.StarNeutral or WindingConnection.ZigzagNeutral)) return null;
        if (!earthing.Stated)
        {
            notes.Add($"{id}: {winding} neutral has no earthing data: taken as solidly earthed");
            return Complex.Zero;
        }
        return earthing.Earthed ? earthing.ZPu : null;
    }
}
