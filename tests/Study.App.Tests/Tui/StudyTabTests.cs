// The study tabs without a screen: tap-study question and tables, fault tables, one-line rows, scenarios.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.Faults;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Shell;
using Study.App.Tui.Taps;
using Study.App.Tui;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Cases;

namespace Study.App.Tests.Tui;

public sealed class StudyTabTests
{
    [Fact]
    public void Tap_study_form_keeps_engine_defaults_when_blank_and_rejects_a_half_band()
    {
        Network n = DemoNetwork.Read();
        var form = new TapStudyForm(n, "CQ-T1", "summer-night");
        (TapStudyRequest? request, string? error) = form.Build();
        Assert.Null(error);
        Assert.Null(request!.Band);
        Assert.Empty(request.WatchBuses);
        Assert.Empty(request.Scenarios); // every scenario

        form.AllScenarios = false;
        Assert.Equal("summer-night", Assert.Single(form.Build().Request!.Scenarios));

        form.BandLowText = "0.97";
        Assert.Contains("both band limits", form.Build().Error);
        form.BandHighText = "0.96";
        Assert.Contains("empty", form.Build().Error);
        form.BandHighText = "1.03";
        form.WatchText = "CQ11, NOPE";
        Assert.Contains("NOPE", form.Build().Error);
        form.WatchText = "CQ11, CS11";
        Assert.Equal((0.97, 1.03), form.Build().Request!.Band);
    }

    [Fact]
    public void Tap_study_of_the_demo_bank_recommends_a_position_and_the_table_marks_it_best()
    {
        Network n = DemoNetwork.Read();
        var request = new TapStudyForm(n, "CQ-T1", null).Build().Request!;
        TapStudyResult r = StudyCase.Of(n).Taps(request);
        Assert.NotEmpty(r.Recommended);
        TextTableSource table = TapStudyTables.Positions(r);
        Assert.Equal(r.Max - r.Min + 1, table.Rows);
        string best = Labels.Position(r.Recommended[0].Position);
        Assert.Contains(table.RowCells, row => row[0].TrimEnd('*') == best && row[2] == "best");
        Assert.Contains("recommended", TapStudyTables.Summary(r));
        Assert.Contains("Alt+P sets " + best, TapStudyTables.Summary(r));
    }

    [Fact]
    public void Tap_curve_shifts_positions_to_start_right_of_the_vertical_axis_and_labels_them_back()
    {
        Network n = DemoNetwork.Read();
        TapStudyResult r = StudyCase.Of(n).Taps(new TapStudyRequest { TransformerId = "CQ-T1", Scenarios = [] });
        TapCurve curve = TapCurve.From(r);
        Assert.Equal(2, curve.Series.Count);
        Assert.Equal(1f, curve.XOf(r.Min));
        Assert.Equal(r.Max, curve.PositionOf(curve.XOf(r.Max)));
        Assert.All(curve.Series, s => Assert.All(s.Lowest, p => Assert.True(p.X >= 1)));
        Assert.Equal(0.95, curve.BandLowPu, 6);
        Assert.Contains("winter-peak", curve.Legend());
    }

    [Fact]
    public void Applying_a_tap_position_is_one_undoable_edit()
    {
        var session = EditSession.Untitled(DemoNetwork.Read(), Path.GetTempPath());
        Assert.True(session.SetTapPosition("CQ-T1", -1));
        Assert.Equal(-1, session.Network.Transformers.Single(t => t.Id == "CQ-T1").Tap!.Position);
        Assert.True(session.Undo());
        Assert.Equal(0, session.Network.Transformers.Single(t => t.Id == "CQ-T1").Tap!.Position);
        Assert.False(session.SetTapPosition("NO-SUCH", 1));
        session.Close();
    }

    [Fact]
    public void Fault_form_asks_for_every_bus_by_default_the_selected_bus_only_when_chosen_and_needs_a_kind()
    {
        var form = new FaultForm("CQ11");
        FaultRequest request = form.Build().Request!;
        Assert.Null(request.Buses); // every bus, whatever row the cursor happens to be on
        Assert.Equal(FaultRequest.Default.Kinds, request.Kinds);
        form.AllBuses = false;
        Assert.Equal(["CQ11"], form.Build().Request!.Buses);
        form.Kinds.Clear();
        Assert.NotNull(form.Build().Error);
        Assert.True(new FaultForm(null).AllBuses);
        Assert.NotNull(new FaultForm(null) { AllBuses = false }.Build().Error);
    }

    [Fact]
    public void Fault_at_the_new_11kV_board_reports_kA_and_marks_breaker_duty_in_words()
    {
        Network n = DemoNetwork.Read();
        FaultResult r = StudyCase.Of(n).Fault(new FaultRequest { Buses = ["CQ11"], Kinds = FaultForm.AllKinds });
        TextTableSource levels = FaultTables.Levels(r);
        Assert.Equal(4, levels.Rows);
        Assert.Equal("CQ11", levels.RowCells[0][0]);
        Assert.Equal("", levels.RowCells[1][0]);
        Assert.True(double.Parse(levels.RowCells[0][2], System.Globalization.CultureInfo.InvariantCulture) > 1);
        Assert.Equal(FaultStudy.Caution, r.Caution);

        // One row per check of each breaker: the duty and its status in words.
        var over = new FaultResult { Breakers = [new BreakerDuty { Id = "CB", Bus = "B", DutyPercent = 120, Status = DutyStatus.Over,
            Checks = [new DutyCheck { Check = DutyCheckKind.Breaking, DutyPercent = 120, Status = DutyStatus.Over }] }] };
        TextTableSource breakers = FaultTables.Breakers(over);
        string[] row = breakers.RowCells[0];
        Assert.Contains("▲", row[Array.IndexOf(breakers.ColumnNames, "duty %")]);
        Assert.Contains("OVER", row[Array.IndexOf(breakers.ColumnNames, "status")]);
    }

    [Fact]
    public void One_line_puts_sources_first_and_levels_by_kV_descending_with_banks_and_solved_voltages()
    {
        Network n = DemoNetwork.Read();
        LoadFlowResult solved = StudyCase.Of(n).Solve(new SolveRequest { Scenario = null });
        var rows = OneLineLayout.Build(n, solved).Select(r => r.Text).ToList();
        Assert.Equal("Sources", rows[0]);
        int kv132 = rows.FindIndex(r => r.StartsWith("━━ 132 kV", StringComparison.Ordinal));
        int kv33 = rows.FindIndex(r => r.StartsWith("━━ 33 kV", StringComparison.Ordinal));
        int kv11 = rows.FindIndex(r => r.StartsWith("━━ 11 kV", StringComparison.Ordinal));
        Assert.True(kv132 > 0 && kv132 < kv33 && kv33 < kv11);
        int bank = rows.FindIndex(r => r.Contains("╪ CQ-T1", StringComparison.Ordinal));
        Assert.InRange(bank, kv33, kv11);
        Assert.Contains("tap 0", rows[bank]);
        Assert.Contains("ratio 1.0000", rows[bank]);
        string cq11 = rows.Single(r => r.Contains("■ CQ11", StringComparison.Ordinal));
        Assert.Matches(@"0\.9\d{3} pu", cq11);
        Assert.Contains(rows, r => r.Contains("CQ-CS", StringComparison.Ordinal) && r.Contains("CS11", StringComparison.Ordinal));
        Assert.DoesNotContain(OneLineLayout.Build(n, null), r => r.Text.Contains(" pu ", StringComparison.Ordinal) && r.Text.Contains('■'));
    }

    [Fact]
    public void The_active_scenario_reaches_the_load_flow_and_the_status_line_names_it()
    {
        Network n = DemoNetwork.Read();
        LoadFlowResult peak = StudyCase.Of(n).Solve(new SolveRequest { Scenario = "winter-peak" });
        LoadFlowResult night = StudyCase.Of(n).Solve(new SolveRequest { Scenario = "summer-night" });
        Assert.Equal("summer-night", night.Scenario);
        Assert.Equal(peak.Totals.LoadMw * 0.33, night.Totals.LoadMw, 0.05 * peak.Totals.LoadMw);
        Assert.Contains("scenario summer-night", StatusLine.Summary(night, "summer-night", null));
        Assert.Contains("shown: winter-peak", StatusLine.Summary(peak, "summer-night", null));
    }
}
