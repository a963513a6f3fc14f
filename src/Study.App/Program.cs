// The `study` executable: subcommands go to the command line, anything else opens the terminal UI.
using Study.App.Cli;

var context = new CommandContext(Console.Out, Console.Error);
return StudyCommand.Run(args, context);
