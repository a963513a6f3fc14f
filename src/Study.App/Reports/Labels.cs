// Short labels the screen tables and charts share: scenario names and signed tap positions.
using System.Globalization;

namespace Study.App.Reports;

public static class Labels
{
    /// <summary>A scenario as the screen names it; no scenario means the loads as entered.</summary>
    public static string Scenario(string? scenario) => scenario ?? "as entered";

    /// <summary>Signed position as the tap table names it: +2, 0, -3.</summary>
    public static string Position(int position) =>
        position > 0 ? "+" + position.ToString(CultureInfo.InvariantCulture) : position.ToString(CultureInfo.InvariantCulture);
}
