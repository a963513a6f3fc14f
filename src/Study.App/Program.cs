// The `study` executable: subcommands go to the command line; no argument or a file opens the terminal UI.
using Study.App.Cli;
using Study.App.Tui.Shell;

if (args.Length == 0 || (args.Length == 1 && !StudyCommand.IsCommand(args[0]) && !args[0].StartsWith('-')))
{
    if (Console.IsInputRedirected || Console.IsOutputRedirected) return StudyCommand.NoTerminal(Console.Error);
    return StudyTui.Run(args.Length == 0 ? null : args[0]);
}

using Stream stdout = Console.OpenStandardOutput();
var context = new CommandContext(Console.Out, Console.Error) { OutStream = stdout };
return StudyCommand.Run(args, context);
