// Vector groups are checked by `study check` in IEC 60076-1 notation, with the element, the key and the file line.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Model.Validation;
using static Study.Core.Tests.Model.ValidationNetworks;

namespace Study.Core.Tests.Model;

public class VectorGroupRulesTests
{
    [Theory]
    [InlineData("banana", "the hv winding is written in capitals (Y, YN, D, Z, ZN), found 'b'")]
    [InlineData("Dyn13", "clock number 13 is outside 0 to 11")]
    [InlineData("Dyn99999999999", "clock number 99999999999 is outside 0 to 11")]
    [InlineData("YNyn0d1", "a two-winding transformer needs two windings, e.g. Dyn11")]
    [InlineData("Dyn", "a clock number (0 to 11) must follow each lower-voltage winding")]
    [InlineData("", "a winding letter is missing")]
    public void A_vector_group_that_is_not_iec_60076_1_notation_is_an_error_on_its_key(string group, string why)
    {
        Network net = Clean();
        net = net with { Transformers = net.Transformers.Change(1, t => t with { VectorGroup = group }) };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T2", "vectorGroup");
        Assert.Equal(Severity.Error, p.Severity);
        Assert.Contains(why, p.Message);
    }

    [Fact]
    public void A_two_winding_group_on_a_three_winding_unit_is_an_error()
    {
        Network net = Clean() with
        {
            Buses = [.. Clean().Buses, new Bus { Id = "TERT", Kv = 11 }],
            ThreeWindingTransformers =
            [
                new ThreeWindingTransformer
                {
                    Id = "T3", Hv = "GRID", Mv = "QUARREND", Lv = "TERT", HvKv = 132, MvKv = 33, LvKv = 11, MvaHv = 60, MvaMv = 60,
                    MvaLv = 20, ZHmPercent = 12, ZHlPercent = 20, ZMlPercent = 7, ZBaseMva = 60, VectorGroup = "YNd11",
                },
            ],
        };
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.ThreeWindingTransformer, "T3", "vectorGroup");
        Assert.Contains("a three-winding transformer needs three windings, e.g. YNyn0d1", p.Message);
    }

    [Fact]
    public void Check_reports_a_bad_vector_group_at_the_transformers_line_in_the_file()
    {
        const string text = """
            {
              "format": "study-network", "version": 2,
              "buses": [{"id": "A", "kv": 33}, {"id": "B", "kv": 11}],
              "supplies": [{"id": "GRID", "bus": "A", "scMvaMax": 500}],
              "transformers": [
                {"id": "T1", "hv": "A", "lv": "B", "mva": 20, "hvKv": 33, "lvKv": 11, "zPercent": 8, "xr": 10,
                 "vectorGroup": "banana"}
              ]
            }
            """;
        Network net = NetworkFile.Parse(text, "net.study.json");
        Problem p = Single(NetworkValidator.Validate(net), ElementKind.Transformer, "T1", "vectorGroup");
        Assert.Equal("net.study.json", p.File);
        Assert.Equal(6, p.Line);
        Assert.StartsWith("net.study.json:6: error: transformer T1 (vectorGroup): vector group 'banana'", p.Describe());
    }
}
