// Runs a property over generated cases from a fixed seed, so every run checks the same cases unless asked otherwise.
using System.Globalization;
using CsCheck;

namespace Study.Core.Tests.Properties;

/// <summary>
/// The seed and size of a property run. By default every run uses <see cref="DefaultSeed"/>; set
/// STUDY_PROPERTY_SEED to another whole number for other cases and STUDY_PROPERTY_SCALE (say 10) to
/// multiply every iteration count. A failing case is reported with its case number and its CsCheck
/// seed, then shrunk by CsCheck from that seed to a smaller failing case.
/// </summary>
internal static class PropertyRun
{
    public const ulong DefaultSeed = 20_240_917;

    public static ulong Seed { get; } = ReadSeed();

    public static int Scale { get; } = ReadScale();

    /// <summary>Iterations for this run: the default count times STUDY_PROPERTY_SCALE.</summary>
    public static int Iterations(int defaultCount) => checked(defaultCount * Scale);

    /// <summary>
    /// Checks <paramref name="property"/> on <paramref name="iterations"/> cases drawn from
    /// <paramref name="gen"/>. Case i comes from its own PCG stream of the run seed, so a case can be
    /// replayed alone from the seed printed on failure.
    /// </summary>
    public static void ForAll<T>(string name, Gen<T> gen, int iterations, Action<T> property, Func<T, string> print)
    {
        uint stream = Stream(name);
        for (int i = 0; i < iterations; i++)
        {
            var pcg = new PCG(stream + (uint)i, Seed);
            string caseSeed = pcg.ToString();
            T value = gen.Generate(pcg, null, out _);
            try
            {
                property(value);
            }
            catch (Exception e)
            {
                string shrunk = Shrink(gen, property, print, caseSeed);
                throw new PropertyFailedException(
                    $"{name}: case {i} of {iterations} failed (STUDY_PROPERTY_SEED={Seed}, CsCheck seed {caseSeed}).\n" +
                    $"Case: {Clip(print(value))}\nFailure: {e.GetType().Name}: {e.Message}\n{shrunk}", e);
            }
        }
    }

    /// <summary>CsCheck from the failing seed, looking for smaller failing cases; its report names the smallest.</summary>
    private static string Shrink<T>(Gen<T> gen, Action<T> property, Func<T, string> print, string caseSeed)
    {
        try
        {
            gen.Sample(property, seed: caseSeed, iter: 2_000, threads: 1, print: v => Clip(print(v)));
            return "CsCheck could not reproduce the failure from its seed (state outside the case?).";
        }
        catch (Exception shrunk)
        {
            return $"Shrunk by CsCheck:\n{shrunk.Message}";
        }
    }

    private static string Clip(string text) => text.Length <= 4_000 ? text : text[..4_000] + $"… ({text.Length} characters)";

    /// <summary>A stream number per property name (FNV-1a), so two properties never share cases.</summary>
    private static uint Stream(string name)
    {
        uint hash = 2_166_136_261;
        foreach (char c in name) hash = (hash ^ c) * 16_777_619;
        return hash & 0x7FFF_0000;
    }

    private static ulong ReadSeed()
    {
        string? text = Environment.GetEnvironmentVariable("STUDY_PROPERTY_SEED");
        if (string.IsNullOrWhiteSpace(text)) return DefaultSeed;
        return ulong.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out ulong seed)
            ? seed
            : throw new InvalidOperationException($"STUDY_PROPERTY_SEED must be a whole number, not '{text}'");
    }

    private static int ReadScale()
    {
        string? text = Environment.GetEnvironmentVariable("STUDY_PROPERTY_SCALE");
        if (string.IsNullOrWhiteSpace(text)) return 1;
        return int.TryParse(text, NumberStyles.None, CultureInfo.InvariantCulture, out int scale) && scale >= 1
            ? scale
            : throw new InvalidOperationException($"STUDY_PROPERTY_SCALE must be a whole number of at least 1, not '{text}'");
    }
}
