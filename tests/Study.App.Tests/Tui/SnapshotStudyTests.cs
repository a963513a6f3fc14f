// A load flow running in the background while the network is edited: the study keeps its snapshot, the session keeps the edits.
using Study.App.Tui.Editing;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Shell;
using Study.App.Tui;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Synthetic;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Time;
using Terminal.Gui.Views;
using Study.Core.Cases;

namespace Study.App.Tests.Tui;

/// <summary>
/// The hardening requirement: background studies run on an immutable snapshot of the network, so
/// editing while a study runs corrupts neither the study nor the edits. The study goes through the
/// same runner and load-flow call as F5; the work is held at a gate until the edits are made, so
/// the edits certainly fall inside the study.
/// </summary>
public sealed class SnapshotStudyTests : IDisposable
{
    private static readonly TimeSpan Patience = TimeSpan.FromMinutes(2);
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    [Fact]
    public void Editing_during_a_long_load_flow_leaves_the_result_of_the_original_network_and_the_edits_in_the_session()
    {
        Network original = SyntheticGrid.Generate(new SyntheticGridOptions { Buses = 20000, Seed = 1 }).Network;
        var session = EditSession.Untitled(original, temp.File("user"));
        LoadFlowResult expected = StudyCase.Of(original).Solve(new SolveRequest { Scenario = null }, CancellationToken.None);
        Assert.True(expected.Converged);

        var time = new VirtualTimeProvider();
        using IApplication app = Application.Create(time);
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(80, 24);
        var runner = new StudyRunner(app);
        using var started = new ManualResetEventSlim();
        using var proceed = new ManualResetEventSlim();
        int solving = 0;
        LoadFlowResult? delivered = null;
        string? failure = null;

        // As MainCommands does for F5: the snapshot and scenario are taken when the study starts.
        Network snapshot = session.Network;
        string? scenario = session.ActiveScenario;
        bool accepted = runner.Start("Load flow", cancel =>
            {
                started.Set();
                Assert.True(proceed.Wait(Patience), "the test never released the study");
                Interlocked.Exchange(ref solving, 1);
                try { return StudyCase.Of(snapshot).Solve(new SolveRequest { Scenario = scenario }, cancel); }
                finally { Interlocked.Exchange(ref solving, 0); }
            },
            result => { delivered = result; app.RequestStop(); },
            message => { failure = message; app.RequestStop(); });
        Assert.True(accepted);
        Assert.True(started.Wait(Patience), "the study did not start");
        Assert.True(runner.IsRunning);

        // Edits while the study is held: heavier loads and a line out — each would move the voltages.
        IReadOnlyList<Load> loads = original.Loads.Take(10).ToList();
        foreach (Load load in loads)
            session.Replace(ElementKind.Load, load.Id, load with { PMw = load.PMw * 2 + 1, QMvar = load.QMvar * 2 });
        string removed = original.Lines[original.Lines.Count / 2].Id;
        session.Delete(ElementKind.Line, removed);
        int edits = loads.Count + 1;

        // One more edit while the solver is working on the snapshot.
        proceed.Set();
        SpinWait.SpinUntil(() => Volatile.Read(ref solving) == 1 || delivered is not null, Patience);
        Load last = original.Loads[^1];
        session.Replace(ElementKind.Load, last.Id, last with { PMw = last.PMw + 5 });
        edits++;

        var window = new Window();
        app.Run(window);
        window.Dispose();

        Assert.Null(failure);
        Assert.NotNull(delivered);
        Assert.False(runner.IsRunning);
        Assert.True(delivered.Converged);
        Assert.Equal(expected.Buses.Select(b => b.Id), delivered.Buses.Select(b => b.Id));
        for (int i = 0; i < expected.Buses.Count; i++)
        {
            Assert.Equal(expected.Buses[i].VPu, delivered.Buses[i].VPu, 12);
            Assert.Equal(expected.Buses[i].AngleDeg, delivered.Buses[i].AngleDeg, 10);
        }
        Assert.Contains(delivered.Branches, b => b.Id == removed);

        // The snapshot is the original network, untouched by the edits.
        Assert.Same(original, snapshot);
        Assert.Equal(loads.Select(l => l.PMw), original.Loads.Take(10).Select(l => l.PMw));
        Assert.Contains(original.Lines, l => l.Id == removed);

        // The session holds every edit, and the edits are real: the edited network solves differently.
        Network edited = session.Network;
        Assert.Equal(loads.Select(l => l.PMw * 2 + 1), loads.Select(l => edited.Loads.Single(x => x.Id == l.Id).PMw));
        Assert.DoesNotContain(edited.Lines, l => l.Id == removed);
        Assert.Equal(last.PMw + 5, edited.Loads.Single(x => x.Id == last.Id).PMw);
        Assert.True(session.Dirty);
        LoadFlowResult afterEdits = StudyCase.Of(edited).Solve(new SolveRequest { Scenario = null }, CancellationToken.None);
        Assert.Contains(afterEdits.Buses.Zip(expected.Buses), p => Math.Abs(p.First.VPu - p.Second.VPu) > 1e-6);

        // Undo walks back through every edit to the original network.
        for (int i = 0; i < edits; i++) Assert.True(session.Undo());
        Assert.Same(original, session.Network);
        Assert.False(session.Dirty);
    }
}
