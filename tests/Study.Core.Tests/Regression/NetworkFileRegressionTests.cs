// Counter-examples the reader properties found in the network file reader, kept as plain checks.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Regression;

public class NetworkFileRegressionTests
{
    [Fact]
    public void A_wrong_format_value_is_reported_at_its_line_and_column()
    {
        // Found by fuzzing: a bus id copied over "format" gave an error with no line.
        const string text = "{\n  \"format\": \"B2\",\n  \"version\": 1\n}\n";
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "wrong-format.study.json"));
        Assert.Equal("wrong-format.study.json", e.File);
        Assert.Equal(2, e.Line);
        Assert.Equal(13, e.Column);
        Assert.Contains("'format' is 'B2'", e.Message);
    }

    [Fact]
    public void A_version_newer_than_the_program_is_reported_at_its_line()
    {
        const string text = "{\n  \"format\": \"study-network\",\n  \"version\": 7\n}\n";
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "future.study.json"));
        Assert.Equal(3, e.Line);
        Assert.Equal(14, e.Column);
    }
}
