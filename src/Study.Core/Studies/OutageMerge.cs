// Sharded outage screenings joined into the screening one machine gives.
using Study.Core.LoadFlow;
using Study.Core.Model;

namespace Study.Core.Studies;

/// <summary>
/// Joins the shards of one screening (<see cref="OutageShard"/>): every shard 1..N exactly once, all
/// cut from the same outage list, every outage of the list exactly once in the shard that holds it.
/// The outages are ranked again as one list (<see cref="OutageScreening.Rank"/>), so the result is
/// the one an unsharded run gives, whatever order the shards come in.
/// </summary>
public static class OutageMerge
{
    /// <param name="parts">Each shard's result, with a name for messages (its file, say).</param>
    /// <exception cref="InputException">The parts are not the shards of one screening, or do not cover it exactly.</exception>
    public static OutageScreeningResult Merge(IReadOnlyList<(string Name, OutageScreeningResult Result)> parts)
    {
        if (parts.Count == 0) throw new InputException("no parts to merge");
        var (firstName, first) = parts[0];
        int count = first.Shard.Count;
        var byNumber = new Dictionary<int, string>();
        foreach (var (name, part) in parts)
        {
            if (part.Shard.Count != count)
                throw new InputException($"{name} is shard {part.Shard} but {firstName} is shard {first.Shard}: the parts were cut into different numbers of shards");
            if (byNumber.TryGetValue(part.Shard.Number, out string? other))
                throw new InputException($"shard {part.Shard} is given twice: {other} and {name}");
            byNumber[part.Shard.Number] = name;
            if (!part.Elements.SequenceEqual(first.Elements, StringComparer.Ordinal))
                throw new InputException($"{name} and {firstName} take out different elements: they are not shards of one screening");
            if (part.OutageCount != first.OutageCount
                || !part.Scenarios.Select(s => s.Scenario).SequenceEqual(first.Scenarios.Select(s => s.Scenario)))
                throw new InputException($"{name} and {firstName} screen different scenarios: they are not shards of one screening");
        }
        var missing = Enumerable.Range(1, count).Where(k => !byNumber.ContainsKey(k)).ToList();
        if (missing.Count > 0)
            throw new InputException($"shard{(missing.Count > 1 ? "s" : "")} {string.Join(", ", missing.Select(k => $"{k}/{count}"))} missing: "
                + $"a merge needs every one of the {count} shards");

        var seen = new string?[first.OutageCount];
        var screenings = new List<ScenarioScreening>(first.Scenarios.Count);
        for (int s = 0; s < first.Scenarios.Count; s++)
        {
            ScenarioScreening intact = first.Scenarios[s];
            var outages = new List<OutageCase>();
            foreach (var (name, part) in parts)
            {
                ScenarioScreening mine = part.Scenarios[s];
                if (!SameIntactCase(mine, intact))
                    throw new InputException($"{name} and {firstName} found different intact cases in {mine.Scenario ?? "the loads as entered"}: "
                        + "they were not solved from the same network and options");
                foreach (OutageCase o in mine.Outages)
                {
                    if (o.Order < 0 || o.Order >= seen.Length || !part.Shard.Holds(o.Order))
                        throw new InputException($"{name}: outage {o.Order} of {o.Element} does not belong to shard {part.Shard}");
                    if (seen[o.Order] is string before)
                        throw new InputException($"outage {o.Order} of {o.Element} is in {before} and in {name}");
                    seen[o.Order] = name;
                    outages.Add(o);
                }
            }
            screenings.Add(intact with { Outages = OutageScreening.Rank(outages) });
        }
        int absent = Array.IndexOf(seen, null);
        if (absent >= 0)
        {
            int shard = absent % count + 1;
            throw new InputException($"outage {absent} is in no part, though shard {shard}/{count} ({byNumber[shard]}) should hold it");
        }
        return first with { Scenarios = screenings, Shard = OutageShard.Whole };
    }

    private static bool SameIntactCase(ScenarioScreening a, ScenarioScreening b) =>
        a.Scenario == b.Scenario && a.IntactConverged == b.IntactConverged && a.IntactMessage == b.IntactMessage
        && a.IntactLoadMw.Equals(b.IntactLoadMw) && a.IntactViolations.Count == b.IntactViolations.Count
        && a.IntactViolations.Zip(b.IntactViolations).All(p => SameViolation(p.First, p.Second));

    private static bool SameViolation(Violation a, Violation b) =>
        a.Element == b.Element && a.Kind == b.Kind && a.Type == b.Type && a.Value.Equals(b.Value) && a.Limit.Equals(b.Limit);
}
