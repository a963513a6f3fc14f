// Finds the existing id a mistyped reference most likely meant, for "did you mean" hints.
namespace Study.Core.Model.Validation;

internal static class IdSuggestion
{
    /// <summary>
    /// The id equal to <paramref name="missing"/> ignoring case and surrounding spaces, else the one
    /// unique id within a small edit distance (a third of the length), else null. Short ids such as
    /// "B9" get no fuzzy hint: every other short id would be as near.
    /// </summary>
    public static string? Closest(string missing, IEnumerable<string> ids)
    {
        string wanted = missing.Trim();
        int limit = wanted.Length / 3;
        string? best = null;
        int bestDistance = int.MaxValue;
        bool tie = false;
        foreach (string id in ids)
        {
            if (string.Equals(id.Trim(), wanted, StringComparison.OrdinalIgnoreCase)) return id;
            if (limit == 0 || Math.Abs(id.Length - wanted.Length) > limit) continue;
            int distance = EditDistance(id.ToUpperInvariant(), wanted.ToUpperInvariant());
            if (distance > limit) continue;
            if (distance < bestDistance)
            {
                (best, bestDistance, tie) = (id, distance, false);
            }
            else if (distance == bestDistance)
            {
                tie = true;
            }
        }
        return tie ? null : best;
    }

    /// <summary>Levenshtein distance by the two-row dynamic programme.</summary>
    private static int EditDistance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) previous[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int substitute = previous[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1);
                current[j] = Math.Min(substitute, Math.Min(previous[j] + 1, current[j - 1] + 1));
            }
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }
}
