// The text one-line view: sources on top, then each voltage level downward with its buses, lines and banks.
using Study.App.Reports;
using System.Globalization;
using Study.App.Tui.Taps;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Units;

namespace Study.App.Tui.LoadFlow;

/// <summary>One row of the one-line view and the violation that decides its colour (the marker carries the meaning).</summary>
public sealed record OneLineRow(string Text, ViolationKind Violation = ViolationKind.None);

/// <summary>
/// Lays out a network as rows of text. Buses are grouped by base kV, highest first; each bus shows its
/// solved voltage and angle when a load flow result is given, with the sources and load on it; lines
/// hang under the first of their two buses; transformers stand between the hv level and the levels below,
/// with tap position and off-nominal ratio (solved, or from the compiled model before a solve).
/// </summary>
public static class OneLineLayout
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static IReadOnlyList<OneLineRow> Build(Network n, LoadFlowResult? result, Scenario? scenario = null)
    {
        var rows = new List<OneLineRow>();
        var solved = result?.Buses.ToDictionary(b => b.Id) ?? [];
        IReadOnlyDictionary<string, (int Position, double Ratio)> taps = TapStates(n, result, scenario);

        rows.Add(new("Sources"));
        foreach (Supply s in n.Supplies)
            rows.Add(new($"  ◆ {s.Id}  supply at {s.Bus}  {V(s.VSet)} pu" + (s.ScMvaMax is double sc ? $"  S''k {F(sc, "0.#")} MVA" : "") + Out(s.InService)));
        foreach (Generator g in n.Generators)
            rows.Add(new($"  ◆ {g.Id}  generator at {g.Bus}  {F(g.PMw, "0.###")} MW {g.Mode.ToString().ToLowerInvariant()}" + Out(g.InService)));
        if (n.Supplies.Count + n.Generators.Count == 0) rows.Add(new("  (none: the network has no supply point or generator)"));

        var lineDone = new HashSet<string>();
        var levels = n.Buses.GroupBy(b => b.Kv).OrderByDescending(g => g.Key).ToList();
        foreach (IGrouping<double, Bus> level in levels)
        {
            string title = level.Key > 0 ? $"{F(level.Key, "0.###")} kV" : "kV not stated";
            rows.Add(new($"━━ {title} " + new string('━', Math.Max(3, 40 - title.Length))));
            foreach (Bus bus in level)
            {
                rows.Add(BusRow(n, bus, solved.GetValueOrDefault(bus.Id)));
                var lines = n.Lines.Where(l => (l.From == bus.Id || l.To == bus.Id) && !lineDone.Contains(l.Id)).ToList();
                for (int i = 0; i < lines.Count; i++)
                {
                    Line l = lines[i];
                    lineDone.Add(l.Id);
                    string other = l.From == bus.Id ? l.To : l.From;
                    string corner = i == lines.Count - 1 ? "└" : "├";
                    string length = l.Km is double km ? $" {F(km, "0.###")} km" : "";
                    rows.Add(new($"  │  {corner}─{(l.InService ? "─" : "╳")} {l.Id}{length} ── {other}{Out(l.InService)}"));
                }
            }
            foreach (Transformer t in n.Transformers.Where(t => KvOf(n, t.Hv) == level.Key))
                rows.Add(new($"  ╪ {t.Id}  {t.Hv} ▸ {t.Lv}  {Kv(t.HvKv)}/{Kv(t.LvKv)} kV" + (t.Mva is double m ? $"  {F(m, "0.###")} MVA" : "")
                    + Tap(t.Id, t.Tap, taps) + Out(t.InService)));
            foreach (ThreeWindingTransformer t in n.ThreeWindingTransformers.Where(t => KvOf(n, t.Hv) == level.Key))
                rows.Add(new($"  ╪ {t.Id}  {t.Hv} ▸ {t.Mv}, {t.Lv}  {Kv(t.HvKv)}/{Kv(t.MvKv)}/{Kv(t.LvKv)} kV"
                    + Tap(t.Id, t.Tap, taps) + Out(t.InService)));
        }
        if (result is null) rows.Add(new("(not solved: F5 adds voltages and angles)"));
        else if (!result.Converged) rows.Add(new("(the last load flow did not converge: the voltages shown are its last iterate)"));
        return rows;
    }

    private static OneLineRow BusRow(Network n, Bus bus, BusResult? r)
    {
        string feeds = string.Join("", n.Supplies.Where(s => s.Bus == bus.Id).Select(s => $" ◄{s.Id}")
            .Concat(n.Generators.Where(g => g.Bus == bus.Id).Select(g => $" ◄{g.Id}")));
        double loadMw = n.Loads.Where(l => l.Bus == bus.Id && l.InService).Sum(l => l.PMw);
        string load = r is not null && r.PLoadMw != 0 ? $" ↓{F(r.PLoadMw, "0.0")} MW" : loadMw != 0 ? $" ↓{F(loadMw, "0.0")} MW" : "";
        string shunt = n.Shunts.Any(s => s.Bus == bus.Id && s.InService) ? " ‖shunt" : "";
        string value = r is null ? "" : !r.Energised ? "  dead        " : $"  {V(r.VPu)} pu{Marks.Padded(r.Violation)}{F(r.AngleDeg, "0.00"),7}°";
        return new OneLineRow($"  ■ {bus.Id,-8}{value}{feeds}{load}{shunt}{Out(bus.InService)}", r?.Violation ?? ViolationKind.None);
    }

    private static string Tap(string id, TapChanger? tap, IReadOnlyDictionary<string, (int Position, double Ratio)> taps)
    {
        bool known = taps.TryGetValue(id, out var state);
        string ratio = known ? $"  ratio {F(state.Ratio, "0.0000")}" : "";
        if (tap is null) return ratio;
        string range = $"[{Labels.Position(tap.Range.Lowest)}…{Labels.Position(tap.Range.Highest)}]";
        string regulates = tap.Regulate is { } reg ? $"  holds {reg.Bus} at {V(reg.VTarget)} pu" : "";
        return $"  tap {Labels.Position(known ? state.Position : tap.Position)} {range}{ratio}{regulates}";
    }

    /// <summary>Tap position and ratio per transformer: the solved ones, else the compiled model's.</summary>
    private static IReadOnlyDictionary<string, (int, double)> TapStates(Network n, LoadFlowResult? result, Scenario? scenario)
    {
        var states = new Dictionary<string, (int, double)>();
        PerUnitModel? model = null;
        try
        {
            model = PerUnitModel.Build(n, scenario);
        }
        catch (Exception e) when (e is InputException or ArgumentException or InvalidOperationException or KeyNotFoundException)
        {
            // An incomplete network still draws; it only lacks the ratios.
        }
        if (model is not null)
        {
            foreach (PuBranch b in model.Branches.Where(b => b.Kind != BranchKind.Line)) states.TryAdd(b.Id, (0, b.Ratio));
            foreach (PuTap t in model.Taps) states[t.Id] = (t.Position, model.Branches[t.Branch].Ratio);
        }
        foreach (TapResult t in result?.Taps ?? []) states[t.Id] = (t.Position, t.Ratio);
        return states;
    }

    private static double KvOf(Network n, string bus) => n.FindBus(bus)?.Kv ?? 0;
    private static string Out(bool inService) => inService ? "" : "  (out of service)";
    private static string Kv(double? kv) => kv is double v ? F(v, "0.###") : "?";
    private static string V(double pu) => F(pu, "0.0000");
    private static string F(double v, string format) => v.ToString(format, Inv);
}
