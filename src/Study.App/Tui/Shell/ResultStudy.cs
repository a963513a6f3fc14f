// How every study of the main screen ends: shown, stamped and its tab opened; or its old result cleared and the failure told.
using Study.Core.Faults;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>
/// One way for each study command to run off the UI thread and end. A result is shown, stamped with
/// what it was computed from and its tab brought up; a result the study refused ("not run: …"), an
/// exception or a cancel clears the tab's old result (so nothing stale stands as the answer) and is told
/// in a message box, with the fault caution for studies that give equipment duty.
/// </summary>
public static class ResultStudy
{
    /// <param name="title">The study's name, for progress and messages ("Fault study").</param>
    /// <param name="kind">The result it replaces.</param>
    /// <param name="tab">The tab that shows it.</param>
    /// <param name="stamp">What it was computed from, taken with <see cref="MainWindow.Now"/> as it starts.</param>
    /// <param name="work">The study, on a snapshot of the network.</param>
    /// <param name="show">Puts a result on its tab.</param>
    /// <param name="refused">Why a result is no answer at all (the study declined to run), or null.</param>
    /// <param name="note">A line for the status bar once shown ("3 of 96 steps did not converge"), or null.</param>
    /// <param name="caution">True for studies of fault levels and equipment duty: messages carry the caution.</param>
    public static void Run<T>(MainWindow main, string title, ResultKind kind, View tab, ResultStamp stamp,
        Func<CancellationToken, T> work, Action<T> show, Func<T, string?>? refused = null, Func<T, string?>? note = null,
        bool caution = false, ProgressMeter? progress = null)
    {
        void Failed(string message, string told)
        {
            main.Fail(kind, message);
            Prompts.Tell(main.App, title, caution ? told + "\n\n" + FaultStudy.Caution : told);
        }
        main.Runner.Start(title, work,
            result =>
            {
                if (refused?.Invoke(result) is { } why)
                {
                    Failed($"{char.ToLowerInvariant(title[0])}{title[1..]} not run: {why}", $"{title} not run: {why}");
                    return;
                }
                show(result);
                main.Stamp(kind, stamp);
                main.ShowStudyTab(tab);
                if (note?.Invoke(result) is { } line) main.Status.Message = line;
            },
            message => Failed(message, message),
            progress);
    }
}
