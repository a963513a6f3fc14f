// Paths of the bundled demo networks for the study-command tests.
namespace Study.App.Tests.Cli;

internal static class DemoNetworks
{
    /// <summary>The estate with the new Cold Quay 33/11 kV bank.</summary>
    public static string Demo => CliRun.Network("harbour-estate.study.json");

    /// <summary>The same estate before the bank was added.</summary>
    public static string Before => CliRun.Network("harbour-estate-before.study.json");
}
