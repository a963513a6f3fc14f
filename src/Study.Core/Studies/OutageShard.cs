// One of N deterministic slices of an outage screening, for running it on several machines.
using Study.Core.Model;

namespace Study.Core.Studies;

/// <summary>
/// Shard <see cref="Number"/> of <see cref="Count"/> (1-based). The outages of a screening are numbered
/// 0, 1, 2, ... scenario by scenario (in the scenarios' order) and, within a scenario, in the order of
/// the elements (file order, or the order they were named in); outage i belongs to shard
/// (i mod Count) + 1. The slicing depends only on the network and the request, so every machine cuts
/// the same slices, and dealing the outages round-robin gives every shard a similar mix of work.
/// </summary>
public sealed record OutageShard(int Number, int Count)
{
    /// <summary>The whole screening as one shard.</summary>
    public static OutageShard Whole { get; } = new(1, 1);

    /// <summary>True when outage <paramref name="order"/> (its number in the whole screening) is in this shard.</summary>
    public bool Holds(int order) => order % Count == Number - 1;

    /// <summary>How many of <paramref name="total"/> outages this shard holds.</summary>
    public int CountOf(int total) => total / Count + (total % Count >= Number ? 1 : 0);

    /// <exception cref="InputException">The count is below 1 or the number outside 1..count.</exception>
    public void Validate()
    {
        if (Count < 1) throw new InputException($"the number of shards must be at least 1 (got {Count})");
        if (Number < 1 || Number > Count) throw new InputException($"shard {Number} of {Count} does not exist: shards are numbered 1 to {Count}");
    }

    /// <summary>Reads "K/N".</summary>
    /// <exception cref="InputException">The text is not two whole numbers K/N with 1 ≤ K ≤ N.</exception>
    public static OutageShard Parse(string text)
    {
        string[] parts = text.Split('/');
        if (parts.Length != 2 || !int.TryParse(parts[0], out int k) || !int.TryParse(parts[1], out int n))
            throw new InputException($"a shard is written K/N, for example 2/8 (got '{text}')");
        var shard = new OutageShard(k, n);
        shard.Validate();
        return shard;
    }

    public override string ToString() => $"{Number}/{Count}";
}
