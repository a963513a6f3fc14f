// Element ids for imported branches: "from-to", with "#circuit" where the same pair appears again.
using System.Globalization;

namespace Study.Core.Io.CommonFormat;

internal static class BranchIds
{
    /// <summary>
    /// One id per branch card, in order. A (tap bus, Z bus) pair that appears once is "from-to"; every
    /// card of a pair that appears more than once is "from-to#c", with c its circuit number when that is
    /// stated and not already taken within the pair, otherwise the lowest number still free.
    /// </summary>
    public static string[] Assign(IReadOnlyList<BranchCard> branches)
    {
        var pairs = new Dictionary<(int From, int To), List<int>>();
        for (int i = 0; i < branches.Count; i++)
        {
            var key = (branches[i].TapBus, branches[i].ZBus);
            if (!pairs.TryGetValue(key, out List<int>? members)) pairs[key] = members = [];
            members.Add(i);
        }

        var ids = new string[branches.Count];
        foreach (((int from, int to), List<int> members) in pairs)
        {
            string stem = string.Create(CultureInfo.InvariantCulture, $"{from}-{to}");
            if (members.Count == 1)
            {
                ids[members[0]] = stem;
                continue;
            }
            var taken = new HashSet<int>();
            foreach (int i in members)
            {
                int circuit = branches[i].Circuit;
                if (circuit > 0 && taken.Add(circuit)) ids[i] = Numbered(stem, circuit);
            }
            int next = 1;
            foreach (int i in members)
            {
                if (ids[i] is not null) continue;
                while (taken.Contains(next)) next++;
                taken.Add(next);
                ids[i] = Numbered(stem, next);
            }
        }
        return ids;
    }

    private static string Numbered(string stem, int circuit) =>
        string.Create(CultureInfo.InvariantCulture, $"{stem}#{circuit}");
}
