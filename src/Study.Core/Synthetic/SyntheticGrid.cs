// Synthetic transmission-like networks of any size, with a known exact load-flow solution.
using System.Numerics;
using Study.Core.Admittance;
using Study.Core.Model;
using Study.Core.Numerics;

namespace Study.Core.Synthetic;

/// <summary>A generated network together with the solution it was manufactured from.</summary>
public sealed record SyntheticCase(Network Network, double[] VoltagePu, double[] AngleDeg);

/// <summary>Options of the generator; the defaults give a meshed grid that solves from flat start.</summary>
public sealed record SyntheticGridOptions
{
    public int Buses { get; init; } = 1000;
    public int Seed { get; init; } = 1;
    /// <summary>Branches per bus (about 1.4 on real transmission grids).</summary>
    public double BranchesPerBus { get; init; } = 1.4;
    /// <summary>Share of buses with a generator (the rest carry load).</summary>
    public double GeneratorShare { get; init; } = 1.0 / 6;
    /// <summary>Share of branches that are transformers with an off-nominal ratio.</summary>
    public double TransformerShare { get; init; } = 0.02;
    /// <summary>Largest angle spread of the manufactured solution, degrees.</summary>
    public double AngleSpreadDeg { get; init; } = 40;
}

/// <summary>
/// Builds a planar, meshed network: buses on a jittered square lattice, a spanning tree of the
/// nearest-neighbour graph (Kruskal), then the shortest remaining neighbour links as loops. The
/// solution is chosen first — angles from a DC flow of balanced random injections, scaled to a
/// realistic spread, and smooth voltage magnitudes — and the injections are computed from it, so
/// the exact solution is known. Above 10,000 buses lines are shortened electrically so the grid
/// keeps the electrical size of a real one.
/// Voltage magnitudes stay within ±1.5 % of 1 pu so that a flat start is a fair first guess.
/// </summary>
public static class SyntheticGrid
{
    private const double BaseKv = 230;

    /// <summary>
    /// The largest grid made: up to it, flat start solves every seed tried (ten at 200,000 buses); at
    /// 500,000 some seeds no longer solve from flat start, so the promise stops here.
    /// </summary>
    public const int MostBuses = 200_000;

    public static SyntheticCase Generate(SyntheticGridOptions options)
    {
        int n = options.Buses;
        if (n < 2 || n > MostBuses)
            throw new ArgumentOutOfRangeException(nameof(options), $"a synthetic grid has 2 to {MostBuses:N0} buses");
        var random = new Random(options.Seed);
        var (x, y) = Positions(n, random);
        List<(int From, int To, double Length)> edges = Topology(n, x, y, options.BranchesPerBus);

        // Per-unit reactance per lattice length: about 0.02 pu for a neighbour link at 10k buses or
        // fewer, shortened by (10k/n)^¼ above that so the electrical diameter grows more slowly than
        // the hop count (a full sqrt(10k/n) makes links so stiff that flat start no longer converges).
        double xPerLength = 0.02 * Math.Min(1.0, Math.Pow(10_000.0 / n, 0.25));
        var branches = new List<SyntheticBranch>(edges.Count);
        // Transformers go on loop links only (the first n − 1 links are the spanning tree): a pocket
        // of load hanging from a single transformer can have a second, low-voltage solution, and flat
        // start may find that one instead of the manufactured one.
        int treeLinks = n - 1;
        double transformerChance = options.TransformerShare * edges.Count / Math.Max(1, edges.Count - treeLinks);
        for (int k = 0; k < edges.Count; k++)
        {
            var (from, to, length) = edges[k];
            double xPu = Math.Max(1e-4, xPerLength * length * (0.8 + 0.4 * random.NextDouble()));
            bool transformer = k >= treeLinks && random.NextDouble() < transformerChance;
            double ratio = 1.0;
            if (transformer)
            {
                // A transformer keeps its own leakage reactance whatever the grid's size, so the
                // circulating reactive power of an off-nominal ratio inside a mesh (Δt / x) stays modest.
                xPu = 0.04 + 0.04 * random.NextDouble();
                ratio = Math.Round(0.97 + 0.06 * random.NextDouble(), 4);
            }
            branches.Add(new SyntheticBranch(from, to, xPu / 8, xPu, transformer ? 0 : xPu * 0.02 * 10, ratio, transformer));
        }

        bool[] isGenerator = new bool[n];
        for (int i = 0; i < n; i++) isGenerator[i] = random.NextDouble() < options.GeneratorShare;
        int slack = SlackBus(n);
        isGenerator[slack] = true;

        double[] angle = DcAngles(n, branches, isGenerator, slack, random, options.AngleSpreadDeg * Math.PI / 180);
        double[] vm = new double[n];
        // A smooth field across the whole grid: neighbouring buses differ by about 0.001 pu, so the
        // reactive flows that hold the profile stay realistic at any size.
        double phase = random.NextDouble() * 2 * Math.PI;
        double side = Math.Ceiling(Math.Sqrt(n));
        for (int i = 0; i < n; i++)
            vm[i] = Math.Round(1.0 + 0.015 * Math.Sin(2 * Math.PI * x[i] / side + phase) * Math.Cos(Math.PI * y[i] / side), 4);
        Complex[] injection = Injections(n, branches, vm, angle);
        Network network = ToNetwork(options, branches, isGenerator, slack, vm, angle, injection);
        return new SyntheticCase(network, vm, angle.Select(a => a * 180 / Math.PI).ToArray());
    }

    internal sealed record SyntheticBranch(int From, int To, double R, double X, double B, double Ratio, bool IsTransformer);

    private static (double[] X, double[] Y) Positions(int n, Random random)
    {
        int side = (int)Math.Ceiling(Math.Sqrt(n));
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++)
        {
            x[i] = i % side + 0.7 * (random.NextDouble() - 0.5);
            y[i] = i / side + 0.7 * (random.NextDouble() - 0.5);
        }
        return (x, y);
    }

    /// <summary>Kruskal spanning tree of the neighbour graph, then the shortest unused neighbour links.</summary>
    private static List<(int, int, double)> Topology(int n, double[] x, double[] y, double branchesPerBus)
    {
        int side = (int)Math.Ceiling(Math.Sqrt(n));
        var candidates = new List<(int A, int B, double Length)>(4 * n);
        for (int i = 0; i < n; i++)
        {
            int r = i / side, c = i % side;
            // Neighbours on the lattice within two cells: right, down and both diagonals.
            foreach (var (dr, dc) in new[] { (0, 1), (1, 0), (1, 1), (1, -1), (0, 2), (2, 0) })
            {
                int rr = r + dr, cc = c + dc;
                if (cc < 0 || cc >= side) continue;
                int j = rr * side + cc;
                if (j >= n) continue;
                candidates.Add((i, j, Math.Sqrt((x[i] - x[j]) * (x[i] - x[j]) + (y[i] - y[j]) * (y[i] - y[j]))));
            }
        }
        candidates.Sort((p, q) => p.Length.CompareTo(q.Length));
        int[] parent = Enumerable.Range(0, n).ToArray();
        int Find(int i)
        {
            while (parent[i] != i) i = parent[i] = parent[parent[i]];
            return i;
        }
        var chosen = new List<(int, int, double)>((int)(branchesPerBus * n) + 1);
        var used = new bool[candidates.Count];
        for (int k = 0; k < candidates.Count; k++)
        {
            var (a, b, length) = candidates[k];
            int ra = Find(a), rb = Find(b);
            if (ra == rb) continue;
            parent[ra] = rb;
            chosen.Add((a, b, length));
            used[k] = true;
        }
        int wanted = (int)(branchesPerBus * n);
        for (int k = 0; k < candidates.Count && chosen.Count < wanted; k++)
            if (!used[k]) chosen.Add(candidates[k]);
        return chosen;
    }

    /// <summary>DC flow B'·θ = P of balanced random injections, θ scaled so the spread is <paramref name="spreadRad"/>.</summary>
    private static double[] DcAngles(int n, List<SyntheticBranch> branches, bool[] isGenerator, int slack, Random random, double spreadRad)
    {
        double[] p = new double[n];
        double generation = 0, load = 0;
        for (int i = 0; i < n; i++)
        {
            if (i == slack) continue;
            if (isGenerator[i]) generation += p[i] = 0.5 + random.NextDouble();
            else load += p[i] = -(0.2 + 0.3 * random.NextDouble());
        }
        // Balance on the generators so the slack takes little.
        double scale = generation > 0 ? -load / generation : 0;
        for (int i = 0; i < n; i++) if (isGenerator[i] && i != slack) p[i] *= scale;
        // The reduced system leaves the slack out: bus 0 and the slack trade places in it.
        int Reduced(int bus) => bus == slack ? 0 : bus == 0 ? slack : bus;
        double[] reduced = new double[n];
        for (int i = 0; i < n; i++) reduced[Reduced(i)] = p[i];
        var builder = new TripletBuilder<double>(n - 1, n - 1, 4 * branches.Count + n);
        for (int i = 0; i < n - 1; i++) builder.Add(i, i, 0);
        foreach (SyntheticBranch b in branches)
        {
            double s = 1 / b.X;
            int f = Reduced(b.From) - 1, t = Reduced(b.To) - 1;
            if (f >= 0) builder.Add(f, f, s);
            if (t >= 0) builder.Add(t, t, s);
            if (f >= 0 && t >= 0)
            {
                builder.Add(f, t, -s);
                builder.Add(t, f, -s);
            }
        }
        CscMatrix<double> bPrime = builder.ToCsc();
        var lu = SparseLu<double>.Analyse(bPrime);
        lu.Factor(bPrime);
        double[] theta = reduced[1..];
        lu.Solve(theta);
        double max = Math.Max(theta.Max(), 0), min = Math.Min(theta.Min(), 0);
        double factor = max - min > 0 ? spreadRad / (max - min) : 0;
        double[] angle = new double[n];
        for (int i = 0; i < n; i++) if (i != slack) angle[i] = Math.Round(theta[Reduced(i) - 1] * factor, 6);
        return angle;
    }

    /// <summary>S_i = V_i·conj(Σ y_ik V_k) for the π branches (ratio at the From end), exactly.</summary>
    private static Complex[] Injections(int n, List<SyntheticBranch> branches, double[] vm, double[] angle)
    {
        var v = new Complex[n];
        for (int i = 0; i < n; i++) v[i] = Complex.FromPolarCoordinates(vm[i], angle[i]);
        var current = new Complex[n];
        foreach (SyntheticBranch b in branches)
        {
            var y = Admittance.BranchAdmittance.Of(new Complex(b.R, b.X), b.B, b.Ratio, 0, Complex.Zero);
            current[b.From] += y.Yff * v[b.From] + y.Yft * v[b.To];
            current[b.To] += y.Ytf * v[b.From] + y.Ytt * v[b.To];
        }
        var s = new Complex[n];
        for (int i = 0; i < n; i++) s[i] = v[i] * Complex.Conjugate(current[i]);
        return s;
    }

    /// <summary>
    /// The slack sits at the middle of the lattice: from a corner the angles of the far side reach the whole
    /// spread, and on large grids flat start then falls outside Newton-Raphson's reach.
    /// </summary>
    private static int SlackBus(int n)
    {
        int side = (int)Math.Ceiling(Math.Sqrt(n));
        return Math.Min(n - 1, side / 2 * side + side / 2);
    }

    private static Network ToNetwork(SyntheticGridOptions options, List<SyntheticBranch> branches, bool[] isGenerator, int slack,
        double[] vm, double[] angle, Complex[] s)
    {
        const double baseMva = 100;
        int n = vm.Length;
        static string Id(int i) => "B" + (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
        var buses = new List<Bus>(n);
        var generators = new List<Generator>();
        var loads = new List<Load>();
        for (int i = 0; i < n; i++)
        {
            buses.Add(new Bus { Id = Id(i), Kv = BaseKv, VMin = 0.9, VMax = 1.1 });
            double pMw = s[i].Real * baseMva, qMvar = s[i].Imaginary * baseMva;
            if (i == slack)
                generators.Add(new Generator { Id = "G" + (i + 1), Bus = Id(i), Mode = GeneratorMode.Slack, VSet = vm[i], PMw = pMw });
            else if (isGenerator[i])
                generators.Add(new Generator { Id = "G" + (i + 1), Bus = Id(i), Mode = GeneratorMode.Pv, PMw = pMw, VSet = vm[i] });
            else
                loads.Add(new Load { Id = "L" + (i + 1), Bus = Id(i), PMw = -pMw, QMvar = -qMvar });
        }
        var lines = new List<Line>();
        var transformers = new List<Transformer>();
        for (int k = 0; k < branches.Count; k++)
        {
            SyntheticBranch b = branches[k];
            string id = $"{Id(b.From)}-{Id(b.To)}";
            if (b.IsTransformer)
                transformers.Add(new Transformer { Id = id, Hv = Id(b.From), Lv = Id(b.To), RPu = b.R, XPu = b.X, Ratio = b.Ratio, VectorGroup = "YNyn0" });
            else
                lines.Add(new Line { Id = id, From = Id(b.From), To = Id(b.To), Z1 = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = b.R, X = b.X, B = b.B } });
        }
        return new Network
        {
            Name = $"synthetic grid, {n} buses, seed {options.Seed}",
            BaseMva = baseMva, FrequencyHz = 50,
            Buses = buses, Generators = generators, Loads = loads, Lines = lines, Transformers = transformers,
        };
    }
}
