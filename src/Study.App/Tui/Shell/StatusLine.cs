// The text of the last screen row: the last solve's summary and the key hints, fitted to the width.
using System.Globalization;
using Study.Core.LoadFlow;

namespace Study.App.Tui.Shell;

/// <summary>Formats the status line so that the summary always shows and hints fill what room is left.</summary>
public static class StatusLine
{
    public const string Hints = "F1 Keys  F2 Save  F4 Edit  F5 Solve  Ins Add  Del Delete  Alt+F Menu  Alt+Q Quit";

    public static string Summary(LoadFlowResult? result, string? scenario, string? running)
    {
        string scen = "scenario " + (scenario ?? "base");
        if (running is not null) return $"{running}  Esc cancels │ {scen}";
        if (result is null) return $"not solved │ {scen}";
        // After a scenario switch the shown results are still the old scenario's until F5.
        if (result.Scenario != scenario) scen += $" (shown: {result.Scenario ?? "base"})";
        var inv = CultureInfo.InvariantCulture;
        if (!result.Converged)
            return $"NOT CONVERGED after {result.Iterations} it (worst bus {result.WorstBus ?? "?"}) │ {scen}";
        int violations = result.Violations.Count;
        return string.Create(inv,
            $"solved {result.Iterations} it │ loss {result.Totals.LossMw:0.000} MW │ {violations} viol. │ {scen}");
    }

    /// <summary>Summary first; the hints are cut to fit (down to none on a narrow screen).</summary>
    public static string Compose(string summary, int width)
    {
        if (summary.Length >= width) return summary[..Math.Max(0, width)];
        int room = width - summary.Length - 3;
        if (room < 8) return summary;
        int cut = Hints.Length <= room ? Hints.Length : Hints[..room].LastIndexOf("  ", StringComparison.Ordinal);
        string hints = cut > 0 ? Hints[..cut] : "";
        return summary + new string(' ', width - summary.Length - hints.Length) + hints;
    }
}
