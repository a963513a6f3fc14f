// Process exit codes of the study command (README, Commands).
namespace Study.App.Cli;

public static class ExitCode
{
    /// <summary>The work was done; violations are reported, not failures.</summary>
    public const int Done = 0;
    /// <summary>Bad input: file, syntax, reference, physical data or command-line usage.</summary>
    public const int InputError = 2;
    /// <summary>The load flow did not converge.</summary>
    public const int NoConvergence = 3;
    /// <summary>A fault in the program itself.</summary>
    public const int Internal = 4;
}
