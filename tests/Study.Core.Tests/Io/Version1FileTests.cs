// Network files of version 1 still open: their keys map to today's model, and `convert` writes version 2.
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Tests.Properties;

namespace Study.Core.Tests.Io;

public sealed class Version1FileTests
{
    private static string Fixture(string name) => Path.Combine(AppContext.BaseDirectory, "Fixtures", "Version1", name);

    public static TheoryData<string> Fixtures => ["harbour-estate.study.json", "harbour-estate-before.study.json"];

    [Theory]
    [MemberData(nameof(Fixtures))]
    public void A_version_1_file_reads_to_the_same_network_as_its_converted_version_2_form(string name)
    {
        Network old = NetworkFile.Read(Fixture(name));
        string written = NetworkFile.ToJson(old);
        Assert.Contains("\"version\": 2", written);
        Network converted = NetworkFile.Parse(written, "converted.study.json");
        Assert.Null(ModelComparer.FirstDifference(old, converted));
        // The bundled demo grew from the converted file (motors, a 415 V board, fuller breaker ratings were added
        // since): every line and every tap changer of the version 1 file reads as the demo gives it.
        Network bundled = NetworkFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", name));
        foreach (Line line in old.Lines) Assert.Equal(line, bundled.Lines.Single(l => l.Id == line.Id));
        foreach (Transformer t in old.Transformers) Assert.Equal(t.Tap, bundled.Transformers.Single(b => b.Id == t.Id).Tap);
    }

    [Fact]
    public void A_version_1_file_carries_a_note_that_convert_upgrades_it_and_a_version_2_file_none()
    {
        Network old = NetworkFile.Read(Fixture("harbour-estate.study.json"));
        Assert.Contains("is a version 1 network file; 'study convert", Assert.Single(old.Source.Notes));
        Assert.Empty(NetworkFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate.study.json")).Source.Notes);
    }

    private const string Version1Line = """
        {"format": "study-network", "version": 1, "buses": [{"id": "A", "kv": 33}, {"id": "B", "kv": 33}],
         "lines": [LINE]}
        """;

    private static Line ReadLine(string line) => NetworkFile.Parse(Version1Line.Replace("LINE", line), "v1.study.json").Lines.Single();

    [Fact]
    public void Each_version_1_impedance_form_maps_to_its_basis_with_both_sequences()
    {
        Line perKm = ReadLine("""{"id": "F1", "from": "A", "to": "B", "lengthKm": 5.2, "rOhmPerKm": 0.12, "xOhmPerKm": 0.38, "bUsPerKm": 3, "r0OhmPerKm": 0.3, "x0OhmPerKm": 1.2}""");
        Assert.Equal(5.2, perKm.Km);
        Assert.Equal(new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.12, X = 0.38, B = 3 }, perKm.Z1);
        Assert.Equal(new SequenceImpedance { Per = ImpedanceBasis.PerKm, R = 0.3, X = 1.2 }, perKm.Z0);
        Line totals = ReadLine("""{"id": "F2", "from": "A", "to": "B", "rOhm": 0.6, "xOhm": 2, "bUs": 15.6, "ratingMva": 20}""");
        Assert.Equal(new SequenceImpedance { Per = ImpedanceBasis.WholeLine, R = 0.6, X = 2, B = 15.6 }, totals.Z1);
        Assert.Null(totals.Z0);
        Assert.Equal(20, totals.RatingMva);
        Line pu = ReadLine("""{"id": "F3", "from": "A", "to": "B", "rPu": 0.01, "xPu": 0.05, "inService": false}""");
        Assert.Equal(new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0.01, X = 0.05 }, pu.Z1);
        Assert.False(pu.InService);
    }

    [Theory]
    [InlineData("""{"id": "F1", "from": "A", "to": "B", "rOhm": 1, "xOhm": 2, "xPu": 0.1}""", "more than one form")]
    [InlineData("""{"id": "F1", "from": "A", "to": "B", "rOhm": 1}""", "give both rOhm and xOhm")]
    [InlineData("""{"id": "F1", "from": "A", "to": "B", "rOhm": 1, "xOhm": 2, "colour": "red"}""", "unknown key 'colour'")]
    [InlineData("""{"id": "F1", "from": "A", "to": "B", "rOhm": "one", "xOhm": 2}""", "wrong type of value")]
    [InlineData("""{"from": "A", "to": "B", "rOhm": 1, "xOhm": 2}""", "missing required key(s) 'id'")]
    public void A_bad_version_1_line_is_an_input_error_at_its_line(string line, string message)
    {
        var e = Assert.Throws<InputException>(() => ReadLine(line));
        Assert.Contains(message, e.Message);
        Assert.Equal(2, e.Line);
    }

    [Fact]
    public void A_version_1_tap_changer_counts_its_positions_from_the_neutral_position()
    {
        const string text = """
            {"format": "study-network", "version": 1, "buses": [{"id": "HV", "kv": 132}, {"id": "LV", "kv": 33}],
             "transformers": [{"id": "T1", "hv": "HV", "lv": "LV", "mva": 45, "hvKv": 132, "lvKv": 33, "zPercent": 12, "xr": 30,
               "tap": {"side": "lv", "stepPercent": 1.5, "min": 1, "max": 17, "neutral": 9, "position": 11,
                       "regulate": {"bus": "LV", "vTarget": 1.0}}}]}
            """;
        TapChanger tap = NetworkFile.Parse(text, "v1.study.json").Transformers.Single().Tap!;
        Assert.Equal(TapWinding.Lv, tap.Winding);
        Assert.Equal(1.5, tap.PercentPerStep);
        Assert.Equal(new TapRange(-8, 8), tap.Range);
        Assert.Equal(2, tap.Position);
        Assert.Equal("LV", tap.Regulate!.Bus);
        // The ratio is what the version 1 file meant: 1 + (11 − 9)·1.5 % on the lv winding.
        Assert.Equal(1.03, tap.FactorAt(tap.Position), 12);
    }

    [Fact]
    public void Version_2_keys_in_a_version_1_file_and_version_1_keys_in_a_version_2_file_are_unknown_keys()
    {
        var inOld = Assert.Throws<InputException>(() => ReadLine("""{"id": "F1", "from": "A", "to": "B", "z1": {"per": "km", "r": 1, "x": 2}}"""));
        Assert.Contains("unknown key 'z1'", inOld.Message);
        string v2 = Version1Line.Replace("\"version\": 1", "\"version\": 2").Replace("LINE", """{"id": "F1", "from": "A", "to": "B", "rOhm": 1, "xOhm": 2}""");
        var inNew = Assert.Throws<InputException>(() => NetworkFile.Parse(v2, "v2.study.json"));
        Assert.Contains("unknown key 'rOhm'", inNew.Message);
    }

    [Theory]
    [InlineData("-1")]
    [InlineData("0")]
    [InlineData("3")]
    [InlineData("1.5")]
    public void Only_versions_this_program_knows_are_read(string version)
    {
        string text = Version1Line.Replace("\"version\": 1", $"\"version\": {version}").Replace("LINE", """{"id": "F1", "from": "A", "to": "B", "rOhm": 1, "xOhm": 2}""");
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "v.study.json"));
        Assert.Contains("file version", e.Message);
        Assert.Equal(1, e.Line);
    }
}
