// The texts the reader properties start from: the bundled networks and networks generated from fixed tapes.
using CsCheck;
using Study.Core.Io;

namespace Study.Core.Tests.Properties;

internal static class SeedFiles
{
    public static string Bundled(string name) => File.ReadAllText(TestNetworks.PathOf(name));

    /// <summary>The bundled network files and generated ones of every element kind, as written by the program.</summary>
    public static IReadOnlyList<string> NetworkFiles { get; } = BuildNetworkFiles();

    /// <summary>The bundled Common Format cases, with LF and with CRLF line ends.</summary>
    public static IReadOnlyList<string> CommonFormatCases { get; } =
    [
        Bundled("ieee14cdf.txt"),
        Bundled("ieee30cdf.txt"),
        Bundled("ieee14cdf.txt").Replace("\r\n", "\n").Replace("\n", "\r\n"),
        Bundled("ieee30cdf.txt").Replace("\r\n", "\n"),
    ];

    private static List<string> BuildNetworkFiles()
    {
        var files = new List<string> { Bundled("harbour-estate.study.json"), Bundled("harbour-estate-before.study.json") };
        for (uint i = 0; i < 6; i++)
        {
            files.Add(NetworkFile.ToJson(EveryKindNetworks.Gen.Generate(new PCG(1000 + i, 7), null, out _)));
            files.Add(NetworkFile.ToJson(SmallSolvableNetworks.Gen.Generate(new PCG(2000 + i, 7), null, out _)));
        }
        return files;
    }
}
