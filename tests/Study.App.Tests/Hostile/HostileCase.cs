// One hostile input to the study command: how it is set up, what the command line is, and what must hold.
namespace Study.App.Tests.Hostile;

/// <summary>What a hostile case may end in. None of them may end in exit 4, a hang or raw control characters.</summary>
public enum Expect
{
    /// <summary>Refused: exit 2.</summary>
    Refused,
    /// <summary>A plausible mistake: refused (2), not solved (3), or done (0) only with a warning on standard error.</summary>
    Flagged,
    /// <summary>Anything but a fault of the program: exit 0, 2 or 3.</summary>
    NoFault,
}

/// <param name="Class">The class of the work order the case belongs to (unit slip, set points, output, ...).</param>
/// <param name="Setup">Writes the case's files into the folder given and returns the command line.</param>
/// <param name="Check">A further condition on the outcome: null when it holds, else what is wrong.</param>
internal sealed record HostileCase(string Name, string Class, Func<string, string[]> Setup, Expect Expect,
    Func<Cli.CliOutcome, string?>? Check = null);
