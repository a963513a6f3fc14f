// What the tap-study dialog asks, as plain texts, and the engine request they make.
using System.Globalization;
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Tui.Taps;

/// <summary>
/// The tap-study question before it is asked: band and watched buses as typed (blank = the engine's
/// defaults: each bus's own vMin..vMax, the buses the bank feeds at its lv level), and the scenarios.
/// </summary>
public sealed class TapStudyForm(Network network, string transformerId, string? activeScenario)
{
    public string TransformerId { get; } = transformerId;
    public string BandLowText { get; set; } = "";
    public string BandHighText { get; set; } = "";
    public string WatchText { get; set; } = "";

    /// <summary>True: every scenario of the network; false: the active scenario only.</summary>
    public bool AllScenarios { get; set; } = true;

    /// <summary>True: the other on-load tap changers stay at their positions while this one moves.</summary>
    public bool HoldOtherTaps { get; set; }

    public string ActiveScenarioLabel => Labels.Scenario(activeScenario);

    /// <summary>The request, or the reason the texts do not make one.</summary>
    public (TapStudyRequest? Request, string? Error) Build()
    {
        (double, double)? band = null;
        bool lowGiven = BandLowText.Trim().Length > 0, highGiven = BandHighText.Trim().Length > 0;
        if (lowGiven != highGiven) return (null, "give both band limits, or leave both blank for each bus's own vMin–vMax");
        if (lowGiven)
        {
            if (!TryNumber(BandLowText, out double lo) || !TryNumber(BandHighText, out double hi)) return (null, "band limits are per unit, e.g. 0.97 and 1.03");
            band = (lo, hi);
        }
        string[] watch = WatchText.Split([',', ' ', ';'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        foreach (string bus in watch)
            if (network.FindBus(bus) is null) return (null, $"watched bus {bus} is not in the network");
        // Empty means every scenario; a null name is the loads as entered.
        IReadOnlyList<string?> scenarios = AllScenarios ? [] : [activeScenario];
        var request = new TapStudyRequest
        {
            TransformerId = TransformerId, WatchBuses = watch, Band = band, Scenarios = scenarios, HoldOtherTaps = HoldOtherTaps,
        };
        try
        {
            request.Validate();
        }
        catch (InputException e)
        {
            return (null, e.Message);
        }
        return (request, null);
    }

    /// <summary>Transformers (two- and three-winding) that have a tap changer with a range to study.</summary>
    public static IReadOnlyList<string> TappedTransformers(Network network) =>
        network.Transformers.Where(t => t.Tap is { } tap && tap.Range.Highest > tap.Range.Lowest).Select(t => t.Id)
            .Concat(network.ThreeWindingTransformers.Where(t => t.Tap is { } tap && tap.Range.Highest > tap.Range.Lowest).Select(t => t.Id))
            .ToList();

    private static bool TryNumber(string text, out double v) =>
        double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out v);
}
