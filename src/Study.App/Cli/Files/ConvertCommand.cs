// `study convert IN OUT`: any readable network (network file or IEEE Common Format) to a network file.
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;

namespace Study.App.Cli.Files;

public sealed class ConvertCommand : CliCommand
{
    public override string Name => "convert";
    public override string Summary => "convert an IEEE Common Format case (or a network file) to a network file";
    protected override void Declare(Declaration d) => d
        .Positional("IN", "the file to convert: an IEEE Common Format case or a network file of any version")
        .Positional("OUT", "the network file to write (the current version), e.g. case.study.json");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string input = args.Positional(0, "IN (the file to convert)");
        string output = args.Positional(1, "OUT (the network file to write, e.g. case.study.json)");
        Network network = NetworkCheck.Read(input).Network;
        NetworkFile.Write(network, output);
        context.Out.WriteLine($"wrote {output}: {NetworkSummary.Describe(network)}");
        return ExitCode.Done;
    }
}
