// The network file reader on damaged files: a Network or a located InputException, never anything else.
using Study.Core.Io;
using Study.Core.Model;
using Xunit.Abstractions;

namespace Study.Core.Tests.Properties;

public class NetworkFileReaderProperties(ITestOutputHelper output)
{
    private const string FileName = "fuzzed.study.json";

    [Fact]
    public void Every_damaged_network_file_gives_a_network_or_a_located_input_error()
    {
        IReadOnlyList<string> seeds = SeedFiles.NetworkFiles;
        var outcomes = new Dictionary<ReaderOutcome, int>();
        int iterations = PropertyRun.Iterations(10_000);
        PropertyRun.ForAll("network file reader", JsonMutator.Mutations(seeds.Count), iterations,
            m =>
            {
                ReaderOutcome outcome = ReaderContract.Check(NetworkFile.Parse, JsonMutator.Apply(seeds[m.Seed], m.Steps), FileName);
                outcomes[outcome] = outcomes.GetValueOrDefault(outcome) + 1;
            },
            m => $"seed file {m.Seed}, edits {string.Join(" ", m.Steps)}");
        output.WriteLine($"{iterations} damaged files: " + string.Join(", ", outcomes.OrderBy(o => o.Key).Select(o => $"{o.Key} {o.Value}")));
        // The edits must reach past the reader: some files still read, some still validate and build.
        Assert.True(outcomes.GetValueOrDefault(ReaderOutcome.Refused) > iterations / 20, "too few files refused by the reader");
        Assert.True(outcomes.GetValueOrDefault(ReaderOutcome.Invalid) > iterations / 20, "too few files reached validation");
        Assert.True(outcomes.GetValueOrDefault(ReaderOutcome.Built) > iterations / 50, "too few files reached the per-unit build");
    }

    [Fact]
    public void A_network_file_cut_at_any_length_gives_a_network_or_a_located_input_error()
    {
        foreach (string seed in new[] { SeedFiles.NetworkFiles[0], SeedFiles.NetworkFiles[3] })
        {
            for (int length = 0; length <= seed.Length; length++)
            {
                ReaderOutcome outcome = ReaderContract.Check(NetworkFile.Parse, seed[..length], FileName);
                if (length < seed.Length - 2) Assert.Equal(ReaderOutcome.Refused, outcome);
            }
        }
    }

    [Fact]
    public void Reading_from_disk_refuses_odd_bytes_with_a_location()
    {
        byte[] json = File.ReadAllBytes(TestNetworks.PathOf("harbour-estate.study.json"));
        byte[][] inputs =
        [
            [],
            [0xEF, 0xBB, 0xBF, .. json],
            [0xFF, 0xFE, .. System.Text.Encoding.Unicode.GetBytes("{\"format\": \"study-network\"}")],
            [0xC3, 0x28, 0xA0, 0xA1, .. json],
            [.. json[..100], 0xFF, 0xFE, 0x00, .. json[100..]],
            [0x00, 0x00, 0x00],
        ];
        string dir = Directory.CreateTempSubdirectory("study-read-").FullName;
        try
        {
            for (int i = 0; i < inputs.Length; i++)
            {
                string path = Path.Combine(dir, $"odd{i}.study.json");
                File.WriteAllBytes(path, inputs[i]);
                ReaderContract.Check((_, name) => NetworkFile.Read(name), "", path);
            }
            var missing = Assert.Throws<InputException>(() => NetworkFile.Read(Path.Combine(dir, "missing.study.json")));
            Assert.NotNull(missing.File);
            Assert.Throws<InputException>(() => NetworkFile.Read(dir));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
