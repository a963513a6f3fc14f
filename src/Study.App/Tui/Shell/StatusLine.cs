// The text of the last screen row: the state of the results, the last action's outcome, and the key hints.
using System.Globalization;
using Study.App.Reports;
using Study.Core.LoadFlow;

namespace Study.App.Tui.Shell;

/// <summary>Formats the status line so that the summary always shows and hints fill what room is left.</summary>
public static class StatusLine
{
    public const string Hints = "F1 Keys  F2 Save  F4 Edit  F5 Solve  Ins Add  Del Delete  Alt+F Menu  Alt+Q Quit";

    /// <param name="stale">True when a result on screen is of another network or scenario than the one now edited.</param>
    /// <param name="failed">True when the last load flow failed: its old result was cleared, and "not solved" would read as if none had been asked for.</param>
    public static string Summary(LoadFlowResult? result, string? scenario, string? running, bool stale = false, bool failed = false)
    {
        string scen = "scenario " + Labels.Scenario(scenario);
        if (running is not null) return $"{running} │ {scen}";
        // The old solve's numbers are left out: out of date, they would be read as the answer.
        if (stale) return $"RESULTS OUT OF DATE: F5 re-solves │ {scen}";
        if (failed) return $"LOAD FLOW FAILED: no results shown │ {scen}";
        if (result is null) return $"not solved │ {scen}";
        // After a scenario switch the shown results are still the old scenario's until F5.
        if (result.Scenario != scenario) scen += $" (shown: {Labels.Scenario(result.Scenario)})";
        var inv = CultureInfo.InvariantCulture;
        if (!result.Converged)
            return $"NOT CONVERGED after {result.Iterations} it (worst bus {result.WorstBus ?? "?"}) │ {scen}";
        int violations = result.Violations.Count;
        return string.Create(inv,
            $"solved {result.Iterations} it │ loss {result.Totals.LossMw:0.000} MW │ {violations} viol. │ {scen}");
    }

    /// <summary>
    /// Summary first, then the last action's message; the hints are cut to fit (down to none on a narrow
    /// screen). When summary and message do not fit together, the summary is cut to its first part
    /// (the state: solved, out of date) so that the message shows whole.
    /// </summary>
    public static string Compose(string summary, int width, string? message = null)
    {
        if (message is { Length: > 0 })
        {
            string both = summary + " │ " + message;
            if (both.Length > width && summary.IndexOf(" │ ", StringComparison.Ordinal) is int first and > 0)
                both = summary[..first] + " │ " + message;
            summary = both;
        }
        if (summary.Length >= width) return summary[..Math.Max(0, width)];
        int room = width - summary.Length - 3;
        if (room < 8) return summary;
        int cut = Hints.Length <= room ? Hints.Length : Hints[..room].LastIndexOf("  ", StringComparison.Ordinal);
        string hints = cut > 0 ? Hints[..cut] : "";
        return summary + new string(' ', width - summary.Length - hints.Length) + hints;
    }
}
