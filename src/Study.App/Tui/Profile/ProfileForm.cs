// What the profile dialog asks: the profile CSV, the step length, the scenario and the watched buses.
using System.Globalization;
using Study.Core.Cases;
using Study.Core.Model;

namespace Study.App.Tui.Profile;

/// <summary>A profile study asked for: the request, and the CSV to read (read with the study, off the UI thread).</summary>
public sealed record ProfileQuestion(ProfileRequest Request, string CsvPath, double? StepMinutes);

/// <summary>
/// The profile question before it is asked. The CSV starts as the profile file beside the network
/// (the first "*.profile.csv" there), blank step minutes take the spacing of the time column, blank
/// watched buses the buses the on-load changers regulate.
/// </summary>
public sealed class ProfileForm(Network network, string? activeScenario, string? networkPath)
{
    public string CsvText { get; set; } = Suggest(networkPath);
    public string StepMinutesText { get; set; } = "";
    public string WatchText { get; set; } = "";

    public string? Scenario { get; set; } = activeScenario is not null && network.FindScenario(activeScenario) is not null ? activeScenario : null;

    public IReadOnlyList<string?> ScenarioChoices { get; } = [null, .. network.Scenarios.Select(s => s.Name)];

    public (ProfileQuestion? Question, string? Error) Build()
    {
        string csv = CsvText.Trim();
        if (csv.Length == 0) return (null, "give the profile CSV: a time column and a 'scale' column or one column per load id");
        if (!File.Exists(csv)) return (null, $"{csv}: no such file");
        double? step = null;
        if (StepMinutesText.Trim().Length > 0)
        {
            if (!double.TryParse(StepMinutesText.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double m) || !(m > 0) || !double.IsFinite(m))
                return (null, "step minutes: a number of minutes above zero, e.g. 15; blank takes the spacing of the time column");
            step = m;
        }
        string[] watch = WatchText.Split([',', ' ', ';'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        foreach (string bus in watch)
            if (network.FindBus(bus) is null) return (null, $"watched bus {bus} is not in the network");
        var request = new ProfileRequest { Scenario = Scenario, WatchBuses = watch };
        try
        {
            request.Validate();
        }
        catch (InputException e)
        {
            return (null, e.Message);
        }
        return (new ProfileQuestion(request, csv, step), null);
    }

    /// <summary>The first profile CSV beside the network file, or the folder to type it in.</summary>
    private static string Suggest(string? networkPath)
    {
        string folder = networkPath is null ? Directory.GetCurrentDirectory() : Path.GetDirectoryName(Path.GetFullPath(networkPath)) ?? ".";
        if (!Directory.Exists(folder)) return "";
        string? first = Directory.EnumerateFiles(folder, "*.profile.csv").Order(StringComparer.Ordinal).FirstOrDefault();
        return first ?? folder + Path.DirectorySeparatorChar;
    }
}
