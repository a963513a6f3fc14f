// The first step of every study command: open the case (read and validate), and show its warnings.
using Study.Core.Cases;
using Study.Core.Model.Validation;

namespace Study.App.Cli.Files;

public static class NetworkLoading
{
    /// <summary>How many warnings a study command prints before pointing to <c>study check</c>.</summary>
    private const int ShownWarnings = 5;

    /// <summary>
    /// Opens the case; a network with errors is refused with every error listed (exit 2). Warnings do not
    /// stop the study but are written to <paramref name="err"/>, so a likely mistake (sides swapped, kV
    /// typed as pu) is never solved in silence.
    /// </summary>
    /// <param name="clock">When given, the reading and the validation are timed as stages "read" and "validate".</param>
    public static StudyCase Open(string path, TextWriter err, StageClock? clock = null)
    {
        StudyCase study = StudyCase.Open(path, clock is null ? null : clock.Lap);
        foreach (string note in study.Network.Source.Notes) err.WriteLine("note: " + note);
        IReadOnlyList<Problem> warnings = study.Warnings;
        foreach (Problem w in warnings.Take(ShownWarnings)) err.WriteLine(w.Describe());
        if (warnings.Count > ShownWarnings)
            err.WriteLine($"... and {warnings.Count - ShownWarnings} more warnings; run 'study check {path}' for all of them");
        return study;
    }
}
