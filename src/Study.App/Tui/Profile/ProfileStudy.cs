// The main screen's profile command: ask, read the CSV and run every step off the UI thread, show the Profile tab.
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Studies;

namespace Study.App.Tui.Profile;

/// <summary>With progress (steps done, rate, time left) and Esc to cancel, as the outage screening.</summary>
public static class ProfileStudy
{
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<MainWindow, ProfileForm> Last = new();

    public static void Run(MainWindow main)
    {
        ProfileForm form = Last.TryGetValue(main, out ProfileForm? last) ? last : new ProfileForm(main.Session.Network, main.Session.ActiveScenario, main.Session.Path);
        if (!ProfileDialog.Run(main.App, form) || form.Build().Question is not { } question) return;
        Last.AddOrUpdate(main, form);
        Network snapshot = main.Session.Network;
        string? path = main.Session.Path;
        double fraction = 0;
        var progress = new Progress<double>(f => fraction = f);
        int steps = StepCount(question.CsvPath);
        ResultStamp stamp = main.Now(scenarioMatters: false);
        ResultStudy.Run(main, "Profile", ResultKind.Profile, main.Results.ProfileTab, stamp, cancel =>
            {
                LoadProfile profile = ProfileFile.Read(question.CsvPath, question.StepMinutes);
                return StudyCase.Of(snapshot, path).Profile(question.Request, profile, progress, cancel);
            },
            result => main.Results.Profile.Show(result, question.CsvPath),
            note: result => result.StepsNotConverged > 0 ? $"{result.StepsNotConverged} of {result.Steps} steps did not converge" : null,
            progress: new ProgressMeter(() => fraction, steps, "steps"));
    }

    /// <summary>The steps for the progress line: the file's rows after its header (the study reads it properly).</summary>
    private static int StepCount(string csv)
    {
        try
        {
            return Math.Max(1, File.ReadLines(csv).Skip(1).Count(l => l.Trim().Length > 0));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return 1;
        }
    }
}
