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
/// Networks that only some figures need (the positive sequence at another equivalent frequency for the
/// DC component, the networks without motors for the steady-state current) are built on first use.
/// </summary>
public sealed class SequenceNetworks
{
    private readonly PerUnitModel model;
    private readonly PuBranch[] positiveBranches, negativeBranches;
    private readonly SourceAdmittances sources;
    private readonly AdmittanceOptions options;
    private readonly Dictionary<double, SequenceNetwork> atFrequency = [];
    private SequenceNetwork? positiveWithoutMotors, negativeWithoutMotors;

    private SequenceNetworks(PerUnitModel model, SequenceBranches branches, SourceAdmittances sources, AdmittanceOptions options,
        SequenceNetwork positive, SequenceNetwork negative, SequenceNetwork? zero, SequenceNetwork equivalentFrequency)
    {
        this.model = model;
        positiveBranches = branches.Positive;
        negativeBranches = branches.Negative;
        this.sources = sources;
        this.options = options;
        Positive = positive;
        Negative = negative;
        Zero = zero;
        EquivalentFrequency = equivalentFrequency;
        atFrequency[Faults.EquivalentFrequency.Ratio] = equivalentFrequency;
        ClockLag = branches.ClockLag;
        ZeroProblems = branches.ZeroProblems;
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

    /// <summary>Every generator with x''d and every motor in these networks, with its impedance there.</summary>
    public IReadOnlyList<FaultMachine> Machines => sources.Machines;

    /// <summary>True when motors feed these networks (maximum levels): the steady-state current then leaves them out.</summary>
    public bool HasMotors => sources.PositiveWithoutMotors is not null;

    /// <param name="voltagePu">Solved |V| per bus (load-flow method, loads as impedances); null for the IEC method.</param>
    /// <param name="generatorFactors">Power-station units: the factor replacing K_G, by source index.</param>
    /// <param name="transformerFactors">Power-station units: the factor replacing K_T, by branch index.</param>
    /// <param name="lineResistanceC">Minimum levels: the conductor temperature lines are taken at.</param>
    public static SequenceNetworks Build(PerUnitModel model, FaultMethod method, FaultLevel level, bool zeroRequired,
        double[]? voltagePu, List<string> notes, IReadOnlyDictionary<int, double>? generatorFactors = null,
        IReadOnlyDictionary<int, double>? transformerFactors = null, double? lineResistanceC = null)
    {
        const double k = Faults.EquivalentFrequency.Ratio;
        var branches = SequenceBranches.Build(model, method, zeroRequired, k, notes, transformerFactors, lineResistanceC);
        var sources = SourceAdmittances.Build(model, method, level, voltagePu, k, notes, generatorFactors);
        bool iec = method == FaultMethod.Iec60909;
        var options = iec
            ? new AdmittanceOptions { IncludeCharging = false, IncludeMagnetising = false, IncludeShunts = false }
            : AdmittanceOptions.LoadFlow;
        int m = model.Branches.Count;
        var none = new Complex[m];

        var positive = new SequenceNetwork(Sequence.Positive, model, branches.Positive, (Complex[])sources.Positive.Clone(), none, none, options);
        // The negative and equivalent-frequency networks have the positive sequence's pattern: one ordering serves all three.
        var negative = new SequenceNetwork(Sequence.Negative, model, branches.Negative, (Complex[])sources.Negative.Clone(), none, none, options, positive);
        var equivalent = new SequenceNetwork(Sequence.Positive, model with { Shunts = ShuntsAt(model, k) },
            branches.EquivalentFrequency, sources.EquivalentFrequency, none, none, options, positive);

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
        return new SequenceNetworks(model, branches, sources, options, positive, negative, zero, equivalent);
    }

    /// <summary>The positive sequence with its reactances at f_c/f = <paramref name="fcOverF"/> (method C), built once per ratio.</summary>
    public SequenceNetwork AtEquivalentFrequency(double fcOverF)
    {
        lock (atFrequency)
        {
            if (atFrequency.TryGetValue(fcOverF, out SequenceNetwork? network)) return network;
            var branches = positiveBranches.Select(b => SequenceBranches.AtFrequency(b, fcOverF)).ToArray();
            network = new SequenceNetwork(Sequence.Positive, model with { Shunts = ShuntsAt(model, fcOverF) }, branches,
                sources.EquivalentFrequencyAt(fcOverF), new Complex[branches.Length], new Complex[branches.Length], options, EquivalentFrequency);
            atFrequency[fcOverF] = network;
            return network;
        }
    }

    /// <summary>The positive sequence without the motors (the steady-state current); the positive sequence itself when none feeds it.</summary>
    public SequenceNetwork PositiveWithoutMotors => sources.PositiveWithoutMotors is { } y
        ? positiveWithoutMotors ??= new SequenceNetwork(Sequence.Positive, model, positiveBranches, (Complex[])y.Clone(),
            new Complex[positiveBranches.Length], new Complex[positiveBranches.Length], options, Positive)
        : Positive;

    /// <summary>The negative sequence without the motors; the negative sequence itself when none feeds it.</summary>
    public SequenceNetwork NegativeWithoutMotors => sources.NegativeWithoutMotors is { } y
        ? negativeWithoutMotors ??= new SequenceNetwork(Sequence.Negative, model, negativeBranches, (Complex[])y.Clone(),
            new Complex[negativeBranches.Length], new Complex[negativeBranches.Length], options, Negative)
        : Negative;

    private static List<PuShunt> ShuntsAt(PerUnitModel model, double fcOverF) => model.Shunts
        .Select(s =>
        {
            Complex y = Faults.EquivalentFrequency.Parallel(new Complex(s.G, s.B), fcOverF);
            return s with { G = y.Real, B = y.Imaginary };
        })
        .ToList();
}
