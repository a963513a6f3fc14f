// The fault-duty screens: motors in the element list and their form, the breaking and thermal currents and
// every breaker check in the Faults tab, and the motor-start dialog and tab, driven headless as a user would.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.Faults;
using Study.App.Tui.Shell;
using Study.App.Tui.Start;
using Study.Core.Cases;
using Study.Core.Faults;
using Study.Core.Model;
using Study.Core.Studies;
using Terminal.Gui.Input;

namespace Study.App.Tests.Tui;

public sealed class FaultDutyScreenTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    [Fact]
    public void The_motor_form_edits_every_key_of_the_network_file_and_writes_the_starter_in_its_spelling()
    {
        Network n = DemoNetwork.Read();
        Motor motor = n.Motors.First(m => m.Starter is null);
        var form = new ElementForm(n, ElementKind.Motor, motor.Id);
        string[] keys = form.Fields.Select(f => f.Key!).ToArray();
        foreach (string key in new[] { "mw", "kv", "powerFactor", "efficiency", "polePairs", "units", "lowVoltageGroup", "loadPercent",
                     "lockedRotor.currentRatio", "lockedRotor.powerFactor", "starter.method", "starter.tapPercent", "starter.currentLimit" })
            Assert.Contains(key, keys);
        form.Texts[form.FieldOf("starter.method")!.Value] = "starDelta";
        form.Texts[form.FieldOf("polePairs")!.Value] = "2";
        FormState state = form.Evaluate();
        Assert.True(state.CanAccept, string.Join("; ", state.Problems));
        var edited = (Motor)state.Element!;
        Assert.Equal(StarterMethod.StarDelta, edited.Starter?.Method);
        Assert.Equal(2, edited.PolePairs);

        // Back to direct with nothing else: the starter is left out of the file, as one never given.
        var again = new ElementForm(n with { Motors = [edited] }, ElementKind.Motor, motor.Id);
        again.Texts[again.FieldOf("starter.method")!.Value] = "direct";
        again.Texts[again.FieldOf("polePairs")!.Value] = "1.5";
        FormState bad = again.Evaluate();
        Assert.Contains(bad.Problems, p => p.Contains("not a whole number", StringComparison.Ordinal));
        again.Texts[again.FieldOf("polePairs")!.Value] = "";
        Assert.Null(((Motor)again.Evaluate().Element!).Starter);
    }

    [Fact]
    public void Motors_are_listed_among_the_element_kinds_with_their_count()
    {
        using var h = new Headless();
        var session = EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));
        MainWindow main = h.Main(session);
        string screen = "";
        h.Run(main, new Step("the main window", () => true, () => screen = h.Draw()));
        Assert.Contains($"Motors ({session.Network.Motors.Count})", screen);
        session.Close();
    }

    [Fact]
    public void The_fault_table_gives_the_breaking_and_thermal_currents_of_each_fault_as_the_command_line_does()
    {
        Network n = DemoNetwork.Read();
        FaultResult r = StudyCase.Of(n).Fault(new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        TextTableSource levels = FaultTables.Levels(r);
        string[] headers = levels.ColumnNames;
        foreach (string h in new[] { "I''k kA", "I_b kA", "i_DC kA", "DC %", "I_b,asym kA", "I_k kA", "I_th kA", "i_p kA" })
            Assert.Contains(h, headers);
        // The same figures as the command line's duty table (FaultColumns.Duty), cell for cell.
        var duty = FaultColumns.Duty(false);
        List<string[]> cli = duty.ReadableRows(r.Faults);
        for (int row = 0; row < r.Faults.Count; row++)
            foreach (string h in new[] { "I_b kA", "i_DC kA", "I_b,asym kA", "I_k kA", "I_th kA" })
                Assert.Equal(cli[row][Array.IndexOf(duty.Headings, h)], levels.RowCells[row][Array.IndexOf(headers, h)]);
        Assert.Contains("t_min 0.1 s", FaultTables.Notes(r));
        Assert.Contains("T_k 1 s", FaultTables.Notes(r));
    }

    [Fact]
    public void Every_check_of_every_breaker_is_a_row_with_its_status_in_words_and_its_worst_side()
    {
        Network n = DemoNetwork.Read();
        FaultResult r = StudyCase.Of(n).Fault(new FaultRequest { Kinds = FaultForm.AllKinds, LeaveOutEarthFaultsWithoutZeroSequence = true });
        TextTableSource table = FaultTables.Breakers(r);
        Assert.Equal(r.Breakers.Sum(b => b.Checks.Count), table.Rows);
        Assert.Equal(table.Rows, FaultTables.Checks(r).Count);
        string[] headers = table.ColumnNames;
        int check = Array.IndexOf(headers, "check"), status = Array.IndexOf(headers, "status"), side = Array.IndexOf(headers, "worst side");
        Assert.True(check >= 0 && status >= 0 && side >= 0, string.Join("|", headers));
        var kinds = table.RowCells.Select(row => row[check]).ToHashSet();
        foreach (string k in new[] { "breaking I_b", "breaking asym.", "making i_p", "short-time I_th" }) Assert.Contains(k, kinds);
        // The status reads without colour, and agrees with the engine's for the same check.
        IReadOnlyList<DutyCheck> checks = FaultTables.Checks(r);
        for (int i = 0; i < checks.Count; i++)
            Assert.Equal(Marks.DutyWords(checks[i].Status), table.RowCells[i][status]);
    }

    [Fact]
    public void The_Faults_tab_keeps_the_caution_and_shows_the_duty_columns_and_checks_at_80x24_and_160x48()
    {
        Network n = DemoNetwork.Read();
        FaultResult r = StudyCase.Of(n).Fault(new FaultRequest { Kinds = [FaultKind.ThreePhase] });
        foreach ((int w, int hgt) in new[] { (80, 24), (160, 48) })
        {
            using var h = new Headless(w, hgt);
            var session = EditSession.Untitled(n, temp.File("user"));
            MainWindow main = h.Main(session);
            string screen = "", scrolled = "";
            h.Run(main,
                new Step("the main window", () => true, () =>
                {
                    main.Results.Faults.Show(r, n);
                    main.ShowStudyTab(main.Results.FaultsTab);
                }),
                new Step("the tab", () => true, () =>
                {
                    screen = h.Draw();
                    h.Keys(Key.Tab, Key.PageDown, Key.PageDown);
                }),
                new Step("the checks scrolled", () => true, () => scrolled = h.Draw()));
            Assert.Contains("Caution: fault levels", screen);
            Assert.Contains("Caution: fault levels", scrolled);
            Assert.Contains("I_b kA", screen);
            Assert.Contains("worst", screen + scrolled);
            if (w == 160) Assert.Contains("I_th kA", screen);
            session.Close();
        }
    }

    [Fact]
    public void The_start_form_needs_a_motor_and_a_per_unit_minimum_and_names_the_scenario_chosen()
    {
        Network n = DemoNetwork.Read();
        var form = new StartForm(n, "winter-peak");
        Assert.Contains("tick at least one motor", form.Build().Error);
        form.Chosen.Add("M-CS-COMP");
        form.MinTerminalText = "eighty";
        Assert.Contains("per unit", form.Build().Error);
        form.MinTerminalText = "0.85";
        form.WatchText = "CQ11, NOWHERE";
        Assert.Contains("NOWHERE", form.Build().Error);
        form.WatchText = "CQ11 PS11";
        MotorStartRequest request = form.Build().Request!;
        Assert.Equal(["M-CS-COMP"], request.Motors);
        Assert.Equal(0.85, request.MinTerminalPu);
        Assert.Equal(["CQ11", "PS11"], request.WatchBuses);
        Assert.Equal("winter-peak", request.Scenario);
        Assert.Contains("the network has no motors", new StartForm(n with { Motors = [] }, null).Build().Error);
    }

    [Fact]
    public void Alt_M_ticks_a_motor_runs_the_start_off_the_UI_thread_and_shows_each_bus_and_the_motor_against_its_minimum()
    {
        Network n = DemoNetwork.Read();
        using var h = new Headless();
        var session = EditSession.Untitled(n, temp.File("user"));
        MainWindow main = h.Main(session);
        string dialog = "", screen = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.M.WithAlt)),
            new Step("the start dialog", () => h.DialogUp, () =>
            {
                dialog = h.Draw();
                h.Keys(Key.Space, Key.Enter);
            }),
            new Step("the start", () => main.Results.Start.Result is not null && !main.Runner.IsRunning && !h.DialogUp, () => screen = h.Draw()));
        Assert.Contains("M-CS-COMP", dialog);
        Assert.Contains("Min terminal pu", dialog);
        MotorStartResult shown = main.Results.Start.Result!;
        // The tab shows what StudyCase.Start gives for the same request (the engine's own tests check the values).
        MotorStartResult direct = StudyCase.Of(n).Start(new MotorStartRequest { Motors = [n.Motors[0].Id] });
        Assert.Equal(direct.MotorTerminalPu, shown.MotorTerminalPu, 12);
        Assert.Contains("Caution: fault levels", screen);
        Assert.Contains("terminal pu", screen);
        Assert.Contains(Numbers.Fixed(direct.Started[0].TerminalPu, 4), screen);
        Assert.Contains("dip %", main.Results.Start.Buses.Source.ColumnNames);
        Assert.Equal(n.Buses.Count(b => b.InService), main.Results.Start.Buses.Source.Rows);
        session.Close();
    }

    [Fact]
    public void A_motor_below_its_minimum_reads_BELOW_in_the_start_table()
    {
        Network n = DemoNetwork.Read();
        MotorStartResult r = StudyCase.Of(n).Start(new MotorStartRequest { Motors = ["M-CS-COMP"], MinTerminalPu = 1.1 });
        Assert.False(r.Ok);
        string[] row = Assert.Single(StartTables.Motors(r).RowCells);
        Assert.Contains(row, c => c.Contains("BELOW 1.10", StringComparison.Ordinal));
        Assert.Contains("below the 1.10 pu it needs", StartTables.Heading(r));
    }
}
