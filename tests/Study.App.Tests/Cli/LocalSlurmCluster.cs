// A one-node Slurm cluster on this machine for the --slurm test: reused when one answers, else started and stopped.
using System.Diagnostics;

namespace Study.App.Tests.Cli;

/// <summary>
/// Reuses a cluster that already answers <c>sinfo</c>; otherwise starts munged (when munge does not
/// answer), slurmctld and slurmd in the foreground as child processes, from the configuration
/// <c>.ci/slurm-setup</c> writes, and stops exactly those by their process ids when disposed.
/// <see cref="Start"/> returns null, with the reason, where Slurm is not installed or not set up.
/// </summary>
internal sealed class LocalSlurmCluster : IDisposable
{
    private static readonly TimeSpan Ready = TimeSpan.FromSeconds(60);
    private readonly List<Process> started = [];

    private LocalSlurmCluster() { }

    /// <summary>What was started (empty when an answering cluster was reused).</summary>
    public IReadOnlyList<string> Started => started.Select(p => $"{p.StartInfo.FileName} (pid {p.Id})").ToList();

    public static LocalSlurmCluster? Start(out string? whyNot)
    {
        whyNot = null;
        if (!OnPath("sbatch") || !OnPath("sinfo"))
        {
            whyNot = "Slurm is not installed (no sbatch or sinfo on PATH); .ci/run installs slurm-wlm and munge with .ci/slurm-setup";
            return null;
        }
        var cluster = new LocalSlurmCluster();
        if (HasIdleNode()) return cluster;
        if (!File.Exists("/etc/slurm/slurm.conf"))
        {
            whyNot = "Slurm is installed but no cluster answers and there is no /etc/slurm/slurm.conf; .ci/slurm-setup writes a one-node one";
            return null;
        }
        if (Environment.UserName != "root")
        {
            whyNot = "no cluster answers, and starting munged, slurmctld and slurmd needs root";
            return null;
        }
        try
        {
            if (!Succeeds("sh", "-c", "munge -n | unmunge"))
            {
                cluster.Launch("setpriv", "--reuid=munge", "--regid=munge", "--init-groups", "/usr/sbin/munged", "-F");
                cluster.WaitFor(() => Succeeds("sh", "-c", "munge -n | unmunge"), "munge to answer");
            }
            cluster.Launch("slurmctld", "-D");
            cluster.Launch("slurmd", "-D");
            cluster.WaitFor(HasIdleNode, "the node to show idle in sinfo");
            return cluster;
        }
        catch
        {
            cluster.Dispose();
            throw;
        }
    }

    public void Dispose()
    {
        // slurmd before slurmctld before munged: each stops while what it talks to is still there.
        for (int k = started.Count - 1; k >= 0; k--)
        {
            Process p = started[k];
            try
            {
                if (!p.HasExited)
                {
                    Process.Start("kill", ["-TERM", p.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)])?.WaitForExit();
                    if (!p.WaitForExit(15_000)) p.Kill();
                    p.WaitForExit();
                }
            }
            catch (InvalidOperationException) { }
            p.Dispose();
        }
        started.Clear();
    }

    private void Launch(string program, params string[] arguments)
    {
        var info = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in arguments) info.ArgumentList.Add(a);
        Process p = Process.Start(info) ?? throw new InvalidOperationException($"{program} did not start");
        p.OutputDataReceived += (_, _) => { };
        p.ErrorDataReceived += (_, _) => { };
        p.BeginOutputReadLine();
        p.BeginErrorReadLine();
        started.Add(p);
    }

    private void WaitFor(Func<bool> condition, string what)
    {
        var clock = Stopwatch.StartNew();
        while (!condition())
        {
            if (started.FirstOrDefault(p => p.HasExited) is Process gone)
                throw new InvalidOperationException($"{gone.StartInfo.FileName} exited with code {gone.ExitCode} while waiting for {what} "
                    + "(see /var/log/slurm/ and /var/log/munge/)");
            if (clock.Elapsed > Ready) throw new TimeoutException($"waited {Ready.TotalSeconds:0} s for {what}");
            Thread.Sleep(500);
        }
    }

    private static bool HasIdleNode()
    {
        (bool ok, string output) = Run("sinfo", "-h", "-o", "%T");
        return ok && output.Split('\n').Any(state => state.Trim() is "idle" or "mixed" or "allocated");
    }

    private static bool OnPath(string program) =>
        (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':').Any(dir => dir.Length > 0 && File.Exists(Path.Combine(dir, program)));

    private static bool Succeeds(string program, params string[] arguments) => Run(program, arguments).Ok;

    private static (bool Ok, string Output) Run(string program, params string[] arguments)
    {
        var info = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in arguments) info.ArgumentList.Add(a);
        using Process p = Process.Start(info)!;
        Task<string> output = p.StandardOutput.ReadToEndAsync();
        _ = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(10_000))
        {
            p.Kill();
            return (false, "");
        }
        return (p.ExitCode == 0, output.Result);
    }
}
