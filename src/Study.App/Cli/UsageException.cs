// A command-line mistake: unknown option, missing argument, bad value.
namespace Study.App.Cli;

/// <summary>Raised for a malformed command line; reported with the command's usage, exit code 2.</summary>
public sealed class UsageException(string message) : Exception(message);
