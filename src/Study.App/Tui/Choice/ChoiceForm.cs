// What the bank-choice dialog asks: the transformer, the candidates file, the annual energy, the loss rates, band and scenarios.
using System.Globalization;
using Study.Core.Cases;
using Study.Core.Model;

namespace Study.App.Tui.Choice;

/// <summary>A bank choice asked for: the request and the files to read with the study (off the UI thread).</summary>
public sealed record ChoiceQuestion(BankChoiceRequest Request, string CandidatesPath, string? ProfilePath);

/// <summary>
/// The bank-choice question before it is asked. The annual energy comes from a loss-load factor or from
/// a profile CSV (one of the two); blank loss rates are 0; a blank band is each watched bus's own.
/// </summary>
public sealed class ChoiceForm(Network network, string? activeScenario, string? networkPath)
{
    /// <summary>The two-winding transformers a candidate may replace.</summary>
    public IReadOnlyList<string> Transformers { get; } = network.Transformers.Select(t => t.Id).ToList();

    public string TransformerId { get; set; } = "";
    public string CandidatesText { get; set; } = Suggest(networkPath, "*.candidates.json");
    public string LossLoadFactorText { get; set; } = "";
    public string ProfileText { get; set; } = "";
    public string NoLoadRateText { get; set; } = "";
    public string LoadRateText { get; set; } = "";
    public string BandLowText { get; set; } = "";
    public string BandHighText { get; set; } = "";

    /// <summary>True: every scenario of the network; false: the active one.</summary>
    public bool AllScenarios { get; set; } = true;

    public string ActiveScenarioLabel => Study.App.Reports.Labels.Scenario(activeScenario);

    public (ChoiceQuestion? Question, string? Error) Build()
    {
        if (!Transformers.Contains(TransformerId))
            return (null, Transformers.Count == 0 ? "the network has no two-winding transformer to replace"
                : TransformerId.Trim().Length > 0 ? $"'{TransformerId.Trim()}' is not a two-winding transformer of this network (F4 lists them)"
                : "choose the transformer the candidates replace");
        string candidates = CandidatesText.Trim();
        if (candidates.Length == 0 || !File.Exists(candidates)) return (null, candidates.Length == 0 ? "give the candidates file" : $"{candidates}: no such file");
        string? profile = ProfileText.Trim().Length > 0 ? ProfileText.Trim() : null;
        double? factor = null;
        if (LossLoadFactorText.Trim().Length > 0)
        {
            if (!TryNumber(LossLoadFactorText, out double f)) return (null, "the loss-load factor is a number from 0 to 1, e.g. 0.35");
            factor = f;
        }
        if (profile is null == factor is null) return (null, "give a loss-load factor or a profile CSV (one of the two) for the energy the banks lose");
        if (profile is not null && !File.Exists(profile)) return (null, $"{profile}: no such file");
        if (!Rate(NoLoadRateText, out double a) || !Rate(LoadRateText, out double b)) return (null, "the loss rates are money per kW, e.g. 4000; blank is 0");
        (double, double)? band = null;
        bool lowGiven = BandLowText.Trim().Length > 0, highGiven = BandHighText.Trim().Length > 0;
        if (lowGiven != highGiven) return (null, "give both band limits, or leave both blank for each bus's own vMin–vMax");
        if (lowGiven)
        {
            if (!TryNumber(BandLowText, out double lo) || !TryNumber(BandHighText, out double hi)) return (null, "band limits are per unit, e.g. 0.97 and 1.03");
            band = (lo, hi);
        }
        if (!AllScenarios && activeScenario is not null && network.FindScenario(activeScenario) is null)
            return (null, $"scenario '{activeScenario}' is no longer in the network: choose all scenarios");
        var request = new BankChoiceRequest
        {
            TransformerId = TransformerId, Band = band, Scenarios = AllScenarios ? [] : [activeScenario],
            NoLoadRate = a, LoadRate = b, LossLoadFactor = factor,
        };
        try
        {
            request.Validate();
        }
        catch (InputException e)
        {
            return (null, e.Message);
        }
        return (new ChoiceQuestion(request, candidates, profile), null);
    }

    /// <summary>The transformer the suggested candidates file names, when it is one of the network's; null when the file cannot be read.</summary>
    public string? NamedByCandidates()
    {
        try
        {
            string? named = File.Exists(CandidatesText.Trim()) ? Study.Core.Io.CandidatesFile.Read(CandidatesText.Trim()).Transformer : null;
            return named is not null && Transformers.Contains(named) ? named : null;
        }
        catch (Exception e) when (e is InputException or IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    private static bool Rate(string text, out double v)
    {
        v = 0;
        return text.Trim().Length == 0 || TryNumber(text, out v);
    }

    private static bool TryNumber(string text, out double v) =>
        double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out v) && double.IsFinite(v);

    /// <summary>The first file matching <paramref name="pattern"/> beside the network, or the folder to type it in.</summary>
    private static string Suggest(string? networkPath, string pattern)
    {
        string folder = networkPath is null ? Directory.GetCurrentDirectory() : Path.GetDirectoryName(Path.GetFullPath(networkPath)) ?? ".";
        if (!Directory.Exists(folder)) return "";
        return Directory.EnumerateFiles(folder, pattern).Order(StringComparer.Ordinal).FirstOrDefault() ?? folder + Path.DirectorySeparatorChar;
    }
}
