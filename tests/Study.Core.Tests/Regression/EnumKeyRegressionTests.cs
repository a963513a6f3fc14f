// Counter-examples the reader properties found in enum keys: numbers were taken as enum indices.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Regression;

public class EnumKeyRegressionTests
{
    [Theory]
    [InlineData("\"mode\": 3")]
    [InlineData("\"mode\": 0")]
    public void A_generator_mode_given_as_a_number_is_a_wrong_type_of_value(string mode)
    {
        // Found by fuzzing: "mode": 3 was read as a mode with no name and written back as 3; "mode": 0 quietly meant slack.
        string text = "{\"buses\": [{\"id\": \"B1\", \"kv\": 11}],\n \"generators\": [{\"id\": \"G\", \"bus\": \"B1\", " + mode + "}]}";
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "mode.study.json"));
        Assert.Equal(2, e.Line);
        Assert.Contains("$.generators[0].mode", e.Message);
    }

    [Fact]
    public void A_tap_side_given_as_a_number_is_a_wrong_type_of_value()
    {
        const string text = "{\"buses\": [], \"transformers\": [{\"id\": \"T\", \"hv\": \"A\", \"lv\": \"B\", \"tap\": {\"side\": 2}}]}";
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "side.study.json"));
        Assert.Contains("$.transformers[0].tap.side", e.Message);
    }

    [Fact]
    public void Enum_keys_given_by_name_still_read()
    {
        const string text = "{\"buses\": [], \"generators\": [{\"id\": \"G\", \"bus\": \"B1\", \"mode\": \"pq\"}]}";
        Assert.Equal(Study.Core.Model.GeneratorMode.Pq, NetworkFile.Parse(text).Generators[0].Mode);
    }
}
