// `--csv DIR` for the load flow: one table per file.
using Study.App.Cli.Reports;
using Study.Core.Io;
using Study.Core.LoadFlow;

namespace Study.App.Cli.Solve;

public static class LoadFlowCsv
{
    public static void Write(LoadFlowResult r, string dir)
    {
        Directory.CreateDirectory(dir);
        var buses = new CsvTable("id", "kv", "vPu", "vKv", "angleDeg", "pGenMw", "qGenMvar", "pLoadMw", "qLoadMvar", "violation");
        foreach (var b in r.Buses)
            buses.Row(b.Id, b.Kv, b.VPu, b.VKv, b.AngleDeg, b.PGenMw, b.QGenMvar, b.PLoadMw, b.QLoadMvar, SolveJson.ViolationName(b.Violation));
        buses.Write(Path.Combine(dir, "buses.csv"));
        var branches = new CsvTable("id", "kind", "from", "to", "pFromMw", "qFromMvar", "pToMw", "qToMvar", "iFromA", "iToA", "lossMw", "lossMvar", "loadingPercent");
        foreach (var b in r.Branches)
            branches.Row(b.Id, b.Kind, b.From, b.To, b.PFromMw, b.QFromMvar, b.PToMw, b.QToMvar, b.IFromA, b.IToA, b.LossMw, b.LossMvar, b.LoadingPercent);
        branches.Write(Path.Combine(dir, "branches.csv"));
        var taps = new CsvTable("id", "position", "ratio", "regulating", "atLimit");
        foreach (var t in r.Taps) taps.Row(t.Id, t.Position, t.Ratio, t.Regulating, t.AtLimit);
        taps.Write(Path.Combine(dir, "taps.csv"));
        var violations = new CsvTable("element", "kind", "type", "value", "limit");
        foreach (var v in r.Violations) violations.Row(v.Element, v.Kind, SolveJson.ViolationName(v.Type), v.Value, v.Limit);
        violations.Write(Path.Combine(dir, "violations.csv"));
    }
}
