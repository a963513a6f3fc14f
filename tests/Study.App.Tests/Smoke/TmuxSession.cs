// Drives the real `study` program in a detached tmux session with a private socket and a scratch HOME.
using System.Diagnostics;

namespace Study.App.Tests.Smoke;

/// <summary>
/// One tmux server of its own (<c>tmux -L study-smoke-GUID</c>), so tests never touch a user's sessions;
/// disposing kills that server and deletes the scratch HOME.
/// </summary>
public sealed class TmuxSession : IDisposable
{
    private readonly string socket = "study-smoke-" + Guid.NewGuid().ToString("N");

    private TmuxSession(string home) => Home = home;

    public string Home { get; }

    /// <summary>True when a tmux executable is on PATH.</summary>
    public static bool Available() => FindOnPath("tmux") is not null;

    /// <summary>Starts <paramref name="command"/> in <paramref name="workingDirectory"/> at the given size.</summary>
    public static TmuxSession Start(string command, string workingDirectory, int width, int height)
    {
        string home = Path.Combine(Path.GetTempPath(), "study-smoke-home-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(home);
        var session = new TmuxSession(home);
        // The pane runs the program, then prints a marker so the test can see that it ended.
        string script = $"cd '{workingDirectory}' && HOME='{home}' TERM=xterm-256color {command}; echo STUDY-EXITED-$?; sleep 60";
        session.Tmux("new-session", "-d", "-x", width.ToString(), "-y", height.ToString(), "-s", "smoke", script);
        return session;
    }

    public string Capture() => Tmux("capture-pane", "-p", "-t", "smoke");

    public void Keys(params string[] keys) => Tmux(["send-keys", "-t", "smoke", .. keys]);

    /// <summary>Polls the screen until it contains <paramref name="text"/>; returns the last screen either way.</summary>
    public (bool Found, string Screen) WaitFor(string text, TimeSpan timeout) => WaitFor(s => s.Contains(text, StringComparison.Ordinal), timeout);

    public (bool Found, string Screen) WaitFor(Func<string, bool> seen, TimeSpan timeout)
    {
        var clock = Stopwatch.StartNew();
        string screen = "";
        while (clock.Elapsed < timeout)
        {
            screen = Capture();
            if (seen(screen)) return (true, screen);
            Thread.Sleep(200);
        }
        return (false, screen);
    }

    public void Dispose()
    {
        try { Tmux("kill-server"); } catch (InvalidOperationException) { }
        try { Directory.Delete(Home, recursive: true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }

    private string Tmux(params string[] args)
    {
        var info = new ProcessStartInfo("tmux") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add("-L");
        info.ArgumentList.Add(socket);
        foreach (string a in args) info.ArgumentList.Add(a);
        using Process p = Process.Start(info) ?? throw new InvalidOperationException("tmux did not start");
        string output = p.StandardOutput.ReadToEnd();
        string error = p.StandardError.ReadToEnd();
        if (!p.WaitForExit(10_000)) p.Kill();
        if (p.ExitCode != 0 && args[0] != "kill-server") throw new InvalidOperationException($"tmux {args[0]} failed: {error}");
        return output;
    }

    private static string? FindOnPath(string name) =>
        (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries)
            .Select(dir => Path.Combine(dir, name)).FirstOrDefault(File.Exists);
}
