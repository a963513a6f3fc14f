// Headless screens at 80×24: the element list with counts, and the results view's low-voltage marker.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.App.Tui;
using Study.Core.LoadFlow;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Time;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class ScreenTests
{
    private static string Draw(Func<IApplication, Window> build, Action<IApplication, Window>? before = null)
    {
        var time = new VirtualTimeProvider();
        using IApplication app = Application.Create(time);
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(80, 24);
        Window window = build(app);
        SessionToken? token = app.Begin(window);
        before?.Invoke(app, window);
        app.LayoutAndDraw(true);
        string screen = app.Driver.ToString()!;
        app.End(token!);
        window.Dispose();
        return screen;
    }

    [Fact]
    public void Main_window_shows_the_element_list_with_counts_and_the_status_line_at_80x24()
    {
        string screen = Draw(app => new MainWindow(app, EditSession.Untitled(SampleNetwork.Build(), Path.GetTempPath())));
        Assert.Contains("Buses (3)", screen);
        Assert.Contains("Transformers (1)", screen);
        Assert.Contains("Loads (1)", screen);
        Assert.Contains("Base kV", screen);
        string[] rows = screen.Split('\n');
        Assert.Contains("not solved", rows[23]);
        Assert.Contains("F1 Keys", rows[23]);
    }

    [Fact]
    public void A_low_bus_in_a_load_flow_result_shows_the_low_marker_in_the_results_view()
    {
        var result = new LoadFlowResult
        {
            Converged = true,
            Iterations = 4,
            Buses =
            [
                new BusResult { Id = "B33", Kv = 33, VPu = 1.0, VKv = 33, VMin = 0.95, VMax = 1.05 },
                new BusResult { Id = "B11F", Kv = 11, VPu = 0.931, VKv = 10.241, AngleDeg = -4.2, VMin = 0.95, VMax = 1.05, Violation = ViolationKind.Low },
            ],
        };
        ResultsView? view = null;
        string screen = Draw(_ =>
        {
            var window = new Window();
            view = new ResultsView();
            window.Add(view);
            return window;
        }, (_, _) =>
        {
            view!.Result = result;
            view.Value = view.BusesTab;
        });
        string row = screen.Split('\n').Single(r => r.Contains("│B11F"));
        Assert.Contains("0.9310▼", row);
        Assert.DoesNotContain("▼", screen.Split('\n').Single(r => r.Contains("│B33")));
        // The heading names the lowest and the highest bus voltage at a glance.
        Assert.Contains("lowest V 0.9310 pu at B11F ▼", screen);
        Assert.Contains("highest V 1.0000 pu at B33", screen);
    }
}
