// Builds the positive, negative, zero and equivalent-frequency networks of one model for one fault study.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.LoadFlow;
using Study.Core.Units;

namespace Study.Core.Faults;

/// <summary>
/// The sequence networks a fault study solves, each factorised once. IEC method: no charging,
/// magnetising, shunts or loads (IEC 60909-0 §4.3.1, from memory); load-flow method: the load
/// flow's own network plus loads as impedances (zero sequence: line charging B0 where given).
/// </summary>
public sealed class SequenceNetworks
{
    private SequenceNetworks(SequenceNetwork positive, SequenceNetwork negative, SequenceNetwork? zero,
        SequenceNetwork equivalentFrequency, int[] clockLag, IReadOnlyList<Model.InputException> zeroProblems)
    {
        ZeroProblems = zeroProblems;
        Positive = positive;
        Negative = negative;
        Zero = zero;
        EquivalentFrequency = equivalentFrequency;
        ClockLag = clockLag;
    }

    public SequenceNetwork Positive { get; }
    public SequenceNetwork Negative { get; }
    /// <summary>Null when the zero-sequence data is incomplete (<see cref="ZeroProblems"/> says where).</summary>
    public SequenceNetwork? Zero { get; }
    /// <summary>Each element whose zero-sequence data is missing or unreadable; empty when <see cref="Zero"/> was built.</summary>
    public IReadOnlyList<Model.InputException> ZeroProblems { get; }
    /// <summary>Positive sequence at f_c for κ (IEC 60909-0 §8.1.3 method C).</summary>
    public SequenceNetwork EquivalentFrequency { get; }
    /// <summary>Per model branch: clock lag of its To end behind its From end, in 30° steps.</summary>
    public IReadOnlyList<int> ClockLag { get; }

    /// <param name="voltagePu">Solved |V| per bus (load-flow method, loads as impedances); null for the IEC method.</param>
    public static SequenceNetworks Build(PerUnitModel model, FaultMethod method, FaultLevel level, bool zeroRequired,
        double[]? voltagePu, List<string> notes)
    {
        const double k = Faults.EquivalentFrequency.Ratio;
        var branches = SequenceBranches.Build(model, method, zeroRequired, k, notes);
        var sources = SourceAdmittances.Build(model, method, level, voltagePu, k, notes);
        bool iec = method == FaultMethod.Iec60909;
        var options = iec
            ? new AdmittanceOptions { IncludeCharging = false, IncludeMagnetising = false, IncludeShunts = false }
            : AdmittanceOptions.LoadFlow;
        int m = model.Branches.Count;
        var none = new Complex[m];

        var positive = new SequenceNetwork(Sequence.Positive, model, branches.Positive, sources.Positive, none, none, options);
        var negative = new SequenceNetwork(Sequence.Negative, model, branches.Negative, sources.Negative, none, none, options);
        var scaledShunts = model.Shunts
            .Select(s =>
            {
                Complex y = Faults.EquivalentFrequency.Parallel(new Complex(s.G, s.B), k);
                return s with { G = y.Real, B = y.Imaginary };
            })
            .ToList();
        var equivalent = new SequenceNetwork(Sequence.Positive, model with { Shunts = scaledShunts },
            branches.EquivalentFrequency, sources.EquivalentFrequency, none, none, options);

        SequenceNetwork? zero = null;
        if (branches.Zero is { } paths)
        {
            var series = new PuBranch?[m];
            var atFrom = new Complex[m];
            var atTo = new Complex[m];
            Complex[] earth = sources.Zero;
            for (int i = 0; i < m; i++)
            {
                series[i] = paths[i].Series;
                atFrom[i] = paths[i].EarthAtFrom;
                atTo[i] = paths[i].EarthAtTo;
                earth[model.Branches[i].From] += atFrom[i];
                earth[model.Branches[i].To] += atTo[i];
            }
            var zeroOptions = new AdmittanceOptions { IncludeCharging = !iec, IncludeMagnetising = false, IncludeShunts = false };
            zero = new SequenceNetwork(Sequence.Zero, model, series, earth, atFrom, atTo, zeroOptions);
        }
        return new SequenceNetworks(positive, negative, zero, equivalent, branches.ClockLag, branches.ZeroProblems);
    }
}
