// `study check FILE`: the validation report of a network, every problem at once.
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Model;
using Study.Core.Model.Validation;

namespace Study.App.Cli.Files;

public sealed class CheckCommand : CliCommand
{
    public override string Name => "check";
    public override string Summary => "validate a network file or imported case and list every problem";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Flag("json", "machine-readable report");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        var (network, report) = NetworkCheck.Read(path);
        if (args.Has("json"))
            CliJson.Write(context, CheckJson.From(path, report));
        else
            WriteReport(context.Out, path, network, report);
        return report.HasErrors ? ExitCode.InputError : ExitCode.Done;
    }

    private static void WriteReport(TextWriter output, string path, Network network, ValidationReport report)
    {
        int errors = report.Problems.Count(p => p.Severity == Severity.Error);
        int warnings = report.Problems.Count - errors;
        var doc = new ReportDocument($"{path}: {NetworkSummary.Describe(network)}")
            .List(network.Source.Notes.Select(n => "note: " + n).Concat(report.Problems.Select(p => p.Describe())))
            .Text(errors == 0 && warnings == 0
                ? "clean: no errors, no warnings"
                : $"{errors} error{(errors == 1 ? "" : "s")}, {warnings} warning{(warnings == 1 ? "" : "s")}");
        output.Write(PlainTextReport.Render(doc));
    }
}
