// Every column spec shows the same cells in plain text, Markdown and the TUI, and the same quantities in CSV.
using System.Numerics;
using Study.App.Cli;
using Study.App.Reports;
using Study.App.Tests.Tui;
using Study.Core.Cases;
using Study.Core.Faults;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using Study.Core.Units;
using static Study.App.Tests.Reports.SpecRendering;

namespace Study.App.Tests.Reports;

/// <summary>
/// The rows are the demo estate's real results plus hand-made records with the cases that carry
/// marks: no kV, a dead bus, no rating, an unbounded X/R, a breaker without rating, a point or an
/// outage that did not converge.
/// </summary>
public sealed class ColumnSpecTests
{
    private static readonly Network Demo = DemoNetwork.Read();

    [Fact]
    public void A_base_kV_reads_as_stated_to_the_volt_so_a_415_V_board_is_not_shown_as_0_4_kV()
    {
        Assert.Equal("0.415", LoadFlowColumns.BaseKv(0.415));
        Assert.Equal("132", LoadFlowColumns.BaseKv(132));
        Assert.Equal("6.6", LoadFlowColumns.BaseKv(6.6));
        Assert.Equal(Numbers.Blank, LoadFlowColumns.BaseKv(0));
        // The fault table of the demo names its 415 V board's kV in full.
        FaultResult f = StudyCase.Of(Demo).Fault(new FaultRequest { Buses = ["CS04"], Kinds = [FaultKind.ThreePhase] });
        var spec = FaultColumns.Levels(false);
        int kv = spec.Headings.ToList().IndexOf("kV");
        Assert.Equal("0.415", spec.ReadableRows(f.Faults)[0][kv]);
        // And its load-flow voltage to the volt: V kV = V pu × 0.415 with three decimals.
        LoadFlowResult lf = LoadFlowSolver.Solve(PerUnitModel.Build(Demo));
        BusResult cs04 = lf.Buses.Single(b => b.Id == "CS04");
        var buses = LoadFlowColumns.Buses();
        string[] row = buses.ReadableRows([cs04])[0];
        Assert.Equal((cs04.VPu * 0.415).ToString("F3", System.Globalization.CultureInfo.InvariantCulture), row[buses.Headings.ToList().IndexOf("V kV")]);
    }

    [Fact]
    public void Load_flow_specs_agree_in_every_output()
    {
        LoadFlowResult r = LoadFlowSolver.Solve(PerUnitModel.Build(Demo, Demo.FindScenario("winter-peak")));
        var names = Demo.Buses.ToDictionary(b => b.Id, b => b.Name);
        BusResult[] buses =
        [
            .. r.Buses,
            new BusResult { Id = "NOKV", VPu = 0.93, Violation = ViolationKind.Low, VMin = 0.95, VMax = 1.05 },
            new BusResult { Id = "DEAD", Kv = 11, VPu = 0, VKv = 0, Energised = false },
        ];
        BranchResult[] branches = [.. r.Branches, new BranchResult { Id = "L9", Kind = BranchKind.Line, From = "A", To = "B", LoadingPercent = 120.25 }];
        TapResult[] taps = [.. r.Taps, new TapResult { Id = "T9", Position = 5, Ratio = 1.125, Regulating = true, RegulatedBus = "B", AtLimit = TapLimit.Highest }];
        Violation[] violations =
        [
            new Violation { Element = "QE33", Kind = ElementKind.Bus, Type = ViolationKind.Low, Value = 0.94123, Limit = 0.95 },
            new Violation { Element = "GT2", Kind = ElementKind.Transformer, Type = ViolationKind.Overload, Value = 120.34, Limit = 100 },
        ];
        AssertSameCells(LoadFlowColumns.Buses(id => names.GetValueOrDefault(id)), buses);
        AssertSameCells(LoadFlowColumns.Branches, branches);
        AssertSameCells(LoadFlowColumns.Taps, taps);
        AssertSameCells(LoadFlowColumns.Violations, violations);
    }

    [Fact]
    public void Tap_study_specs_agree_in_every_output_with_a_point_that_did_not_converge()
    {
        TapStudyResult r = StudyCase.Of(Demo).Taps(new TapStudyRequest { TransformerId = "CQ-T1" });
        TapStudyPoint failed = r.Points[0] with { Converged = false, Watched = [], MarginPu = double.NegativeInfinity };
        r = r with { Points = [failed, .. r.Points.Skip(1)] };
        AssertSameCells(TapStudyColumns.Points(r), r.Points);
        AssertSameCells(TapStudyColumns.Recommended, TapStudyColumns.Ranked(r).ToList());
        AssertSameCells(TapStudyColumns.ScreenPositions(r), TapStudyColumns.ByPosition(r));
    }

    [Fact]
    public void Outage_specs_agree_in_every_output_with_an_outage_that_did_not_converge()
    {
        OutageScreeningResult r = StudyCase.Of(Demo).Outages(new OutageScreeningRequest());
        var failed = new ScenarioScreening
        {
            Scenario = "stress", IntactConverged = true,
            Outages = [new OutageCase { Element = "L9", Kind = BranchKind.Line, Converged = false, Severity = OutageSeverity.NoConvergence }],
        };
        r = r with { Scenarios = [.. r.Scenarios, failed] };
        Assert.NotEmpty(OutageColumns.Violations(r));
        AssertSameCells(OutageColumns.Outages, OutageColumns.Ranked(r).ToList());
        AssertSameCells(OutageColumns.NewViolations, OutageColumns.Violations(r).ToList());
        AssertSameCells(OutageColumns.ScreenOutages, OutageColumns.Ranked(r).ToList());
    }

    [Fact]
    public void Comparison_specs_agree_in_every_output()
    {
        Network before = Study.Core.Io.NetworkFile.Read(Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-before.study.json"));
        Scenario? peak = Demo.FindScenario("winter-peak");
        CaseComparisonResult r = StudyCase.Compare(StudyCase.Of(before), "winter-peak", StudyCase.Of(Demo), peak?.Name, LoadFlowOptions.Default);
        Assert.Contains(r.Buses, b => b.DeltaPu is null);
        var violation = new Violation { Element = "GT2", Kind = ElementKind.Transformer, Type = ViolationKind.Overload, Value = 101.5, Limit = 100 };
        r = r with { ViolationsAppeared = [violation] };
        AssertSameCells(CompareColumns.Buses, r.Buses);
        AssertSameCells(CompareColumns.Branches, r.Branches);
        AssertSameCells(CompareColumns.Taps, r.Taps);
        AssertSameCells(CompareColumns.Violations, CompareColumns.ViolationChanges(r).ToList());
        AssertSameCells(CompareColumns.Totals, CompareColumns.TotalChanges(r).ToList());
    }

    [Fact]
    public void Fault_specs_agree_in_every_output_with_an_unbounded_X_over_R_and_a_bus_without_kV()
    {
        FaultResult r = FaultStudy.Run(PerUnitModel.Build(Demo), new FaultRequest { Buses = ["CQ11", "WRB33"], Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth] });
        ShortCircuitLevel noKv = r.Faults[0] with { Bus = "NOKV", Kv = 0, IkKa = null, IpKa = null, XOverR = null, Z0Pu = null, Z0Ohm = null };
        ShortCircuitLevel[] levels = [.. r.Faults, noKv];
        BreakerDuty[] breakers = [.. r.Breakers, new BreakerDuty { Id = "CB9", Bus = "NOKV", Status = DutyStatus.KvNotStated }];
        AssertSameCells(FaultColumns.Levels(perUnitOnly: false), levels);
        AssertSameCells(FaultColumns.Levels(perUnitOnly: true), levels);
        AssertSameCells(FaultColumns.Voltages, r.Faults[0].Voltages);
        AssertSameCells(FaultColumns.Contributions(kv: true), r.Faults[0].Contributions);
        AssertSameCells(FaultColumns.Contributions(kv: false), r.Faults[0].Contributions);
        AssertSameCells(FaultColumns.Breakers, breakers);
        AssertSameCells(FaultColumns.ScreenLevels(false), levels);
        AssertSameCells(FaultColumns.ScreenBreakers, breakers);
        Assert.Contains(PlainText(FaultColumns.Levels(false), levels), row => row.Contains(Numbers.Infinity));
    }

    [Fact]
    public void Command_table_specs_agree_in_every_output()
    {
        ElementExplanation e = Explainer.Explain(Demo, "CQ-T1", null);
        AssertSameCells(CommandColumns.ExplainInputs, e.Inputs);
        AssertSameCells(CommandColumns.Timings, [new StageTimeJson("solve", 12.34), new StageTimeJson("solve.factor", 0.56)]);
        LoadFlowResult solved = LoadFlowSolver.Solve(PerUnitModel.Build(Demo));
        LoadFlowResult failed = solved with { Converged = false };
        AssertSameCells(CommandColumns.Bench, [new BenchRow(9, 10, 1.2, 3.4, solved, 3.8e-15, 5.6), new BenchRow(9, 10, 1.2, 3.4, failed, null, null)]);
    }

    [Fact]
    public void A_group_is_named_once_on_screen_and_on_every_row_in_CSV()
    {
        FaultResult r = FaultStudy.Run(PerUnitModel.Build(Demo), new FaultRequest { Buses = ["CQ11"], Kinds = [FaultKind.ThreePhase, FaultKind.LineToEarth] });
        List<string[]> screen = Screen(FaultColumns.ScreenLevels(false), r.Faults);
        Assert.Equal(["CQ11", ""], screen.Skip(1).Select(row => row[0]));
        List<string[]> csv = Csv(CsvTable.Of(FaultColumns.ScreenLevels(false), r.Faults).ToString());
        Assert.Equal(["CQ11", "CQ11"], csv.Skip(1).Select(row => row[0]));
    }
}
