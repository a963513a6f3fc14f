// Short labels the screen tables and charts share: scenario names and signed tap positions.
using System.Globalization;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Reports;

public static class Labels
{
    /// <summary>A scenario as the screen names it; no scenario means the loads as entered.</summary>
    public static string Scenario(string? scenario) => scenario ?? "as entered";

    /// <summary>Signed position as the tap table names it: +2, 0, -3.</summary>
    public static string Position(int position) =>
        position > 0 ? "+" + position.ToString(CultureInfo.InvariantCulture) : position.ToString(CultureInfo.InvariantCulture);

    /// <summary>A branch kind in a table cell, a CSV cell and JSON: line, transformer, three-winding.</summary>
    public static string Kind(BranchKind kind) => kind switch
    {
        BranchKind.Line => "line",
        BranchKind.Transformer => "transformer",
        _ => "three-winding",
    };

    /// <summary>What a violation names: a bus, or a branch by its kind.</summary>
    public static string Kind(ElementKind kind) => kind switch
    {
        ElementKind.Bus => "bus",
        ElementKind.Line => "line",
        ElementKind.Transformer => "transformer",
        ElementKind.ThreeWindingTransformer => "three-winding",
        _ => ElementKinds.Label(kind),
    };

    /// <summary>The end of a tap range: "lowest", "highest"; null when the tap is not at either.</summary>
    public static string? Limit(TapLimit? limit) => limit switch
    {
        TapLimit.Lowest => "lowest",
        TapLimit.Highest => "highest",
        _ => null,
    };

    /// <summary>A bus held at a reactive limit: "G7 at max".</summary>
    public static string Limit(ReactiveLimitState state) => $"{state.Bus} at {(state.Side == ReactiveLimitSide.Max ? "max" : "min")}";
}
