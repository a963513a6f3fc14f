// What the compare dialog asks: two scenarios of this network, or another network file against this one.
using Study.App.Reports;
using Study.Core.Model;

namespace Study.App.Tui.Compare;

/// <summary>The before and after cases, as chosen; <see cref="Build"/> checks the choice against the network.</summary>
public sealed class CompareForm(Network network, string? activeScenario, string? path)
{
    /// <summary>
    /// The before network file when <see cref="BeforeIsFile"/>: "x-before.study.json" beside "x.study.json"
    /// when there is one, else the network's own file as saved (the network before the edits since).
    /// </summary>
    public string BeforePath { get; set; } = SuggestedBefore(path);

    /// <summary>
    /// True: the before case is another network file (the network before a change), solved in
    /// <see cref="AfterScenario"/> too. Chosen at first when a before file lies beside the network.
    /// </summary>
    public bool BeforeIsFile { get; set; } = path is not null && File.Exists(BeforeFileBeside(path));

    /// <summary>Scenario names; null is the case as entered.</summary>
    public string? BeforeScenario { get; set; } = activeScenario;

    public string? AfterScenario { get; set; } = activeScenario;

    /// <summary>The scenario choices: as entered, then each scenario of the network.</summary>
    public IReadOnlyList<string?> Scenarios { get; } = [null, .. network.Scenarios.Select(s => s.Name)];

    public static string ScenarioLabel(string? name) => Labels.Scenario(name);

    /// <summary>The request, or why the choice does not make one.</summary>
    public (CompareRequest? Request, string? Error) Build()
    {
        if (BeforeIsFile)
        {
            string file = BeforePath.Trim();
            if (file.Length == 0) return (null, "give the before network's file, or compare two scenarios of this network");
            if (!File.Exists(file)) return (null, $"no file {file}");
            return (new CompareRequest(file, AfterScenario, AfterScenario), null);
        }
        if (BeforeScenario == AfterScenario)
            return (null, $"before and after are both {Labels.Scenario(BeforeScenario)}: choose two different scenarios");
        return (new CompareRequest(null, BeforeScenario, AfterScenario), null);
    }

    /// <summary>"x-before.study.json" beside "x.study.json" when it exists (the demo pair), else the network's file, else the folder.</summary>
    private static string SuggestedBefore(string? path)
    {
        if (path is null) return Directory.GetCurrentDirectory() + Path.DirectorySeparatorChar;
        string beside = BeforeFileBeside(path);
        if (File.Exists(beside)) return beside;
        return File.Exists(path) ? path : (Path.GetDirectoryName(path) ?? "") + Path.DirectorySeparatorChar;
    }

    private static string BeforeFileBeside(string path)
    {
        string name = Path.GetFileName(path);
        string stem = name.EndsWith(".study.json", StringComparison.OrdinalIgnoreCase) ? name[..^".study.json".Length] : Path.GetFileNameWithoutExtension(name);
        return Path.Combine(Path.GetDirectoryName(path) ?? "", stem + "-before.study.json");
    }
}

/// <summary>A comparison asked for: the before file (null: this network) and the scenario of each side.</summary>
public sealed record CompareRequest(string? BeforePath, string? BeforeScenario, string? AfterScenario);
