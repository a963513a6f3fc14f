// What each bus is asked to do in the load flow: its type, scheduled injections and voltage set point.
using System.Numerics;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.Core.LoadFlow;

/// <summary>
/// Per-bus schedule compiled from the sources and loads of a <see cref="PerUnitModel"/>. Arrays are
/// indexed by bus; the Q-limit control changes <see cref="Type"/> and <see cref="QGen"/> in place.
/// </summary>
internal sealed class BusSchedule
{
    public BusSchedule(PerUnitModel model)
    {
        int n = model.Buses.Count;
        Type = new BusType[n];
        PGen = new double[n];
        QGen = new double[n];
        VSet = new double[n];
        AngleSet = new double[n];
        QMin = new double[n];
        QMax = new double[n];
        constantPower = new Complex[n];
        constantCurrent = new Complex[n];
        constantImpedance = new Complex[n];
        HasSource = new bool[n];
        Array.Fill(VSet, 1.0);
        Array.Fill(QMin, double.NegativeInfinity);
        Array.Fill(QMax, double.PositiveInfinity);

        bool[] hasVoltageControl = new bool[n];
        foreach (PuSource s in model.Sources)
        {
            int i = s.Bus;
            HasSource[i] = true;
            switch (s.Mode)
            {
                case GeneratorMode.Slack:
                    if (Type[i] != BusType.Slack) { VSet[i] = s.VSet; AngleSet[i] = s.AngleRad; }
                    Type[i] = BusType.Slack;
                    PGen[i] += s.P;
                    QGen[i] += s.Q;
                    break;
                case GeneratorMode.Pv:
                    PGen[i] += s.P;
                    if (Type[i] == BusType.Pq)
                    {
                        Type[i] = BusType.Pv;
                        if (!hasVoltageControl[i]) VSet[i] = s.VSet;
                        QMin[i] = 0;
                        QMax[i] = 0;
                    }
                    if (Type[i] == BusType.Pv)
                    {
                        QMin[i] += s.QMin ?? double.NegativeInfinity;
                        QMax[i] += s.QMax ?? double.PositiveInfinity;
                    }
                    hasVoltageControl[i] = true;
                    break;
                default:
                    PGen[i] += s.P;
                    QGen[i] += s.Q;
                    break;
            }
        }
        foreach (PuLoad l in model.Loads)
        {
            // ZIP: S(V) = S0·(z·V² + i·V + p), the three shares splitting the value at 1 pu.
            var s0 = new Complex(l.P, l.Q);
            constantPower[l.Bus] += s0 * l.Zip.P;
            constantCurrent[l.Bus] += s0 * l.Zip.I;
            constantImpedance[l.Bus] += s0 * l.Zip.Z;
        }
    }

    public BusType[] Type { get; }
    public double[] PGen { get; }
    /// <summary>Scheduled reactive generation (PQ sources, and PV buses held at a limit).</summary>
    public double[] QGen { get; }
    public double[] VSet { get; }
    public double[] AngleSet { get; }
    public double[] QMin { get; }
    public double[] QMax { get; }
    public bool[] HasSource { get; }

    private readonly Complex[] constantPower;
    private readonly Complex[] constantCurrent;
    private readonly Complex[] constantImpedance;

    /// <summary>Load drawn at bus i at voltage magnitude v.</summary>
    public Complex LoadAt(int i, double v) => constantPower[i] + constantCurrent[i] * v + constantImpedance[i] * (v * v);

    /// <summary>dS_load/d|V| at bus i.</summary>
    public Complex LoadSlope(int i, double v) => constantCurrent[i] + constantImpedance[i] * (2 * v);

    /// <summary>Marks every bus of an island without a slack bus as dead (de-energised).</summary>
    public static int MarkDead(BusType[] type, int[] label)
    {
        var live = new HashSet<int>();
        for (int i = 0; i < type.Length; i++) if (type[i] == BusType.Slack) live.Add(label[i]);
        int dead = 0;
        for (int i = 0; i < type.Length; i++)
        {
            if (live.Contains(label[i])) continue;
            type[i] = BusType.Dead;
            dead++;
        }
        return dead;
    }
}
