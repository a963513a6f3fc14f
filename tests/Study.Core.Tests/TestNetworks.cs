// Paths of the bundled networks, as copied next to the test assembly.
using Study.Core.Io;
using Study.Core.Model;

namespace Study.Core.Tests;

internal static class TestNetworks
{
    public static string PathOf(string file) => Path.Combine(AppContext.BaseDirectory, "networks", file);

    public static Network Read(string file) => NetworkFile.Read(PathOf(file));

    public static Network Demo => Read("harbour-estate.study.json");
    public static Network DemoBefore => Read("harbour-estate-before.study.json");
    public static Network Ieee14 => Read("ieee14cdf.txt");
    public static Network Ieee30 => Read("ieee30cdf.txt");
}
