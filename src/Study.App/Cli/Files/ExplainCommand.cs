// `study explain FILE ID`: one element traced from its nameplate data to the per-unit values the engine uses.
using System.Text;
using Study.Core.Cases;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Cli.Files;

public sealed class ExplainCommand : Command
{
    public override string Name => "explain";
    public override string Summary => "show how one element's data becomes per-unit values on the system base, step by step";
    public override string Usage => "study explain FILE ID [--scenario NAME]";
    protected override IEnumerable<string> ValueOptions => ["scenario"];
    protected override IEnumerable<string> Flags => [];

    protected override int Execute(Arguments args, CommandContext context)
    {
        string path = args.Positional(0, "FILE (a network file or IEEE Common Format case)");
        string id = args.Positional(1, "ID (the element to explain)");
        args.ExpectPositionals(2);
        NetworkCheck read = NetworkCheck.Read(path);
        ElementExplanation e = read.Explain(id, args.Value("scenario"));
        context.Out.Write(Render(read.Network, e));
        return ExitCode.Done;
    }

    public static string Render(Network network, ElementExplanation e)
    {
        var sb = new StringBuilder();
        sb.Append($"{e.Title}\n");
        sb.Append($"system base {Format.F(network.BaseMva, 1)} MVA, {Format.F(network.FrequencyHz, 0)} Hz\n\n");
        if (e.Inputs.Count > 0)
        {
            var inputs = new TextTable().Left("input").Column("value").Left("unit");
            foreach (ExplainedInput i in e.Inputs) inputs.Row(i.Name, i.Value, i.Unit);
            sb.Append("Data\n").Append(inputs.Render("  ")).Append('\n');
        }
        sb.Append("Derivation\n");
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
