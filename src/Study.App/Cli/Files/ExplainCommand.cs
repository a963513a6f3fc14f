// `study explain FILE ID`: one element traced from its nameplate data to the per-unit values the engine uses.
using System.Text;
using Study.App.Reports;
using Study.Core.Cases;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Cli.Files;

public sealed class ExplainCommand : CliCommand
{
    public override string Name => "explain";
    public override string Summary => "show how one element's data becomes per-unit values on the system base, step by step";
    protected override void Declare(Declaration d) => d
        .Positional("FILE", "a network file or IEEE Common Format case")
        .Positional("ID", "the element to explain")
        .Value("scenario", "NAME", "scale loads as the named scenario does (default: as entered)");

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        string id = args.Positional(1, "ID (the element to explain)");
        NetworkCheck read = NetworkCheck.Read(path);
        ElementExplanation e = read.Explain(id, args.Value("scenario"));
        context.Out.Write(Render(read.Network, e));
        return ExitCode.Done;
    }

    public static string Render(Network network, ElementExplanation e)
    {
        var doc = new ReportDocument(e.Title).Text($"system base {Numbers.Fixed(network.BaseMva, 1)} MVA, {Numbers.Fixed(network.FrequencyHz, 0)} Hz");
        if (e.Inputs.Count > 0) doc.Heading("Data").Table(CommandColumns.ExplainInputs, e.Inputs);
        return PlainTextReport.Render(doc.Heading("Derivation").Add(new ReportFigure(Steps(e))));
    }

    /// <summary>The numbered steps, labels padded to one width so the formulas line up; a default or assumption adds a note line.</summary>
    private static string Steps(ElementExplanation e)
    {
        var sb = new StringBuilder();
        int width = e.Steps.Count == 0 ? 0 : e.Steps.Max(s => s.Label.Length);
        int number = 0;
        foreach (DerivationStep s in e.Steps)
        {
            number++;
            sb.Append($"  {number,2}. {s.Label.PadRight(width)}  {s.Formula} = {Value(s.Value)} {s.Unit}".TrimEnd()).Append('\n');
            if (s.Note is not null) sb.Append($"      note: {s.Note}\n");
        }
        return sb.ToString();
    }

    private static string Value(double v) =>
        v == 0 || (Math.Abs(v) >= 1e-3 && Math.Abs(v) < 1e6)
            ? v.ToString("0.######", System.Globalization.CultureInfo.InvariantCulture)
            : v.ToString("0.#####e+0", System.Globalization.CultureInfo.InvariantCulture);
}
