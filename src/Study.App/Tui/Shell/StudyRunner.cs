// Runs a study off the UI thread on a network snapshot, shows progress, can be cancelled, delivers on the UI thread.
using Study.Core.Model;
using Terminal.Gui.App;

namespace Study.App.Tui.Shell;

/// <summary>
/// One study at a time. The work gets only immutable inputs captured at the start, so the user may
/// keep editing; the outcome is handed back through <see cref="IApplication.Invoke(Action)"/>.
/// </summary>
public sealed class StudyRunner(IApplication app, Func<DateTime>? clock = null)
{
    private static readonly string[] Spinner = ["⠋", "⠙", "⠹", "⠸", "⠼", "⠴", "⠦", "⠧", "⠇", "⠏"];
    private readonly Func<DateTime> now = clock ?? (() => DateTime.UtcNow);
    private CancellationTokenSource? cancel;
    private ProgressMeter? meter;
    private DateTime started;
    private string title = "";
    private int frame;

    public bool IsRunning => cancel is not null;

    /// <summary>"Load flow ⠹ 1.2 s", "Outage screening ⠹ 120/342 outages · 45/s · about 5 s left · 2.7 s" while running; null otherwise.</summary>
    public string? Progress { get; private set; }

    /// <summary>Raised on the UI thread when a study starts, ticks or ends.</summary>
    public event Action? StateChanged;

    /// <summary>Starts <paramref name="work"/>; false when a study is already running.</summary>
    public bool Start<T>(string studyTitle, Func<CancellationToken, T> work, Action<T> done, Action<string> failed, ProgressMeter? progress = null)
    {
        if (cancel is not null) return false;
        var source = new CancellationTokenSource();
        cancel = source;
        title = studyTitle;
        meter = progress;
        frame = 0;
        started = now();
        Tick();
        app.AddTimeout(TimeSpan.FromMilliseconds(120), () =>
        {
            if (cancel != source) return false;
            frame++;
            Tick();
            return true;
        });
        Task.Run(() => work(source.Token), source.Token).ContinueWith(task => app.Invoke(() =>
        {
            cancel = null;
            Progress = null;
            source.Dispose();
            // The status line drops the spinner before a message about the outcome goes up (it may be modal).
            StateChanged?.Invoke();
            if (task.IsCanceled || task.Exception?.InnerException is OperationCanceledException) failed($"{title} cancelled");
            else if (task.Exception?.InnerException is Exception e) failed($"{title} failed: {Describe(e)}");
            else done(task.Result);
            StateChanged?.Invoke();
        }), TaskScheduler.Default);
        return true;
    }

    public void Cancel() => cancel?.Cancel();

    /// <summary>Recomputes <see cref="Progress"/> (the timer does this every 120 ms).</summary>
    public void Tick()
    {
        if (cancel is null) return;
        Progress = StudyProgress.Text(title, Spinner[frame % Spinner.Length], meter, now() - started) + " · Esc cancels";
        StateChanged?.Invoke();
    }

    private static string Describe(Exception e) => e is InputException input ? input.Describe() : e.Message;
}
