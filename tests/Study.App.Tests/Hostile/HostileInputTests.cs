// The hostile-input suite: several hundred bad or odd inputs, none of which may crash (exit 4), hang, send
// control characters to the terminal, or end in exit 0 without a warning where the input is a plausible
// mistake. A few run the real program, where the point is what the process does (memory, a terminal).
using System.Diagnostics;
using Study.App.Reports;
using Study.App.Tests.Cli;

namespace Study.App.Tests.Hostile;

public sealed class HostileInputTests : IDisposable
{
    /// <summary>Generous for a debug build on a loaded machine: a case that takes this long is a hang.</summary>
    private static readonly TimeSpan Limit = TimeSpan.FromSeconds(60);

    private readonly string root = Directory.CreateTempSubdirectory("study-hostile-").FullName;

    public void Dispose()
    {
        try { Directory.Delete(root, recursive: true); } catch (IOException) { }
    }

    public static TheoryData<string> Cases() => new(HostileCases.All.Keys);

    [Fact]
    public void The_suite_holds_several_hundred_cases_in_every_class()
    {
        var byClass = HostileCases.All.Values.GroupBy(c => c.Class).ToDictionary(g => g.Key, g => g.Count());
        Assert.True(HostileCases.All.Count >= 300, $"{HostileCases.All.Count} cases");
        foreach (string cls in new[] { "unit slip", "near-zero impedance", "set points", "vector group", "json", "tap range", "common format",
                     "output", "files", "options", "control characters" })
            Assert.True(byClass.GetValueOrDefault(cls) > 0, $"no case of class {cls}");
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task A_hostile_input_never_crashes_never_hangs_and_is_never_solved_in_silence(string name)
    {
        HostileCase hostile = HostileCases.All[name];
        string dir = Path.Combine(root, Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        Task<CliOutcome> run = Task.Run(() => CliRun.Run(hostile.Setup(dir)));
        Assert.True(await Task.WhenAny(run, Task.Delay(Limit)) == run, $"{name}: no answer within {Limit.TotalSeconds} s (a hang)");
        CliOutcome o = await run;
        string said = $"{name}: exit {o.ExitCode}\nstdout: {Head(o.Out)}\nstderr: {Head(o.Err)}";
        Assert.True(o.ExitCode != 4, said);
        Assert.DoesNotContain("internal error", o.Err);
        Assert.DoesNotContain("   at ", o.Err);
        Assert.DoesNotContain(o.Out + o.Err, ControlCharacters.IsControl);
        switch (hostile.Expect)
        {
            case Expect.Refused:
                Assert.True(o.ExitCode == 2, said);
                Assert.True(o.Err.Trim().Length > 0 || o.Out.Contains("error", StringComparison.Ordinal), "refused without a message: " + said);
                break;
            case Expect.Flagged:
                Assert.True(o.ExitCode is 2 or 3 || (o.ExitCode == 0 && o.Err.Contains("warning:", StringComparison.Ordinal)), "exit 0 without a warning: " + said);
                break;
            default:
                Assert.True(o.ExitCode is 0 or 2 or 3, said);
                break;
        }
        if (hostile.Check?.Invoke(o) is string wrong) Assert.Fail($"{wrong}: {said}");
    }

    private static string Head(string text) => text.Length > 600 ? text[..600] + "…" : text;

    /// <summary>The real program, with its managed heap capped at 256 MiB: a read that fills memory fails, a bounded one exits 2.</summary>
    private static (int Exit, string Err) Program(string stdin, params string[] args)
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "study.dll");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true };
        start.ArgumentList.Add(dll);
        foreach (string a in args) start.ArgumentList.Add(a);
        start.Environment["DOTNET_GCHeapHardLimit"] = "0x10000000";
        using Process p = Process.Start(start)!;
        p.StandardInput.Write(stdin);
        p.StandardInput.Close();
        Task<string> err = p.StandardError.ReadToEndAsync();
        Task<string> output = p.StandardOutput.ReadToEndAsync();
        if (!p.WaitForExit((int)Limit.TotalMilliseconds))
        {
            p.Kill(entireProcessTree: true);
            Assert.Fail($"study {string.Join(' ', args)}: no answer within {Limit.TotalSeconds} s (a hang)");
        }
        return (p.ExitCode, err.Result + output.Result);
    }

    [Theory]
    [InlineData("/dev/zero")]
    [InlineData("/dev/urandom")]
    public void A_device_of_endless_bytes_is_refused_with_memory_bounded(string device)
    {
        if (!File.Exists(device)) return;
        (int exit, string err) = Program("", "check", device);
        Assert.True(exit == 2, err);
        Assert.Contains("not a network file", err);
    }

    [Fact]
    public void A_file_of_two_gibibytes_is_refused_by_its_size_with_memory_bounded()
    {
        string path = Path.Combine(root, "zeros.study.json");
        using (var stream = new FileStream(path, FileMode.CreateNew)) stream.SetLength(2L << 30);
        (int exit, string err) = Program("", "solve", path);
        Assert.True(exit == 2, err);
        Assert.Contains("larger than 1536 MiB", err);
    }

    [Fact]
    public void A_bench_of_two_billion_buses_is_refused_before_anything_is_generated()
    {
        (int exit, string err) = Program("", "bench", "--sizes", "2000000000");
        Assert.True(exit == 2, err);
        Assert.Contains("more than the generator makes", err);
    }

    [Fact]
    public void The_terminal_ui_without_a_terminal_exits_2_pointing_to_the_commands()
    {
        foreach (string[] args in new[] { Array.Empty<string>(), [DemoNetworks.Demo] })
        {
            (int exit, string err) = Program("q\n", args);
            Assert.True(exit == 2, err);
            Assert.Contains("the terminal UI needs a terminal", err);
            Assert.Contains("study help", err);
        }
    }
}
