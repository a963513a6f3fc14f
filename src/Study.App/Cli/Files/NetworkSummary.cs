// One line describing what a network holds, for command headers.
using Study.Core.Model;

namespace Study.App.Cli.Files;

public static class NetworkSummary
{
    public static string Describe(Network n)
    {
        int branches = n.Lines.Count + n.Transformers.Count + n.ThreeWindingTransformers.Count;
        string kv = n.IsPerUnitOnly ? ", per-unit only (kV not stated)" : "";
        return $"{Plural(n.Buses.Count, "bus", "buses")}, {Plural(branches, "branch", "branches")} "
             + $"({n.Lines.Count} lines, {n.Transformers.Count + n.ThreeWindingTransformers.Count} transformers), "
             + $"{Plural(n.Supplies.Count + n.Generators.Count, "source", "sources")}, "
             + $"{Plural(n.Loads.Count, "load", "loads")}, {Plural(n.Shunts.Count, "shunt", "shunts")}, "
             + (n.Motors.Count > 0 ? $"{Plural(n.Motors.Count, "motor", "motors")}, " : "")
             + $"{Plural(n.Breakers.Count, "breaker", "breakers")}, {Plural(n.Scenarios.Count, "scenario", "scenarios")}{kv}";
    }

    private static string Plural(int count, string one, string many) => $"{count} {(count == 1 ? one : many)}";
}
