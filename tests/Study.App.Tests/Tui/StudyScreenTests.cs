// Headless study screens at 80×24: the fault caution stays on top of the Faults tab; the tap tab shows the finding.
using Study.App.Tui.Faults;
using Study.App.Tui.Shell;
using Study.App.Tui;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Studies;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.Time;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Study.Core.Cases;

namespace Study.App.Tests.Tui;

public sealed class StudyScreenTests
{
    private static string Draw(Action<ResultsView> show, params Key[] keys)
    {
        var time = new VirtualTimeProvider();
        using IApplication app = Application.Create(time);
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(80, 24);
        var window = new Window();
        var view = new ResultsView();
        window.Add(view);
        SessionToken? token = app.Begin(window);
        show(view);
        app.LayoutAndDraw(true);
        foreach (Key key in keys) app.InjectKey(key);
        app.LayoutAndDraw(true);
        string screen = app.Driver.ToString()!;
        app.End(token!);
        window.Dispose();
        return screen;
    }

    [Fact]
    public void The_fault_caution_stays_at_the_top_of_the_Faults_tab_when_the_table_scrolls()
    {
        Network n = DemoNetwork.Read();
        FaultResult r = StudyCase.Of(n).Fault(new FaultRequest { Kinds = FaultForm.AllKinds });
        string screen = Draw(v =>
        {
            v.FaultResult = r;
            v.Value = v.FaultsTab;
        }, Key.PageDown, Key.PageDown, Key.PageDown);
        string[] rows = screen.Split('\n');
        int caution = Array.FindIndex(rows, row => row.Contains("Caution: fault levels", StringComparison.Ordinal));
        Assert.InRange(caution, 0, 5);
        Assert.Contains("energised", screen);
        Assert.Contains("I''k kA", screen);
    }

    [Fact]
    public void The_tap_study_tab_shows_the_recommendation_the_table_and_the_curve_legend()
    {
        Network n = DemoNetwork.Read();
        TapStudyResult r = StudyCase.Of(n).Taps(new TapStudyRequest { TransformerId = "CQ-T1", Scenarios = [] });
        string screen = Draw(v =>
        {
            v.TapStudyResult = r;
            v.Value = v.TapStudyTab;
        });
        Assert.Contains("CQ-T1 recommended", screen);
        Assert.Contains("Margin pu", screen);
        Assert.Contains("tap position", screen);
        Assert.Contains("● winter-peak", screen);
    }
}
