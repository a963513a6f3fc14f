// The angle each bus sits behind its island's reference through the phase shifts of the banks on the way.
using Study.Core.Units;

namespace Study.Core.Admittance;

internal static class PhaseShifts
{
    /// <summary>
    /// ψ per bus: the sum of the branch shifts φ (ideal ratio t·e^{jφ}:1, so the To end sits φ behind the
    /// From end) along a breadth-first tree, each island grown from the first of <paramref name="roots"/>
    /// it holds (else its first bus), where ψ = 0. Where loops disagree the tree decides; validation
    /// refuses loops whose vector-group displacements disagree.
    /// </summary>
    public static double[] Accumulated(PerUnitModel model, Func<PuBranch, double> shiftOf, IEnumerable<int> roots)
    {
        int n = model.Buses.Count;
        var psi = new double[n];
        var seen = new bool[n];
        var adjacent = new List<(int Other, double Phi)>?[n];
        foreach (PuBranch b in model.Branches)
        {
            double phi = shiftOf(b);
            (adjacent[b.From] ??= []).Add((b.To, phi));
            (adjacent[b.To] ??= []).Add((b.From, -phi));
        }
        var queue = new Queue<int>();
        foreach (int root in roots.Concat(Enumerable.Range(0, n)))
        {
            if (seen[root]) continue;
            seen[root] = true;
            queue.Enqueue(root);
            while (queue.Count > 0)
            {
                int i = queue.Dequeue();
                foreach ((int other, double phi) in adjacent[i] ?? [])
                {
                    if (seen[other]) continue;
                    seen[other] = true;
                    psi[other] = psi[i] + phi;
                    queue.Enqueue(other);
                }
            }
        }
        return psi;
    }
}
