// Fill-reducing ordering: approximate minimum degree on the pattern of A + Aᵀ, eliminating on a
// quotient graph with element absorption, approximate external degrees, aggressive absorption,
// mass elimination and supernode detection (Davis 2006, §7.1, cs_amd; Amestoy, Davis and Duff,
// SIAM J. Matrix Anal. Appl. 17(4), 1996).
using System.Numerics;
using System.Runtime.CompilerServices;

namespace Study.Core.Numerics;

/// <summary>Approximate minimum degree ordering of a square sparse pattern.</summary>
public static class ApproximateMinimumDegree
{
    /// <summary>A permutation p: column p[k] of A is eliminated k-th (symmetric, for A + Aᵀ).</summary>
    public static int[] Order<T>(CscMatrix<T> a) where T : INumberBase<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        if (a.Rows != a.Cols) throw new ArgumentException($"the matrix must be square, not {a.Rows}×{a.Cols}.", nameof(a));
        return Order(SymmetricPattern.OfSum(a.Cols, a.ColPtr, a.RowIdx));
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static int[] Order(SymmetricPattern c)
    {
        int n = c.N;
        if (n == 0) return [];
        int cnz = c.NonZeros;
        // The quotient graph lives in Ci with elbow room so new elements can be appended (as cs_amd).
        int nzmax = (int)Math.Min(Array.MaxLength, (long)cnz + cnz / 5 + 2L * n);
        var cp = new int[n + 1];
        var ci = new int[nzmax];
        Array.Copy(c.ColPtr, cp, n + 1);
        Array.Copy(c.RowIdx, ci, cnz);

        var len = new int[n + 1];
        var nv = new int[n + 1];
        var next = new int[n + 1];
        var head = new int[n + 1];
        var elen = new int[n + 1];
        var degree = new int[n + 1];
        var w = new int[n + 1];
        var hhead = new int[n + 1];
        var last = new int[n + 1];

        // Rows denser than this are ordered last; they would only slow the degree updates.
        int dense = (int)Math.Max(16, 10 * Math.Sqrt(n));
        dense = Math.Min(n - 2, dense);

        for (int k = 0; k < n; k++) len[k] = cp[k + 1] - cp[k];
        len[n] = 0;
        for (int i = 0; i <= n; i++)
        {
            head[i] = -1;
            last[i] = -1;
            next[i] = -1;
            hhead[i] = -1;
            nv[i] = 1;
            w[i] = 1;
            elen[i] = 0;
            degree[i] = len[i];
        }
        int mark = ClearMarks(0, 0, w, n);
        elen[n] = -2; // node n is a dead element, the root that dense nodes hang from
        cp[n] = -1;
        w[n] = 0;

        int nel = 0;
        for (int i = 0; i < n; i++)
        {
            int d = degree[i];
            if (d == 0)
            {
                elen[i] = -2; // an empty node is eliminated at once
                nel++;
                cp[i] = -1;
                w[i] = 0;
            }
            else if (d > dense)
            {
                nv[i] = 0; // absorb the dense node into element n
                elen[i] = -1;
                nel++;
                cp[i] = Flip(n);
                nv[n]++;
            }
            else
            {
                if (head[d] != -1) last[head[d]] = i;
                next[i] = head[d];
                head[d] = i;
            }
        }

        int mindeg = 0, lemax = 0;
        while (nel < n)
        {
            // Select a node of minimum approximate degree.
            int k = -1;
            for (; mindeg < n && (k = head[mindeg]) == -1; mindeg++) { }
            if (next[k] != -1) last[next[k]] = -1;
            head[mindeg] = next[k];
            int elenk = elen[k];
            int nvk = nv[k];
            nel += nvk;

            if (elenk > 0 && cnz + mindeg >= nzmax) cnz = CollectGarbage(n, cp, ci, len, cnz);

            // Construct the new element Lk from the nodes of k and of every element adjacent to k.
            int dk = 0;
            nv[k] = -nvk; // flag k as in Lk
            int p = cp[k];
            int pk1 = elenk == 0 ? p : cnz; // in place when k touches no element
            int pk2 = pk1;
            for (int k1 = 1; k1 <= elenk + 1; k1++)
            {
                int e, pj, ln;
                if (k1 > elenk)
                {
                    e = k;
                    pj = p;
                    ln = len[k] - elenk;
                }
                else
                {
                    e = ci[p++];
                    pj = cp[e];
                    ln = len[e];
                }
                for (int k2 = 1; k2 <= ln; k2++)
                {
                    int i = ci[pj++];
                    int nvi = nv[i];
                    if (nvi <= 0) continue; // dead, or already in Lk
                    dk += nvi;
                    nv[i] = -nvi;
                    ci[pk2++] = i;
                    if (next[i] != -1) last[next[i]] = last[i];
                    if (last[i] != -1) next[last[i]] = next[i];
                    else head[degree[i]] = next[i];
                }
                if (e != k)
                {
                    cp[e] = Flip(k); // element absorption: e is inside k now
                    w[e] = 0;
                }
            }
            if (elenk != 0) cnz = pk2;
            degree[k] = dk;
            cp[k] = pk1;
            len[k] = pk2 - pk1;
            elen[k] = -2;

            // Scan 1: w[e] - mark = |Le \ Lk| for every element e adjacent to a node of Lk.
            mark = ClearMarks(mark, lemax, w, n);
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                int eln = elen[i];
                if (eln <= 0) continue;
                int nvi = -nv[i];
                int wnvi = mark - nvi;
                for (p = cp[i]; p <= cp[i] + eln - 1; p++)
                {
                    int e = ci[p];
                    if (w[e] >= mark) w[e] -= nvi;
                    else if (w[e] != 0) w[e] = degree[e] + wnvi;
                }
            }

            // Scan 2: approximate degree of each node of Lk, pruning its lists as it goes.
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                int p1 = cp[i];
                int p2 = p1 + elen[i] - 1;
                int pn = p1;
                long h = 0;
                int d = 0;
                for (p = p1; p <= p2; p++)
                {
                    int e = ci[p];
                    if (w[e] == 0) continue;
                    int dext = w[e] - mark;
                    if (dext > 0)
                    {
                        d += dext;
                        ci[pn++] = e;
                        h += e;
                    }
                    else
                    {
                        cp[e] = Flip(k); // aggressive absorption: Le is a subset of Lk
                        w[e] = 0;
                    }
                }
                elen[i] = pn - p1 + 1;
                int p3 = pn;
                int p4 = p1 + len[i];
                for (p = p2 + 1; p < p4; p++)
                {
                    int j = ci[p];
                    int nvj = nv[j];
                    if (nvj <= 0) continue;
                    d += nvj;
                    ci[pn++] = j;
                    h += j;
                }
                if (d == 0)
                {
                    // Mass elimination: i is adjacent to nothing but k.
                    cp[i] = Flip(k);
                    int nvi = -nv[i];
                    dk -= nvi;
                    nvk += nvi;
                    nel += nvi;
                    nv[i] = 0;
                    elen[i] = -1;
                }
                else
                {
                    degree[i] = Math.Min(degree[i], d);
                    ci[pn] = ci[p3]; // make k the first element of Ei
                    ci[p3] = ci[p1];
                    ci[p1] = k;
                    len[i] = pn - p1 + 1;
                    int bucket = (int)(h % n);
                    next[i] = hhead[bucket];
                    hhead[bucket] = i;
                    last[i] = bucket;
                }
            }
            degree[k] = dk;
            lemax = Math.Max(lemax, dk);
            mark = ClearMarks(mark + lemax, lemax, w, n);

            DetectSupernodes(ci, cp, pk1, pk2, nv, len, elen, next, last, hhead, w, ref mark);

            // Finalise Lk and put its nodes back in the degree lists.
            p = pk1;
            for (int pk = pk1; pk < pk2; pk++)
            {
                int i = ci[pk];
                int nvi = -nv[i];
                if (nvi <= 0) continue;
                nv[i] = nvi;
                int d = degree[i] + dk - nvi;
                d = Math.Min(d, n - nel - nvi);
                if (head[d] != -1) last[head[d]] = i;
                next[i] = head[d];
                last[i] = -1;
                head[d] = i;
                mindeg = Math.Min(mindeg, d);
                degree[i] = d;
                ci[p++] = i;
            }
            nv[k] = nvk;
            len[k] = p - pk1;
            if (len[k] == 0)
            {
                cp[k] = -1; // k is a root of the assembly tree
                w[k] = 0;
            }
            if (elenk != 0) cnz = p;
        }

        return PostOrderAssemblyTree(n, cp, nv, head, next, w);
    }

    // Nodes of Lk with identical element and node lists become one supernode; candidates share a
    // hash bucket, and are compared with the marker array w (Davis 2006, §7.1).
    private static void DetectSupernodes(int[] ci, int[] cp, int pk1, int pk2, int[] nv, int[] len, int[] elen,
        int[] next, int[] last, int[] hhead, int[] w, ref int mark)
    {
        for (int pk = pk1; pk < pk2; pk++)
        {
            int i = ci[pk];
            if (nv[i] >= 0) continue;
            int h = last[i];
            i = hhead[h];
            hhead[h] = -1;
            for (; i != -1 && next[i] != -1; i = next[i], mark++)
            {
                int ln = len[i];
                int eln = elen[i];
                for (int p = cp[i] + 1; p <= cp[i] + ln - 1; p++) w[ci[p]] = mark;
                int jlast = i;
                for (int j = next[i]; j != -1;)
                {
                    bool same = len[j] == ln && elen[j] == eln;
                    for (int p = cp[j] + 1; same && p <= cp[j] + ln - 1; p++)
                    {
                        if (w[ci[p]] != mark) same = false;
                    }
                    if (same)
                    {
                        cp[j] = Flip(i); // absorb j into i
                        nv[i] += nv[j];
                        nv[j] = 0;
                        elen[j] = -1;
                        j = next[j];
                        next[jlast] = j;
                    }
                    else
                    {
                        jlast = j;
                        j = next[j];
                    }
                }
            }
        }
    }

    // Compacts the live lists to the front of ci; each object's first entry temporarily holds its
    // flipped id so the scan can find where objects start (Davis 2006, §7.1).
    private static int CollectGarbage(int n, int[] cp, int[] ci, int[] len, int cnz)
    {
        for (int j = 0; j < n; j++)
        {
            int p = cp[j];
            if (p < 0) continue;
            cp[j] = ci[p];
            ci[p] = Flip(j);
        }
        int q = 0;
        for (int p = 0; p < cnz;)
        {
            int j = Flip(ci[p++]);
            if (j < 0) continue;
            ci[q] = cp[j];
            cp[j] = q++;
            for (int k3 = 0; k3 < len[j] - 1; k3++) ci[q++] = ci[p++];
        }
        return q;
    }

    // The order is a postorder of the assembly tree (cp[] holds flipped parents once all nodes are
    // eliminated), so each subtree is contiguous; node n, the dense-row root, comes last.
    private static int[] PostOrderAssemblyTree(int n, int[] cp, int[] nv, int[] head, int[] next, int[] stack)
    {
        for (int i = 0; i < n; i++) cp[i] = Flip(cp[i]);
        for (int j = 0; j <= n; j++) head[j] = -1;
        for (int j = n; j >= 0; j--)
        {
            if (nv[j] > 0) continue; // nodes absorbed into others go first in their parent's list
            next[j] = head[cp[j]];
            head[cp[j]] = j;
        }
        for (int e = n; e >= 0; e--)
        {
            if (nv[e] <= 0 || cp[e] == -1) continue;
            next[e] = head[cp[e]];
            head[cp[e]] = e;
        }
        var post = new int[n + 1];
        int k = 0;
        for (int i = 0; i <= n; i++)
        {
            if (cp[i] == -1) k = EliminationTree.DepthFirst(i, k, head, next, post, stack);
        }
        return post.AsSpan(0, n).ToArray();
    }

    // Resets the marker array when mark would overflow, so w[i] < mark holds for every node.
    private static int ClearMarks(int mark, int lemax, int[] w, int n)
    {
        if (mark < 2 || mark + lemax < 0)
        {
            for (int k = 0; k < n; k++)
            {
                if (w[k] != 0) w[k] = 1;
            }
            mark = 2;
        }
        return mark;
    }

    private static int Flip(int i) => -i - 2;
}
