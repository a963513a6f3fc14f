// The bank-choice screen: the dialog's question, the binding constraint in words and marks, the cost chart and
// its axis key, sorting, and a run through Alt+B off the UI thread, at 80×24 and 160×48.
using Study.App.Reports;
using Study.App.Tui.Choice;
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class BankChoiceScreenTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private static string Candidates => Path.Combine(AppContext.BaseDirectory, "networks", "harbour-estate-cold-quay.candidates.json");

    private static BankChoiceRequest Request => new() { TransformerId = "CQ-T1", LossLoadFactor = 0.35, NoLoadRate = 4000, LoadRate = 1200 };

    private static BankChoiceResult Choose(Network n) => StudyCase.Of(n).Choose(Request, CandidatesFile.Read(Candidates));

    [Fact]
    public void The_choice_form_needs_one_source_of_energy_and_names_the_transformer_of_the_candidates_file()
    {
        Network n = DemoNetwork.Read();
        var form = new ChoiceForm(n, null, DemoNetwork.PathOf);
        Assert.EndsWith(".candidates.json", form.CandidatesText);
        Assert.Equal("CQ-T1", form.NamedByCandidates());
        form.TransformerId = "CQ-T1";
        Assert.Contains("one of the two", form.Build().Error);
        form.LossLoadFactorText = "1.5";
        Assert.Contains("outside 0..1", form.Build().Error);
        form.LossLoadFactorText = "0.35";
        form.NoLoadRateText = "lots";
        Assert.Contains("money per kW", form.Build().Error);
        form.NoLoadRateText = "4000";
        form.LoadRateText = "1200";
        form.BandLowText = "0.97";
        Assert.Contains("both band limits", form.Build().Error);
        form.BandHighText = "1.03";
        ChoiceQuestion q = form.Build().Question!;
        Assert.Equal((0.97, 1.03), q.Request.Band);
        Assert.Equal(4000, q.Request.NoLoadRate);
        Assert.Null(q.ProfilePath);
        form.ProfileText = temp.File("none.csv");
        form.LossLoadFactorText = "";
        Assert.Contains("no such file", form.Build().Error);
    }

    [Fact]
    public void With_more_banks_than_fit_side_by_side_the_transformer_is_typed_or_picked_with_F4()
    {
        Network n = DemoNetwork.Read();
        Transformer model = n.Transformers.Single(t => t.Id == "CQ-T1");
        n = n with { Transformers = [.. n.Transformers, .. Enumerable.Range(1, 12).Select(i => model with { Id = $"SPARE-BANK-{i}", InService = false })] };
        var form = new ChoiceForm(n, null, null);
        using var h = new Headless();
        Dialog dialog = ChoiceDialog.Build(form, out _, out Action read, out View first, h.App);
        string shown = "", picker = "";
        h.Run(dialog,
            new Step("the dialog", () => true, () =>
            {
                shown = h.Draw();
                first.SetFocus();
                h.Keys(Key.F4);
            }),
            new Step("the list of transformers", () => h.App.TopRunnableView is Dialog d && d.Title.Contains("transformer", StringComparison.Ordinal), () =>
            {
                picker = h.Draw();
                h.Type("SPARE-BANK-7");
                h.Keys(Key.Enter);
            }),
            new Step("the dialog again", () => h.App.TopRunnableView == dialog, () => read()));

        Assert.Contains($"F4 lists the {n.Transformers.Count} transformers", shown);
        Assert.DoesNotContain("SPARE-BANK-3", shown); // not laid side by side past the frame
        Assert.Contains("SPARE-BANK-1", picker);
        Assert.Contains("CQ-T1", picker);
        Assert.Equal("SPARE-BANK-7", form.TransformerId);
        form.TransformerId = "NOPE";
        Assert.Contains("'NOPE' is not a two-winding transformer", form.Build().Error);
    }

    [Fact]
    public void Each_row_says_what_binds_it_and_marks_that_cell_so_it_reads_without_colour()
    {
        Network n = DemoNetwork.Read();
        BankChoiceResult r = Choose(n);
        TextTableSource table = ChoiceTables.Candidates(r);
        Assert.Equal(r.Candidates.Count, table.Rows);
        int binding = Array.IndexOf(table.ColumnNames, "binding");
        for (int i = 0; i < r.Candidates.Count; i++)
        {
            CandidateAssessment c = r.Candidates[i];
            string words = table.RowCells[i][binding];
            Assert.StartsWith(c.Feasible ? "tightest " : "FAILS ", words);
            Binding b = ChooseBinding.Of(c, r);
            if (b.ColumnKey is { } key)
            {
                int at = Array.IndexOf(ChoiceTables.Columns.Readable.Select(x => x.Key ?? x.Header!).ToArray(), key);
                Assert.EndsWith(ChoiceTables.BindingMark, table.RowCells[i][at]);
            }
        }
        // The demo's failures, as the command line states them: CQ-10-6 overloads, CQ-25-8 over-duties its breakers.
        Assert.Equal("FAILS bank loading", table.RowCells[r.Candidates.ToList().FindIndex(c => c.Id == "CQ-10-6")][binding]);
        Assert.Equal("FAILS breaker duty", table.RowCells[r.Candidates.ToList().FindIndex(c => c.Id == "CQ-25-8")][binding]);
        Assert.EndsWith("★", table.RowCells[0][0]);
        Assert.Equal(r.Recommended, r.Candidates[0].Id);
    }

    [Fact]
    public void A_bank_that_meets_all_is_bound_by_its_least_headroom_as_a_share_of_each_limit()
    {
        var r = new BankChoiceResult { Transformer = "T", Band = (0.95, 1.05) };
        // Voltage 0.02 of 0.05 (40 %), duty 70 % (30 % left), N-1 90 % (10 % left): the outage binds.
        var c = new CandidateAssessment { Id = "A", MarginPu = 0.02, MaxDutyPercent = 70, N1WorstPct = 90 };
        Assert.Equal(new Binding(BankConstraint.Outage, false, "n1WorstPct"), ChooseBinding.Of(c, r));
        Assert.Equal(BankConstraint.VoltageBand, ChooseBinding.Of(c with { MarginPu = 0.004 }, r).Constraint);
        // A duty already over with the existing bank does not bind the choice.
        Assert.Equal(BankConstraint.Outage, ChooseBinding.Of(c with { MaxDutyPercent = 118 }, r).Constraint);
        Assert.Equal(BankConstraint.VoltageBand, ChooseBinding.Of(c with { Reasons = [new(BankConstraint.VoltageBand, "no tap position holds CQ11 in 0.97–1.03")] }, r).Constraint);
        Assert.Equal(BankConstraint.Outage, ChooseBinding.Of(c with { Reasons = [new(BankConstraint.Outage, "with RING-2 out RING-4 is loaded 101 %")] }, r).Constraint);
    }

    [Fact]
    public void The_cost_chart_puts_each_candidate_at_its_duty_or_margin_and_cost_and_Alt_X_switches()
    {
        Network n = DemoNetwork.Read();
        BankChoiceResult r = Choose(n);
        CostChart duty = CostChart.Of(r, CostAxis.Duty);
        Assert.Equal(r.Candidates.Count(c => c.MaxDutyPercent is not null), duty.Points.Count);
        foreach (CostPoint p in duty.Points)
        {
            CandidateAssessment c = r.Candidates.Single(x => x.Id == p.Id);
            Assert.Equal(c.MaxDutyPercent, p.X);
            Assert.Equal(c.TotalOwningCost, p.Cost);
            Assert.Equal(c.Feasible ? (char)('1' + r.Candidates.ToList().IndexOf(c)) : '×', p.Glyph);
            Assert.InRange(p.X, duty.XLow, duty.XHigh);
            Assert.InRange(p.Cost, duty.CostLow, duty.CostHigh);
        }
        Assert.Equal(100, duty.Limit);
        CostChart margin = CostChart.Of(r, CostAxis.Margin);
        Assert.Equal(r.Candidates.First().MarginPu, margin.Points[0].X);
        Assert.Equal("794k", CostChart.Money(794000));
        Assert.Equal(5, CostChart.Step(43, 10));
    }

    [Theory]
    [InlineData(80, 24)]
    [InlineData(160, 48)]
    public void Alt_B_runs_the_choice_off_the_UI_thread_and_shows_the_caution_ranking_chart_and_sorts(int width, int height)
    {
        Network n = DemoNetwork.Read();
        using var h = new Headless(width, height);
        // Opened from its file, as a user does: the dialog suggests the candidates file beside it and the transformer it names.
        EditSession session = EditSession.Open(DemoNetwork.PathOf, userFolder: temp.File("user"));
        MainWindow main = h.Main(session);
        string dialog = "", screen = "", switched = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.B.WithAlt)),
            new Step("the choice dialog", () => h.DialogUp, () =>
            {
                dialog = h.DialogText();
                h.Keys(Key.Tab);
                h.Type("0.35");
                h.Keys(Key.Tab, Key.Tab);
                h.Type("4000");
                h.Keys(Key.Tab);
                h.Type("1200");
                h.Keys(Key.Enter);
            }),
            new Step("the choice", () => main.Results.BankChoice.Result is not null && !main.Runner.IsRunning && !h.DialogUp, () =>
            {
                screen = h.Draw();
                h.Keys(Key.X.WithAlt);
            }),
            new Step("the other axis", () => main.Results.BankChoice.Axis == CostAxis.Margin, () =>
            {
                switched = h.Draw();
                main.Results.BankChoice.Table.SortBy(Array.IndexOf(ChoiceTables.Headers, "total owning cost"));
            }));
        Assert.Contains("Loss-load", dialog);
        BankChoiceResult shown = main.Results.BankChoice.Result!;
        BankChoiceResult direct = Choose(n);
        Assert.Equal(direct.Recommended, shown.Recommended);
        Assert.Equal(direct.Candidates.Select(c => c.TotalOwningCost), shown.Candidates.Select(c => c.TotalOwningCost));
        Assert.Contains("Caution: fault levels", screen);
        Assert.Contains("FAILS", screen);
        Assert.Contains("recommended: CQ-20-10", screen);
        Assert.Contains("Alt+X", screen);
        if (width >= 120)
        {
            Assert.Contains("max duty %", screen);
            Assert.Contains("margin pu", switched);
        }
        // Sorted by cost, the cheapest (a failing bank) comes first in the view.
        string cheapest = direct.Candidates.MinBy(c => c.TotalOwningCost)!.Id;
        Assert.Equal(cheapest, main.Results.BankChoice.Table.Table![0, Array.IndexOf(ChoiceTables.Headers, "candidate")]);
        session.Close();
    }
}
