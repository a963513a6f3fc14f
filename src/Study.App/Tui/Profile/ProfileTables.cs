// Profile results for the Profile tab: the findings, the energy balance, the transformers and buses (ProfileColumns).
using Study.App.Cli.Profile;
using Study.App.Reports;
using Study.Core.Studies;

namespace Study.App.Tui.Profile;

/// <summary>Nothing here is computed, only laid out; the findings are the command line's own sentences.</summary>
public static class ProfileTables
{
    public const string NotYet = "No profile yet: Alt+L runs a load flow at every step of a profile CSV.";

    public static string[] EnergyHeaders => ProfileColumns.Energy.Headings;

    public static string[] TransformerHeaders => ProfileColumns.Transformers.Headings;

    /// <summary>What was run, then the findings; steps that did not converge are said first.</summary>
    public static string Heading(ProfileResult r, string csv)
    {
        var lines = new List<string> { $"{Path.GetFileName(csv)} · {Labels.Scenario(r.Scenario)} · {r.Steps} steps, {Numbers.Fixed(r.Hours, 2)} h" };
        if (r.StepsNotConverged > 0)
            lines.Add($"{Marks.Low} {r.StepsNotConverged} of {r.Steps} steps did not converge and count in no figure; the first: {r.FirstFailure}");
        lines.AddRange(ProfileReport.Findings(r));
        return string.Join("\n", lines);
    }

    public static TextTableSource Energy(ProfileResult r) => TextTableSource.Of(ProfileColumns.Energy, ProfileColumns.EnergyRows(r.Energy));

    public static TextTableSource Transformers(ProfileResult r) => TextTableSource.Of(ProfileColumns.Transformers, r.Transformers);

    public static TextTableSource Buses(ProfileResult r) => TextTableSource.Of(ProfileColumns.Buses, r.Buses);
}
