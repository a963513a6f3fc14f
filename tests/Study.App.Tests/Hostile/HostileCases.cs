// Several hundred bad or odd inputs, as a hostile tester would try them: unit slips, near-zero
// impedances, conflicting set points, vector groups, damaged JSON, tap ranges, Common Format cases,
// output paths, files that are not networks, option values and control characters.
using System.Diagnostics;
using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using Study.App.Tests.Cli;

namespace Study.App.Tests.Hostile;

internal static class HostileCases
{
    private static readonly string Demo = File.ReadAllText(DemoNetworks.Demo);
    private static readonly string Before = File.ReadAllText(DemoNetworks.Before);
    private static readonly string Ieee14 = File.ReadAllText(CliRun.Network("ieee14cdf.txt"));

    public static IReadOnlyDictionary<string, HostileCase> All { get; } = Build().ToDictionary(c => c.Name);

    private static IEnumerable<HostileCase> Build() =>
        UnitSlips().Concat(NearZero()).Concat(SetPoints()).Concat(VectorGroups()).Concat(Json()).Concat(TapRanges())
            .Concat(CommonFormat()).Concat(Outputs()).Concat(Files()).Concat(Options()).Concat(ControlCharacters());

    private static string F(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>The demo with one edit, as a file; the command line is <paramref name="command"/> FILE ARGS.</summary>
    private static Func<string, string[]> Edited(Action<JsonObject> edit, string command = "solve", params string[] args) => dir =>
    {
        JsonObject root = JsonNode.Parse(Demo)!.AsObject();
        edit(root);
        string path = Path.Combine(dir, "case.study.json");
        File.WriteAllText(path, root.ToJsonString());
        return [command, path, .. args];
    };

    private static Func<string, string[]> Text(string text, string command = "check", string name = "case.study.json", params string[] args) => dir =>
    {
        string path = Path.Combine(dir, name);
        File.WriteAllText(path, text);
        return [command, path, .. args];
    };

    private static Func<string, string[]> Bytes(byte[] bytes, string command = "check", params string[] args) => dir =>
    {
        string path = Path.Combine(dir, "case.study.json");
        File.WriteAllBytes(path, bytes);
        return [command, path, .. args];
    };

    private static JsonArray Arr(JsonObject root, string key) => root[key]!.AsArray();

    private static JsonObject At(JsonObject root, string key, int i) => root[key]!.AsArray()[i]!.AsObject();

    private static int Count(string key) => JsonNode.Parse(Demo)![key]!.AsArray().Count;

    private static double Num(JsonObject o, string key) => o[key]!.GetValue<double>();

    private static IEnumerable<HostileCase> UnitSlips()
    {
        const string c = "unit slip";
        foreach (double b in new[] { 20_000, 1e5, 1e6, 1e8, 1e9, 1e12, 1e300 })
            yield return new($"baseMva {F(b)}", c, Edited(r => r["baseMva"] = b), Expect.Refused);
        foreach (double f in new[] { 0.05, 5, 50_000, 6e4 })
            yield return new($"frequencyHz {F(f)}", c, Edited(r => r["frequencyHz"] = f), Expect.Flagged);
        for (int i = 0; i < Count("buses"); i++)
        {
            int k = i;
            yield return new($"bus {k} kv in volts", c, Edited(r => At(r, "buses", k)["kv"] = Num(At(r, "buses", k), "kv") * 1000), Expect.Refused);
            yield return new($"bus {k} kv in MV", c, Edited(r => At(r, "buses", k)["kv"] = Num(At(r, "buses", k), "kv") / 1000), Expect.Flagged);
            yield return new($"bus {k} kv 1e300", c, Edited(r => At(r, "buses", k)["kv"] = 1e300), Expect.Refused,
                o => o.Err.Contains("1e+300", StringComparison.Ordinal) ? null : "the kV is not shown rounded");
        }
        for (int i = 0; i < Count("transformers"); i++)
        {
            int k = i;
            yield return new($"transformer {k} zPercent in pu", c, Edited(r => At(r, "transformers", k)["zPercent"] = Num(At(r, "transformers", k), "zPercent") / 100), Expect.Flagged);
            yield return new($"transformer {k} zPercent per mille", c, Edited(r => At(r, "transformers", k)["zPercent"] = Num(At(r, "transformers", k), "zPercent") * 10), Expect.Flagged);
            yield return new($"transformer {k} mva in kVA", c, Edited(r => At(r, "transformers", k)["mva"] = Num(At(r, "transformers", k), "mva") * 1000), Expect.Flagged);
            yield return new($"transformer {k} hvKv in volts", c, Edited(r => At(r, "transformers", k)["hvKv"] = Num(At(r, "transformers", k), "hvKv") * 1000), Expect.Refused);
            yield return new($"transformer {k} lvKv in MV", c, Edited(r => At(r, "transformers", k)["lvKv"] = Num(At(r, "transformers", k), "lvKv") / 1000), Expect.Flagged);
            yield return new($"transformer {k} step is the whole range", c,
                Edited(r => At(r, "transformers", k)["tap"]!["percentPerStep"] = 20.0), Expect.Flagged);
        }
        for (int i = 0; i < Count("lines"); i++)
        {
            int k = i;
            yield return new($"line {k} in milliohm per km", c, Edited(r =>
            {
                JsonObject z1 = At(r, "lines", k)["z1"]!.AsObject();
                z1["r"] = Num(z1, "r") * 1000;
                z1["x"] = Num(z1, "x") * 1000;
            }), Expect.Flagged);
            yield return new($"line {k} length in metres", c, Edited(r => At(r, "lines", k)["km"] = Num(At(r, "lines", k), "km") * 1000), Expect.Flagged);
        }
        yield return new("generator kv of its unit transformer's hv side", c, Edited(r => At(r, "generators", 0)["kv"] = 33.0), Expect.Flagged);
        yield return new("generator kv in volts", c, Edited(r => At(r, "generators", 0)["kv"] = 11000.0), Expect.Refused);
        yield return new("supply fault level in VA", c, Edited(r => At(r, "supplies", 0)["scMvaMax"] = 3.5e9), Expect.Flagged);
        yield return new("load in W", c, Edited(r => At(r, "loads", 0)["pMw"] = 14e6), Expect.Flagged);
        yield return new("tolerance 1e300", c, Edited(_ => { }, "solve", "--tolerance", "1e300"), Expect.Refused);
    }

    private static IEnumerable<HostileCase> NearZero()
    {
        const string c = "near-zero impedance";
        for (int i = 0; i < Count("lines"); i++)
        {
            int k = i;
            yield return new($"line {k} at 1e-12 ohm per km", c, Edited(r =>
            {
                JsonObject z1 = At(r, "lines", k)["z1"]!.AsObject();
                z1["r"] = 1e-12;
                z1["x"] = 1e-12;
            }), Expect.Flagged);
            yield return new($"line {k} with a 1e-9 parallel line", c, Edited(r =>
            {
                JsonObject copy = At(r, "lines", k).DeepClone().AsObject();
                copy["id"] = "PARALLEL";
                copy["z1"] = new JsonObject { ["per"] = "km", ["r"] = 1e-9, ["x"] = 1e-9 };
                Arr(r, "lines").Add(copy);
            }), Expect.Flagged);
            yield return new($"line {k} per-unit 1e-10", c, Edited(r => At(r, "lines", k)["z1"] = new JsonObject { ["per"] = "pu", ["r"] = 0.0, ["x"] = 1e-10 }),
                Expect.Flagged);
        }
        for (int i = 0; i < Count("transformers"); i++)
        {
            int k = i;
            yield return new($"transformer {k} of a billion units", c, Edited(r => At(r, "transformers", k)["units"] = 1_000_000_000), Expect.Flagged);
            yield return new($"transformer {k} zPercent 1e-9", c, Edited(r => At(r, "transformers", k)["zPercent"] = 1e-9), Expect.Flagged);
        }
    }

    private static JsonObject Supply(string id, string bus, double vSet = 1.0, double angle = 0) =>
        new() { ["id"] = id, ["bus"] = bus, ["vSet"] = vSet, ["angleDeg"] = angle, ["scMvaMax"] = 500 };

    private static IEnumerable<HostileCase> SetPoints()
    {
        const string c = "set points";
        yield return new("two supplies on one bus, different vSet", c, Edited(r => Arr(r, "supplies").Add(Supply("GRID2", "WRB132", 1.05))), Expect.Refused);
        yield return new("two supplies on one bus, different angle", c, Edited(r => Arr(r, "supplies").Add(Supply("GRID2", "WRB132", 1.0, 10))), Expect.Refused);
        yield return new("two supplies on one bus, same set points", c, Edited(r => Arr(r, "supplies").Add(Supply("GRID2", "WRB132"))), Expect.NoFault);
        yield return new("pv generator on the supply's bus", c, Edited(r =>
        {
            JsonObject g = At(r, "generators", 0).DeepClone().AsObject();
            g["id"] = "GE9";
            g["bus"] = "WRB132";
            g["vSet"] = 1.03;
            g.Remove("kv");
            Arr(r, "generators").Add(g);
        }), Expect.Flagged);
        yield return new("two pv generators, different vSet", c, Edited(r =>
        {
            JsonObject g = At(r, "generators", 0).DeepClone().AsObject();
            g["id"] = "GE2";
            g["vSet"] = 1.03;
            Arr(r, "generators").Add(g);
        }), Expect.Flagged);
        foreach (JsonNode? bus in JsonNode.Parse(Demo)!["buses"]!.AsArray())
        {
            string id = bus!["id"]!.GetValue<string>();
            if (id == "WRB132") continue;
            yield return new($"second supply at {id}, 5 degrees", c, Edited(r => Arr(r, "supplies").Add(Supply("GRID2", id, 1.0, 5))), Expect.Flagged);
            yield return new($"slack generator at {id}", c, Edited(r => Arr(r, "generators").Add(new JsonObject
            {
                ["id"] = "SLACK2", ["bus"] = id, ["mode"] = "slack", ["vSet"] = 1.0,
            })), Expect.Flagged);
        }
        foreach (string bus in new[] { "   2", "   3", "   6", "   8" })
        {
            string text = string.Join('\n', Ieee14.Split('\n').Select(l => l.StartsWith(bus + " Bus", StringComparison.Ordinal) ? l[..24] + " 3" + l[26..] : l));
            yield return new($"Common Format with a second type-3 bus at {bus.Trim()}", c, Text(text, "solve", "case.txt"), Expect.Flagged);
        }
    }

    private static IEnumerable<HostileCase> VectorGroups()
    {
        const string c = "vector group";
        string[] bad = ["banana", "Dyn13", "Dyn12", "dyn11", "DYN11", "Dy", "D", "", " ", "YNd-1", "YNd1.5", "YNd\u0661", "Dyn99999999999999",
            "YNyn0d1", "Yyn0yn0", "Xyn0", "YNa0", "Dd", "11Dyn", "Dyn 11"];
        for (int i = 0; i < Count("transformers"); i++)
        {
            int k = i;
            foreach (string g in bad)
                yield return new($"transformer {k} vector group '{g}'", c, Edited(r => At(r, "transformers", k)["vectorGroup"] = g, "check"), Expect.Refused,
                    o => o.Out.Contains("(vectorGroup)", StringComparison.Ordinal) ? null : "check does not name the vectorGroup key");
        }
        yield return new("demo faulted with a bad vector group", c, Edited(r => At(r, "transformers", 3)["vectorGroup"] = "banana", "fault"), Expect.Refused);
    }

    private static IEnumerable<HostileCase> Json()
    {
        const string c = "json";
        string[] refused =
        [
            "{}", "[]", "null", "\"a network\"", "123", "true", "", "   \n\t ", "{", "}", "{\"buses\": [],}", "{\"buses\": [{\"id\": \"A\",}]}",
            "{\"name\": \"a\", \"name\": \"b\", \"buses\": []}", "{\"buses\": [{\"id\": \"A\", \"id\": \"B\", \"kv\": 11}]}",
            "{\"buses\": [{\"id\": \"A\", \"kv\": 11, \"kv\": 33}]}", "{\"buses\": [{\"id\": \"A\\q\"}]}", "{\"baseMva\": NaN}",
            "{\"baseMva\": Infinity}", "{\"baseMva\": 1e400, \"buses\": [{\"id\": \"A\"}]}", "{\"baseMva\": \"100\"}", "{\"buses\": {}}",
            "{\"buses\": [null]}", "{\"buses\": [{}]}", "{\"buses\": [{\"id\": 7}]}", "{\"format\": \"other\"}", "{\"unknown\": 1}",
            "{\"generators\": [{\"id\": \"G\", \"bus\": \"A\", \"mode\": 0}]}", "{\"lines\": [{\"id\": \"L\", \"from\": \"A\", \"to\": \"B\", \"z1\": {\"per\": \"miles\", \"r\": 1, \"x\": 1}}]}",
            "{\"transformers\": [{\"id\": \"T\", \"hv\": \"A\", \"lv\": \"B\", \"units\": 1.5}]}", "{\"buses\": [{\"id\": \"A\"}]} trailing",
            "{\"buses\": [{\"id\": \"A\", \"kv\": 11}]}\u0000", "\u0000{}", "{\"buses\": [{\"id\": \"A\u0007\"}]}",
        ];
        for (int i = 0; i < refused.Length; i++) yield return new($"json {i}: {Shorten(refused[i])}", c, Text(refused[i]), Expect.Refused);
        foreach (string v in new[] { "-1", "0", "3", "99", "1.5", "\"2\"", "null", "true", "2147483648" })
            yield return new($"version {v}", c, Text(Demo.Replace("\"version\": 2", "\"version\": " + v)), Expect.Refused);
        foreach (int depth in new[] { 65, 1000, 100_000 })
            yield return new($"nested {depth} deep", c, Text("{\"buses\": " + new string('[', depth) + new string(']', depth) + "}"), Expect.Refused);
        yield return new("a hundred thousand empty bus entries", c, Text("{\"buses\": [" + string.Join(",", Enumerable.Repeat("{}", 100_000)) + "]}"), Expect.Refused);
        for (int cut = 1; cut <= 20; cut++)
        {
            int length = Demo.Length * cut / 21;
            yield return new($"demo cut at {length} characters", c, Text(Demo[..length]), Expect.Refused);
        }
        yield return new("demo with a UTF-8 byte-order mark", c, Bytes([0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes(Demo)], "solve"), Expect.NoFault);
        yield return new("demo in UTF-16", c, Bytes([.. Encoding.Unicode.GetPreamble(), .. Encoding.Unicode.GetBytes(Demo)], "solve"), Expect.NoFault);
        yield return new("demo in UTF-16 without its mark", c, Bytes(Encoding.Unicode.GetBytes(Demo)), Expect.Refused);
    }

    private static IEnumerable<HostileCase> TapRanges()
    {
        const string c = "tap range";
        foreach ((int lo, int hi, double step) in new[] { (-80, 8, 1.25), (-200, 0, 1.0), (-1, 1, 100.0), (-8, 8, -1.25), (-8, 8, 12.5) })
            yield return new($"GT1 tap range [{lo}, {hi}] at {F(step)} %", c, Edited(r =>
            {
                JsonObject tap = At(r, "transformers", 0)["tap"]!.AsObject();
                tap["range"] = new JsonArray(lo, hi);
                tap["percentPerStep"] = step;
                tap["position"] = 0;
            }), Expect.Refused);
        // One position and any step: the ratio is the rated one, so nothing is wrong.
        yield return new("GT1 single position with a step of -200 %", c, Edited(r =>
        {
            JsonObject tap = At(r, "transformers", 0)["tap"]!.AsObject();
            tap["range"] = new JsonArray(0, 0);
            tap["percentPerStep"] = -200.0;
            tap["position"] = 0;
        }), Expect.NoFault);
        yield return new("CQ-T1 position outside its range", c, Edited(r => At(r, "transformers", 3)["tap"]!["position"] = 9), Expect.Refused);
        yield return new("CQ-T1 range runs backwards", c, Edited(r => At(r, "transformers", 3)["tap"]!["range"] = new JsonArray(2, -2)), Expect.Refused);
        foreach ((int lo, int hi) in new[] { (-1_000_000, 1_000_000), (int.MinValue, int.MaxValue) })
        {
            yield return new($"CQ-T1 range [{lo}, {hi}] studied", c, Edited(r =>
            {
                JsonObject tap = At(r, "transformers", 3)["tap"]!.AsObject();
                tap["range"] = new JsonArray(lo, hi);
                tap["percentPerStep"] = 1e-12;
            }, "taps", "--transformer", "CQ-T1"), Expect.Refused);
            yield return new($"GT1 regulating over [{lo}, {hi}]", c, Edited(r =>
            {
                JsonObject tap = At(r, "transformers", 0)["tap"]!.AsObject();
                tap["range"] = new JsonArray(lo, hi);
                tap["percentPerStep"] = 1e-12;
            }), Expect.Flagged);
        }
        yield return new("tap sweep near the nose of the P-V curve", c, Text(MarshEnd, "taps", "marsh.study.json", "--transformer", "T1", "--watch", "F"),
            Expect.NoFault, o => o.Out.Contains("note: position -3: the warm start reached a low-voltage solution", StringComparison.Ordinal)
                ? null : "the collapsed warm start is not reported");
    }

    /// <summary>Invented: a heavily loaded 33 kV feeder where a warm-started sweep once reached the low-voltage solution (TapSweepCollapseTests).</summary>
    private const string MarshEnd = """
        {"format": "study-network", "version": 2, "name": "Marsh End feeder",
         "buses": [{"id": "G", "kv": 132}, {"id": "M", "kv": 33, "vMin": 0.5, "vMax": 1.5}, {"id": "F", "kv": 33, "vMin": 0.5, "vMax": 1.5},
                   {"id": "E", "kv": 33, "vMin": 0.5, "vMax": 1.5}],
         "supplies": [{"id": "GRID", "bus": "G", "scMvaMax": 3000}],
         "transformers": [{"id": "T1", "hv": "G", "lv": "M", "mva": 60, "hvKv": 132, "lvKv": 33, "zPercent": 12, "xr": 20,
                           "tap": {"winding": "lv", "percentPerStep": 2.5, "range": [-8, 8], "position": 0}}],
         "lines": [{"id": "L", "from": "M", "to": "F", "km": 44, "z1": {"per": "km", "r": 0.05, "x": 0.25}},
                   {"id": "L2", "from": "F", "to": "E", "km": 22, "z1": {"per": "km", "r": 0.05, "x": 0.25}}],
         "loads": [{"id": "LD", "bus": "F", "pMw": 18.8, "qMvar": 9.212}, {"id": "LE", "bus": "E", "pMw": 6.267, "qMvar": 3.071}],
         "generators": [{"id": "GE", "bus": "E", "mode": "pv", "pMw": 4.7, "vSet": 1.0, "qMinMvar": -5, "qMaxMvar": 5}]}
        """;

    private static IEnumerable<HostileCase> CommonFormat()
    {
        const string c = "common format";
        string Note(CliOutcome o) => o.Err + o.Out;
        foreach ((string name, string pre) in new[]
        {
            ("a comment line", "COMMENT: copied from the archive".PadRight(31) + "  50.0\n"),
            ("a tape label", "HDR1 ARCHIVE TAPE VOL 3        NOT-A-NUMBER\n"),
            ("two lines", "first line\nsecond line\n"),
        })
            yield return new($"Common Format with {name} before the title card", c, Text(pre + Ieee14, "solve", "case.txt"), Expect.NoFault,
                o => o.ExitCode != 0 ? "not solved"
                    : Note(o).Contains("before the title card skipped", StringComparison.Ordinal) ? null : "no note about the skipped lines");
        string[] lines = Ieee14.Split('\n');
        yield return new("Common Format without a title card", c, Text(string.Join('\n', lines[1..]), "check", "case.txt"), Expect.Refused);
        yield return new("Common Format with a tab", c, Text(Ieee14.Replace("Bus 3 ", "Bus\t3 "), "check", "case.txt"), Expect.Refused);
        foreach (int keep in new[] { 2, 5, 16, 17, 20, 38 })
            yield return new($"Common Format cut after {keep} lines", c, Text(string.Join('\n', lines[..keep]), "check", "case.txt"), Expect.Refused);
        yield return new("Common Format bus type 4", c, Text(string.Join('\n', lines.Select(l => l.StartsWith("   4 Bus", StringComparison.Ordinal) ? l[..24] + " 4" + l[26..] : l)), "check", "case.txt"), Expect.Refused);
        yield return new("Common Format slack at 30 degrees", c, Text(string.Join('\n', lines.Select(l =>
            l.StartsWith("   1 Bus", StringComparison.Ordinal) ? l[..33] + "   30.0" + l[40..] : l)), "solve", "case.txt", "--json"), Expect.NoFault,
            o => Math.Abs(JsonNode.Parse(o.Out)!["buses"]![0]!["angleDeg"]!.GetValue<double>() - 30) < 1e-9
                ? null : "the slack's angle is not the reference");
    }

    private static Func<string, string[]> Command(string command, Func<string, string[]> outputArgs) => dir =>
    {
        string[] network = command == "compare" ? [DemoNetworks.Before, DemoNetworks.Demo] : [DemoNetworks.Demo];
        string[] extra = command switch
        {
            "taps" => ["--transformer", "CQ-T1"],
            "outages" => ["--scenario", "winter-peak"],
            "fault" => ["--bus", "CQ11"],
            _ => [],
        };
        return [command, .. network, .. extra, .. outputArgs(dir)];
    };

    private static IEnumerable<HostileCase> Outputs()
    {
        const string c = "output";
        var markdownTargets = new (string Name, Func<string, string> Path)[]
        {
            ("a device", _ => "/dev/null"),
            ("a folder", dir => dir),
            ("an empty name", _ => ""),
            ("a dash", _ => "-"),
            ("a missing folder", dir => Path.Combine(dir, "no", "such", "folder", "report.md")),
            ("a /proc path", _ => "/proc/self/report.md"),
            ("a named pipe", dir => Fifo(dir)),
            ("the input", _ => DemoNetworks.Demo),
            ("a name ending in a slash", dir => Path.Combine(dir, "report") + "/"),
        };
        foreach (string command in new[] { "solve", "taps", "outages", "compare", "fault" })
            foreach ((string name, Func<string, string> path) in markdownTargets)
                yield return new($"{command} --markdown onto {name}", c, Command(command, dir => ["--markdown", path(dir)]), Expect.Refused,
                    _ => File.Exists(DemoNetworks.Demo) && File.ReadAllText(DemoNetworks.Demo) == Demo ? null : "the input was changed");
        var csvTargets = new (string Name, Func<string, string> Path)[]
        {
            ("a file", dir => { string f = Path.Combine(dir, "tables"); File.WriteAllText(f, "x"); return f; }),
            ("a folder with other files", dir => { string d = Path.Combine(dir, "tables"); Directory.CreateDirectory(d); File.WriteAllText(Path.Combine(d, "notes.txt"), "x"); return d; }),
            ("a missing parent", dir => Path.Combine(dir, "no", "tables")),
            ("an empty name", _ => ""),
            ("a dash", _ => "-"),
            ("a device", _ => "/dev/null"),
            ("the root", _ => "/"),
        };
        foreach (string command in new[] { "solve", "taps", "outages", "compare" })
            foreach ((string name, Func<string, string> path) in csvTargets)
                yield return new($"{command} --csv onto {name}", c, Command(command, dir => ["--csv", path(dir)]), Expect.Refused);
        yield return new("convert onto its input", c, dir =>
        {
            string input = Path.Combine(dir, "in.study.json");
            File.Copy(DemoNetworks.Demo, input);
            return ["convert", input, input];
        }, Expect.Refused);
        yield return new("convert onto a folder", c, dir => ["convert", DemoNetworks.Demo, dir], Expect.Refused);
        yield return new("convert onto a device", c, _ => ["convert", DemoNetworks.Demo, "/dev/null"], Expect.Refused);
        yield return new("jacobian onto the input", c, _ => ["solve", DemoNetworks.Demo, "--export-jacobian", DemoNetworks.Demo], Expect.Refused);
        yield return new("markdown and jacobian onto one file", c, dir => ["solve", DemoNetworks.Demo, "--markdown", Path.Combine(dir, "a"),
            "--export-jacobian", Path.Combine(dir, "a")], Expect.Refused);
        yield return new("generate onto a device", c, _ => ["generate", "--buses", "10", "-o", "/dev/null"], Expect.Refused);
    }

    private static string Fifo(string dir)
    {
        string path = Path.Combine(dir, "pipe");
        if (!OperatingSystem.IsLinux()) return path;
        using Process p = Process.Start("mkfifo", path);
        p.WaitForExit();
        return path;
    }

    private static IEnumerable<HostileCase> Files()
    {
        const string c = "files";
        var random = new byte[200_000];
        new Random(14).NextBytes(random);
        var bad = new (string Name, Func<string, string> Path)[]
        {
            ("a folder", dir => dir),
            ("a dash", _ => "-"),
            ("an empty name", _ => ""),
            ("a missing file", dir => Path.Combine(dir, "missing.study.json")),
            ("random bytes", dir => Write(dir, random)),
            ("zeros", dir => Write(dir, new byte[100_000])),
            ("an empty file", dir => Write(dir, [])),
            ("/dev/null", _ => "/dev/null"),
            ("/dev/zero", _ => "/dev/zero"),
            ("/dev/urandom", _ => "/dev/urandom"),
            ("a 2 GiB sparse file", dir =>
            {
                string path = Path.Combine(dir, "huge.study.json");
                using var stream = new FileStream(path, FileMode.CreateNew);
                stream.SetLength(2L << 30);
                return path;
            }),
            ("a brace then zeros", dir => Write(dir, [(byte)'{', .. new byte[200_000]])),
        };
        string[][] commands = [["check"], ["solve"], ["explain", "#", "GT1"], ["convert", "#", "out.study.json"], ["taps", "#", "--transformer", "CQ-T1"],
            ["fault", "#"], ["outages", "#"], ["compare", "#", DemoNetworks.Demo]];
        foreach (string[] command in commands)
            foreach ((string name, Func<string, string> path) in bad)
                yield return new($"{command[0]} of {name}", c, dir =>
                {
                    string p = path(dir);
                    string[] args = command.Length == 1 ? [command[0], p] : command.Select(a => a == "#" ? p : a == "out.study.json" ? Path.Combine(dir, a) : a).ToArray();
                    return args;
                }, Expect.Refused);
    }

    private static string Write(string dir, byte[] bytes)
    {
        string path = Path.Combine(dir, "bad.study.json");
        File.WriteAllBytes(path, bytes);
        return path;
    }

    private static IEnumerable<HostileCase> Options()
    {
        const string c = "options";
        string demo = DemoNetworks.Demo;
        string[][] refused =
        [
            .. new[] { "1e300", "0", "-1", "NaN", "Infinity", "1e-20", "abc", "" }.Select(t => new[] { "solve", demo, "--tolerance", t }),
            .. new[] { "0", "-1", "1001", "99999999999", "1.5", "x" }.Select(n => new[] { "solve", demo, "--max-iterations", n }),
            .. new[] { "0,0", "2,1", "NaN,1", "0.9", "a,b", "0.9,1.1,1.2", "-1,1", "1,3" }.Select(b => new[] { "taps", demo, "--transformer", "CQ-T1", "--band", b }),
            .. new[] { "-1,0", "NaN,0", "abc", "1", "1e400,0" }.Select(z => new[] { "fault", demo, "--zf", z }),
            ["fault", demo, "--type", "bogus"], ["fault", demo, "--method", "bogus"], ["fault", demo, "--bus", "NOWHERE"],
            ["bench", "--sizes", "2000000000"], ["bench", "--sizes", "0"], ["bench", "--sizes", "-5"], ["bench", "--sizes", "abc"],
            ["bench", "--sizes", "1e9"], ["bench", "--sizes", "100", "--repeat", "0"], ["bench", "--sizes", "100", "--repeat", "1000000"],
            ["generate", "--buses", "0", "-o", "x.json"], ["generate", "--buses", "3000000", "-o", "x.json"],
            ["solve", demo, "--scenario", "nowhere"], ["taps", demo, "--transformer", "NOPE"], ["taps", demo, "--transformer", "CQ-T1", "--watch", "NOWHERE"],
            ["outages", demo, "--elements", "NOPE"], ["explain", demo, "NOPE"], ["solve", demo, "--no-such-option"], ["nonsense"],
            ["solve"], ["compare", demo], ["taps", demo], ["solve", demo, "extra"],
        ];
        for (int i = 0; i < refused.Length; i++)
        {
            string[] args = refused[i];
            yield return new($"options {i}: {string.Join(' ', args.Select(a => a == demo ? "DEMO" : a))}", c, _ => args, Expect.Refused);
        }
    }

    private static IEnumerable<HostileCase> ControlCharacters()
    {
        const string c = "control characters";
        string[] ids = ["B\u001b[2J", "B\r", "B\u0007", "B\u202e11", "B\u009b31m", "B\u0000"];
        foreach (string id in ids)
        {
            string escaped = System.Text.Json.JsonSerializer.Serialize(id);
            yield return new($"bus id {Shorten(escaped)}", c, dir =>
            {
                string path = Path.Combine(dir, "case.study.json");
                File.WriteAllText(path, Demo.Replace("\"QE33\"", escaped));
                return ["solve", path];
            }, Expect.NoFault);
            yield return new($"network name {Shorten(escaped)}", c, dir =>
            {
                string path = Path.Combine(dir, "case.study.json");
                File.WriteAllText(path, Demo.Replace("\"name\": \"Wrenby Harbour", "\"name\": " + escaped[..^1] + " Wrenby Harbour"));
                return ["check", path];
            }, Expect.NoFault);
        }
        yield return new("an escape sequence on the command line", c, _ => ["solve", DemoNetworks.Demo, "--scenario", "\u001b[2Jpeak"], Expect.Refused);
        yield return new("an escape sequence as the file name", c, dir => ["check", Path.Combine(dir, "\u001b[31mred.json")], Expect.Refused);
    }

    private static string Shorten(string s) =>
        new string(s.Take(40).Select(ch => char.IsControl(ch) ? '?' : ch).ToArray()) + (s.Length > 40 ? "…" : "");
}
