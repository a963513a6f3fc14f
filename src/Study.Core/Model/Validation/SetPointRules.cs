// Sources that contradict each other on one bus: two voltages asked of one node.
namespace Study.Core.Model.Validation;

/// <summary>
/// The load flow gives each bus one role (DEVELOPERS.md, Algorithms): a bus with a slack source holds
/// that source's voltage and angle; otherwise the first voltage-controlling generator's set point holds
/// it. Where the data ask one bus for two voltages, the rule below says which one governs; where both
/// claims are rigid (two slack sources) the result would depend on file order, so it is an error.
/// </summary>
internal static class SetPointRules
{
    /// <summary>Set points closer than this are the same (the file's rounding).</summary>
    private const double Same = 1e-9;

    private sealed record Claim(ElementKind Kind, string Id, bool Slack, double VSet, double AngleDeg);

    public static void Check(ValidationContext context)
    {
        Network network = context.Network;
        var claims = new Dictionary<string, List<Claim>>(StringComparer.Ordinal);
        void Add(string? bus, Claim claim)
        {
            if (bus is null || !context.BusesById.TryGetValue(bus, out Bus? b) || !b.InService) return;
            if (!claims.TryGetValue(bus, out List<Claim>? list)) claims.Add(bus, list = []);
            list.Add(claim);
        }
        foreach (Supply? s in ValidationContext.Items(network.Supplies))
        {
            if (s is { InService: true } && s.Id is not null)
                Add(s.Bus, new Claim(ElementKind.Supply, s.Id, true, s.VSet, s.AngleDeg));
        }
        foreach (Generator? g in ValidationContext.Items(network.Generators))
        {
            if (g is { InService: true, Mode: not GeneratorMode.Pq } && g.Id is not null)
                Add(g.Bus, new Claim(ElementKind.Generator, g.Id, g.Mode == GeneratorMode.Slack, g.VSet, g.AngleDeg ?? 0));
        }
        foreach ((string bus, List<Claim> list) in claims)
        {
            if (list.Count > 1) Bus(context, bus, list);
        }
    }

    private static void Bus(ValidationContext context, string bus, List<Claim> list)
    {
        Claim? governing = list.FirstOrDefault(c => c.Slack) ?? list[0];
        foreach (Claim other in list)
        {
            if (ReferenceEquals(other, governing)) continue;
            bool voltage = Math.Abs(other.VSet - governing.VSet) > Same;
            bool angle = other.Slack && governing.Slack && Math.Abs(other.AngleDeg - governing.AngleDeg) > Same;
            if (!voltage && !angle) continue;
            ElementScope at = context.At(other.Kind, other.Id);
            string both = $"{Named(governing)} and {Named(other)} on bus {bus}";
            if (other.Slack)
                at.Error(angle && !voltage ? "angleDeg" : "vSet",
                    $"{both} are both slack sources with different set points ({Held(governing, angle)} and {Held(other, angle)}): " +
                    "one bus has one voltage, and the result would depend on which is listed first; give them the same vSet " +
                    "and angleDeg, or take one out of service");
            else
                at.Warning("vSet",
                    $"{both} hold different voltages ({Numbers.Show(governing.VSet)} and {Numbers.Show(other.VSet)} pu): " +
                    $"{Named(governing)} governs ({(governing.Slack ? "a slack source holds its bus" : "the first voltage-controlling generator listed holds the bus")}), " +
                    $"so {other.Id}'s vSet is not used; give them the same vSet");
        }
    }

    private static string Named(Claim c) => $"{ElementKinds.Label(c.Kind)} {c.Id}";

    private static string Held(Claim c, bool angle) =>
        angle ? $"{Numbers.Show(c.VSet)} pu at {Numbers.Show(c.AngleDeg)}°" : $"{Numbers.Show(c.VSet)} pu";
}
