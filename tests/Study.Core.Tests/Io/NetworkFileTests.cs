// The network file: exact round trip, stable layout, and errors that name the key, line and column.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Io;

public class NetworkFileTests
{
    private const string Small = """
        {
          "format": "study-network",
          "version": 1,
          "name": "Two-bus check",
          "baseMva": 100,
          "buses": [
            {"id": "HV", "kv": 132},
            {"id": "MV", "kv": 33, "vMin": 0.97, "vMax": 1.03}
          ],
          "supplies": [{"id": "GRID", "bus": "HV", "scMvaMax": 3000, "xr": 12}],
          "loads": [{"id": "L1", "bus": "MV", "pMw": 10, "qMvar": 3, "zip": {"z": 0.2, "i": 0.3, "p": 0.5}}],
          "transformers": [
            {"id": "T1", "hv": "HV", "lv": "MV", "mva": 45, "hvKv": 132, "lvKv": 33, "zPercent": 12.5, "xr": 30,
             "vectorGroup": "YNd11", "tap": {"side": "hv", "stepPercent": 1.25, "min": -8, "max": 8, "position": 2,
             "regulate": {"bus": "MV", "vTarget": 1.0, "bandPu": 0.015}}, "inService": false}
          ],
          "generators": [{"id": "G1", "bus": "MV", "mode": "pq", "pMw": 2}]
        }
        """;

    [Fact]
    public void Reading_fills_stated_defaults()
    {
        Network n = NetworkFile.Parse(Small, "small.study.json");
        Assert.Equal(0.95, n.Buses[0].VMin);
        Assert.Equal(1.05, n.Buses[0].VMax);
        Assert.Equal(1, n.Transformers[0].Units);
        Assert.False(n.Transformers[0].InService);
        Assert.True(n.Loads[0].InService);
        Assert.Equal(TapWinding.Hv, n.Transformers[0].Tap!.Winding);
        Assert.Equal(2, n.Transformers[0].Tap!.Position);
        Assert.Equal(GeneratorMode.Pq, n.Generators[0].Mode);
        Assert.Equal(50, n.FrequencyHz);
    }

    [Fact]
    public void Write_then_read_gives_the_same_file_byte_for_byte()
    {
        Network first = NetworkFile.Parse(Small, "small.study.json");
        string once = NetworkFile.ToJson(first);
        string twice = NetworkFile.ToJson(NetworkFile.Parse(once));
        Assert.Equal(once, twice);
        Assert.Contains("\n  \"buses\": [", once);
        Assert.Contains("\"inService\": false", once);
        Assert.DoesNotContain("\"inService\": true", once);
    }

    [Fact]
    public void Keys_are_written_in_a_stable_order()
    {
        string json = NetworkFile.ToJson(NetworkFile.Parse(Small));
        int format = json.IndexOf("\"format\"", StringComparison.Ordinal);
        int buses = json.IndexOf("\"buses\"", StringComparison.Ordinal);
        int supplies = json.IndexOf("\"supplies\"", StringComparison.Ordinal);
        int transformers = json.IndexOf("\"transformers\"", StringComparison.Ordinal);
        Assert.True(format < buses && buses < supplies && supplies < transformers);
    }

    [Fact]
    public void An_unknown_key_is_an_error_naming_the_key_and_line()
    {
        string text = Small.Replace("{\"id\": \"HV\", \"kv\": 132}", "{\"id\": \"HV\", \"kv\": 132, \"voltz\": 1}");
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "bad.study.json"));
        Assert.Contains("voltz", e.Message);
        Assert.Equal(7, e.Line);
        Assert.StartsWith("bad.study.json:7:", e.Describe());
    }

    [Fact]
    public void Malformed_json_reports_line_and_column()
    {
        string text = Small.Replace("\"baseMva\": 100,", "\"baseMva\": 100,,");
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "broken.study.json"));
        Assert.Equal(5, e.Line);
        Assert.NotNull(e.Column);
    }

    [Fact]
    public void A_missing_id_is_reported()
    {
        string text = Small.Replace("{\"id\": \"L1\", ", "{");
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "noid.study.json"));
        Assert.Contains("'id'", e.Message);
    }

    [Fact]
    public void A_text_value_where_a_number_belongs_is_reported_with_its_path()
    {
        string text = Small.Replace("\"pMw\": 10", "\"pMw\": \"ten\"");
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "type.study.json"));
        Assert.Contains("pMw", e.Message);
    }

    [Fact]
    public void Element_lines_are_remembered_for_messages()
    {
        Network n = NetworkFile.Parse(Small, "small.study.json");
        Assert.Equal(8, n.Source.LineOf(ElementFamily.Bus, "MV"));
        Assert.Equal("small.study.json", n.Source.File);
    }

    [Fact]
    public void Content_that_is_neither_format_is_refused()
    {
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse("hello", "notes.txt"));
        Assert.Contains("BUS DATA FOLLOWS", e.Message);
    }

    [Fact]
    public void Writing_is_atomic_the_old_file_survives_a_failed_write()
    {
        string dir = Directory.CreateTempSubdirectory("study-atomic").FullName;
        string path = Path.Combine(dir, "net.study.json");
        Network n = NetworkFile.Parse(Small);
        NetworkFile.Write(n, path);
        string before = File.ReadAllText(path);
        AtomicFile.BeforeRename = _ => throw new IOException("disk full (simulated)");
        try
        {
            // A failed write is an input error naming the path and the reason (exit 2 at the command line).
            var e = Assert.Throws<InputException>(() => NetworkFile.Write(n with { Name = "changed" }, path));
            Assert.Equal($"cannot write {path}: disk full (simulated)", e.Message);
        }
        finally
        {
            AtomicFile.BeforeRename = null;
        }
        Assert.Equal(before, File.ReadAllText(path));
        Assert.Single(Directory.GetFiles(dir));
    }
}
