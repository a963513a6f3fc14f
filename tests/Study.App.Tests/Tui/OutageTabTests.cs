// The Outages tab: the dialog's question, the ranked table read without colour, the tab at 80×24, the key.
using Study.App.Reports;
using Study.App.Tui.Outages;
using Study.App.Tui.Shell;
using Study.App.Tui;
using Study.Core.Model;
using Study.Core.Studies;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Time;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Study.Core.Cases;

namespace Study.App.Tests.Tui;

public sealed class OutageTabTests
{
    [Fact]
    public void Outage_form_screens_the_active_scenario_or_every_scenario()
    {
        Network n = DemoNetwork.Read();
        // A null name is the loads as entered; an empty list asks for every scenario.
        Assert.Null(Assert.Single(new OutageForm(n, null).Build().Request!.Scenarios));
        var form = new OutageForm(n, "summer-night");
        Assert.Equal("summer-night", Assert.Single(form.Build().Request!.Scenarios));
        form.AllScenarios = true;
        Assert.Empty(form.Build().Request!.Scenarios);
        Assert.Contains("no longer", new OutageForm(n, "gone").Build().Error);
    }

    [Fact]
    public void Demo_outage_table_ranks_each_scenario_and_marks_overloads_and_low_voltage_in_text()
    {
        Network n = DemoNetwork.Read();
        OutageScreeningResult r = StudyCase.Of(n).Outages(new OutageScreeningRequest { Scenarios = [] });
        TextTableSource table = OutageTables.Outages(r);
        Assert.Equal(r.Scenarios.Sum(s => s.Outages.Count), table.Rows);
        Assert.Equal(OutageTables.Cases(r).Count, table.Rows);
        int at = 0;
        foreach (ScenarioScreening s in r.Scenarios)
        {
            Assert.Equal(s.Scenario, table.RowCells[at][0]);
            Assert.Equal("1", table.RowCells[at][1]);
            Assert.Equal(s.Outages[0].Element, table.RowCells[at][2]);
            Assert.All(Enumerable.Range(at + 1, s.Outages.Count - 1), i => Assert.Equal("", table.RowCells[i][0]));
            at += s.Outages.Count;
        }
        // Each row names its tier in words, so the ranking reads without colour.
        Assert.All(table.RowCells, row => Assert.Matches("(NO SOLUTION|LOAD LOST|LIMITS BROKEN|secure)$", row[4]));
        OutageCase overloaded = OutageTables.Cases(r).First(c => c.WorstLoadingPercent > 100);
        Assert.Contains(table.RowCells, row => row[2] == overloaded.Element && row[8].EndsWith('▲') && row[9] == overloaded.WorstLoadingElement);
        Assert.Contains(table.RowCells, row => row[6].Contains('▼', StringComparison.Ordinal));
        Assert.Contains("LOAD LOST", OutageTables.Heading(r));
    }

    [Fact]
    public void An_outage_that_does_not_converge_says_so_and_shows_no_values()
    {
        var r = new OutageScreeningResult
        {
            Elements = ["L9"],
            Scenarios = [new ScenarioScreening { IntactConverged = true, Outages =
                [new OutageCase { Element = "L9", Kind = Study.Core.Units.BranchKind.Line, Converged = false, Severity = OutageSeverity.NoConvergence }] }],
        };
        string[] row = Assert.Single(OutageTables.Outages(r).RowCells);
        Assert.Equal(["as entered", "1", "L9", "line", "1000.0 NO SOLUTION", "—", "—", "—", "—", "—", "—", "—"], row);
        Assert.StartsWith("as entered: 1 NO SOLUTION (1000) · 0 secure (0)", OutageTables.Heading(r));
    }

    [Fact]
    public void The_Outages_tab_shows_the_heading_and_the_ranked_table_at_80x24()
    {
        Network n = DemoNetwork.Read();
        OutageScreeningResult r = StudyCase.Of(n).Outages(new OutageScreeningRequest { Scenarios = [] });
        var time = new VirtualTimeProvider();
        using IApplication app = Application.Create(time);
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(80, 24);
        var window = new Window();
        var view = new ResultsView();
        window.Add(view);
        SessionToken? token = app.Begin(window);
        view.OutageResult = r;
        view.Value = view.OutagesTab;
        app.LayoutAndDraw(true);
        string screen = app.Driver.ToString()!;
        app.End(token!);
        window.Dispose();
        Assert.Contains("winter-peak: ", screen);
        Assert.Contains("severity", screen);
        Assert.Contains(r.Scenarios[0].Outages[0].Element, screen);
        Assert.Contains("LOAD LOST", screen);
    }

    [Fact]
    public void Outage_screening_has_its_own_key_in_the_Study_menu_and_no_key_runs_two_commands()
    {
        TuiCommand c = TuiCommands.Of(TuiAction.Outages);
        Assert.Equal("Study", c.Menu);
        Assert.Same(c, TuiCommands.ForKey(Key.U.WithAlt));
        Assert.Equal(TuiAction.ShowOutages, TuiCommands.ForKey(Key.D8.WithAlt)!.Action);
        var keys = TuiCommands.All.SelectMany(x => x.Keys).Select(k => k.ToString()).ToList();
        Assert.Equal(keys.Count, keys.Distinct().Count());
    }
}
