// Shards: round-robin slices that together hold every outage exactly once; merged, one screening.
using Study.Core.Cases;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.Core.Tests.Studies;

public class OutageShardTests
{
    [Theory]
    [InlineData(0, 1)]
    [InlineData(1, 1)]
    [InlineData(10, 3)]
    [InlineData(2, 5)]
    [InlineData(1000, 7)]
    public void The_shards_of_a_screening_hold_every_outage_exactly_once(int total, int count)
    {
        var shards = Enumerable.Range(1, count).Select(k => new OutageShard(k, count)).ToList();
        for (int i = 0; i < total; i++) Assert.Single(shards, s => s.Holds(i));
        Assert.All(shards, s => Assert.Equal(Enumerable.Range(0, total).Count(s.Holds), s.CountOf(total)));
    }

    [Fact]
    public void A_shard_is_written_K_slash_N_with_K_from_1_to_N()
    {
        Assert.Equal(new OutageShard(3, 8), OutageShard.Parse("3/8"));
        foreach (string bad in new[] { "0/8", "9/8", "3/0", "3", "3/8/1", "a/b", "" })
            Assert.Throws<InputException>(() => OutageShard.Parse(bad));
    }

    [Fact]
    public void The_engine_merges_shards_given_in_any_order_into_the_unsharded_ranking()
    {
        StudyCase demo = StudyCase.Of(TestNetworks.Demo);
        OutageScreeningResult whole = demo.Outages(new OutageScreeningRequest());
        var parts = Enumerable.Range(1, 3).Reverse()
            .Select(k => ($"shard {k}", demo.Outages(new OutageScreeningRequest { Shard = new OutageShard(k, 3) }))).ToList();
        OutageScreeningResult merged = OutageMerge.Merge(parts);
        Assert.Equal(OutageShard.Whole, merged.Shard);
        Assert.Equal(whole.Scenarios.Count, merged.Scenarios.Count);
        foreach (var (a, b) in whole.Scenarios.Zip(merged.Scenarios))
            Assert.Equal(a.Outages, b.Outages, (x, y) => x.Order == y.Order && x.Severity.Equals(y.Severity) && x.WorstVPu.Equals(y.WorstVPu));
        Assert.Throws<InputException>(() => OutageMerge.Merge(parts.Take(2).ToList()));
    }
}
