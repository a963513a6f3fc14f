// What the reader refuses before parsing, each as an input error naming the path: folders, "-", binary
// data, files far larger than any network; and JSON errors in plain words.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests.Io;

public sealed class InputFileTests : IDisposable
{
    private readonly string dir = Directory.CreateTempSubdirectory("study-input-").FullName;

    public void Dispose() => Directory.Delete(dir, recursive: true);

    private string Write(string name, byte[] bytes)
    {
        string path = Path.Combine(dir, name);
        File.WriteAllBytes(path, bytes);
        return path;
    }

    [Fact]
    public void A_folder_given_as_the_file_says_it_is_a_folder()
    {
        var e = Assert.Throws<InputException>(() => NetworkFile.Read(dir));
        Assert.Equal(dir, e.File);
        Assert.StartsWith("this is a folder, not a network file", e.Message);
    }

    [Fact]
    public void A_dash_and_an_empty_path_are_refused_in_words()
    {
        Assert.Contains("'-' stands for standard input", Assert.Throws<InputException>(() => NetworkFile.Read("-")).Message);
        Assert.Contains("no file name given", Assert.Throws<InputException>(() => NetworkFile.Read("")).Message);
    }

    [Fact]
    public void A_missing_file_is_refused_without_the_runtimes_phrasing()
    {
        var e = Assert.Throws<InputException>(() => NetworkFile.Read(Path.Combine(dir, "nowhere.study.json")));
        Assert.Equal("cannot read the file: no such file or folder", e.Message);
    }

    [Fact]
    public void Binary_data_is_refused_at_its_first_chunk_with_line_and_column()
    {
        var e = Assert.Throws<InputException>(() => NetworkFile.Read(Write("zeros.study.json", new byte[1 << 20])));
        Assert.Equal((1, 1), (e.Line, e.Column));
        Assert.Contains("a control character (0x00) at byte 1", e.Message);

        var random = new byte[4096];
        new Random(7).NextBytes(random);
        random[0] = (byte)'{';
        random[10] = 0;
        Assert.Contains("not a network file", Assert.Throws<InputException>(() => NetworkFile.Read(Write("random.bin", random))).Message);
    }

    [Fact]
    public void A_nul_byte_after_the_first_chunk_is_refused_on_its_line()
    {
        byte[] text = System.Text.Encoding.ASCII.GetBytes("{\n" + new string(' ', 100_000) + "\n");
        byte[] bytes = [.. text, 0, .. new byte[1000]];
        var e = Assert.Throws<InputException>(() => NetworkFile.Read(Write("late-nul.study.json", bytes)));
        Assert.Equal((3, 1), (e.Line, e.Column));
        Assert.Contains("a NUL byte at byte 100004", e.Message);
    }

    [Fact]
    public void A_file_larger_than_any_network_is_refused_by_its_size_without_reading_it()
    {
        string path = Path.Combine(dir, "huge.study.json");
        // A sparse file: its length is set, no data is written.
        using (var stream = new FileStream(path, FileMode.CreateNew)) stream.SetLength(InputFile.MaxBytes + 1);
        var e = Assert.Throws<InputException>(() => NetworkFile.Read(path));
        Assert.Contains("the file is larger than 1536 MiB", e.Message);
    }

    [Fact]
    public void Devices_are_read_as_streams_and_refused_by_content()
    {
        if (!File.Exists("/dev/zero")) return;
        Assert.Contains("not a network file", Assert.Throws<InputException>(() => NetworkFile.Read("/dev/zero")).Message);
        Assert.Contains("not a network file", Assert.Throws<InputException>(() => NetworkFile.Read("/dev/urandom")).Message);
    }

    [Theory]
    [InlineData("{\"buses\": [],}", "a comma before a closing bracket or brace (JSON allows none there)")]
    [InlineData("{\"buses\": [{\"id\": \"A\", \"id\": \"B\"}]}", "key 'id' is given twice in one object (at $.buses[0])")]
    [InlineData("{\"buses\": [[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]}", "wrong type of value")]
    public void Json_errors_are_in_plain_words_without_reader_hints(string text, string expected)
    {
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "net.study.json"));
        Assert.Contains(expected, e.Message);
        Assert.DoesNotContain("reader options", e.Message);
        Assert.DoesNotContain("Study.Core", e.Message);
        Assert.NotNull(e.Line);
    }

    [Fact]
    public void A_key_given_twice_is_refused_at_the_line_of_the_second()
    {
        const string text = "{\n  \"buses\": [\n    {\"id\": \"A\", \"kv\": 33,\n     \"kv\": 11}\n  ]\n}";
        var e = Assert.Throws<InputException>(() => NetworkFile.Parse(text, "twice.study.json"));
        Assert.Equal(4, e.Line);
        Assert.StartsWith("twice.study.json:4:", e.Describe());
        Assert.Contains("key 'kv' is given twice in one object (at $.buses[0])", e.Message);
    }
}
