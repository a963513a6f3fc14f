// The IEEE Common Format reader on damaged cases: a Network or an InputException at line and column.
using Study.Core.Io;
using Study.Core.Model;
using Xunit.Abstractions;

namespace Study.Core.Tests.Properties;

public class CommonFormatReaderProperties(ITestOutputHelper output)
{
    private const string FileName = "fuzzed-cdf.txt";

    [Fact]
    public void Every_damaged_common_format_case_gives_a_network_or_a_located_input_error()
    {
        IReadOnlyList<string> seeds = SeedFiles.CommonFormatCases;
        var outcomes = new Dictionary<ReaderOutcome, int>();
        int iterations = PropertyRun.Iterations(10_000);
        PropertyRun.ForAll("common format reader", CardMutator.Mutations(seeds.Count), iterations,
            m =>
            {
                string text = CardMutator.Apply(seeds[m.Seed], m.Steps);
                ReaderOutcome outcome = ReaderContract.Check(CommonFormatReader.Parse, text, FileName);
                outcomes[outcome] = outcomes.GetValueOrDefault(outcome) + 1;
                // The same text through the format-sniffing entry point keeps the same promise.
                ReaderContract.Check(NetworkFile.Parse, text, FileName);
            },
            m => $"seed case {m.Seed}, edits {string.Join(" ", m.Steps)}");
        output.WriteLine($"{iterations} damaged cases: " + string.Join(", ", outcomes.OrderBy(o => o.Key).Select(o => $"{o.Key} {o.Value}")));
        Assert.True(outcomes.GetValueOrDefault(ReaderOutcome.Refused) > iterations / 20, "too few cases refused by the reader");
        Assert.True(outcomes.GetValueOrDefault(ReaderOutcome.Built) > iterations / 20, "too few cases reached the per-unit build");
    }

    [Fact]
    public void A_common_format_case_cut_at_any_length_gives_a_network_or_a_located_input_error()
    {
        foreach (string seed in SeedFiles.CommonFormatCases.Take(2))
        {
            for (int length = 0; length <= seed.Length; length++)
                ReaderContract.Check(CommonFormatReader.Parse, seed[..length], FileName);
        }
    }

    [Fact]
    public void A_space_inserted_or_deleted_anywhere_in_a_card_gives_a_network_or_a_located_input_error()
    {
        string seed = SeedFiles.CommonFormatCases[0];
        for (int at = 0; at < seed.Length; at++)
        {
            if (seed[at] is '\n' or '\r') continue;
            ReaderContract.Check(CommonFormatReader.Parse, seed.Insert(at, " "), FileName);
            ReaderContract.Check(CommonFormatReader.Parse, seed.Remove(at, 1), FileName);
        }
    }
}
