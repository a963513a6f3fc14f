// Writing a network file and reading it back gives the same network, for every element kind and field.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Properties;

public class RoundTripProperties
{
    [Fact]
    public void Write_then_read_of_every_element_kind_is_exact()
    {
        PropertyRun.ForAll("network file round trip", EveryKindNetworks.Gen, PropertyRun.Iterations(2_000),
            network =>
            {
                string written = NetworkFile.ToJson(network);
                Network read = NetworkFile.Parse(written, "round-trip.study.json");
                if (ModelComparer.FirstDifference(network, read) is string difference)
                    throw new InvalidOperationException($"read back differs at {difference}");
                string again = NetworkFile.ToJson(read);
                if (again != written) throw new InvalidOperationException("the second write differs from the first");
            },
            NetworkFile.ToJson);
    }

    [Fact]
    public void The_generated_networks_hold_every_element_kind_and_nested_object()
    {
        // The round trip above only means something if the generator reaches every key the file can hold.
        var networks = Enumerable.Range(0, 300)
            .Select(i => EveryKindNetworks.Gen.Generate(new CsCheck.PCG((uint)i, PropertyRun.Seed), null, out _)).ToList();
        string all = string.Concat(networks.Select(NetworkFile.ToJson));
        string[] keys =
        [
            "\"supplies\"", "\"generators\"", "\"loads\"", "\"shunts\"", "\"lines\"", "\"transformers\"",
            "\"threeWindingTransformers\"", "\"breakers\"", "\"scenarios\"", "\"publishedSolution\"", "\"tap\"",
            "\"regulate\"", "\"noLoad\"", "\"neutral\"", "\"hvNeutral\"", "\"mvNeutral\"", "\"zip\"", "\"inService\": false",
            "\"per\": \"km\"", "\"per\": \"line\"", "\"per\": \"pu\"", "\"z0\"", "\"km\"", "\"rPu\"", "\"ratio\"", "\"zPercent\"",
            "\"z0z1\"", "\"generationScale\"", "\"mode\": \"pq\"", "\"winding\": \"mv\"", "\"range\": [",
        ];
        foreach (string key in keys) Assert.Contains(key, all);
    }
}
