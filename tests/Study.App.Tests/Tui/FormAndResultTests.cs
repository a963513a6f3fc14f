// Edit forms and result formatting, without a screen: what the form accepts and what the tables say.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Shell;
using Study.App.Tui;
using Study.Core.LoadFlow;
using Study.Core.Model;

namespace Study.App.Tests.Tui;

public sealed class FormAndResultTests
{
    [Fact]
    public void A_form_builds_the_edited_element_and_previews_its_per_unit_values()
    {
        var form = new ElementForm(SampleNetwork.Build(), ElementKind.Line, "F1");
        int length = form.Fields.ToList().FindIndex(f => f.Header == "Length km");
        form.Texts[length] = "3.5";
        FormState state = form.Evaluate();
        Assert.True(state.CanAccept);
        Assert.Equal(3.5, ((Line)state.Element!).Km);
        Assert.NotEmpty(state.Preview);
    }

    [Fact]
    public void Editing_one_field_keeps_the_digits_of_the_others_a_per_unit_line_from_an_imported_file_included()
    {
        Network n = SampleNetwork.Build();
        Line original = n.Lines.Single(l => l.Id == "F1");
        var fine = new SequenceImpedance { Per = ImpedanceBasis.PerUnit, R = 0.0003691602410247061, X = 0.002953281928197649, B = 1.2345678901e-7 };
        n = n with { Lines = n.Lines.Select(l => l.Id == "F1" ? l with { Z1 = fine } : l).ToList() };
        var form = new ElementForm(n, ElementKind.Line, "F1");
        int rating = form.Fields.ToList().FindIndex(f => f.Key == "ratingMva");
        form.Texts[rating] = "25";
        FormState state = form.Evaluate();
        Assert.True(state.CanAccept, string.Join("; ", state.Problems));
        SequenceImpedance z1 = ((Line)state.Element!).Z1!;
        Assert.Equal(25, ((Line)state.Element!).RatingMva);
        // Twelve significant digits: what is written back differs from the file by less than 1e-11 of itself.
        Assert.Equal(fine.R, z1.R, fine.R * 1e-11);
        Assert.Equal(fine.X, z1.X, fine.X * 1e-11);
        Assert.Equal(fine.B!.Value, z1.B!.Value, fine.B.Value * 1e-11);
        Assert.NotEqual(original.RatingMva, 25);
    }

    [Fact]
    public void A_form_with_text_in_a_number_field_cannot_be_accepted_and_says_why()
    {
        var form = new ElementForm(SampleNetwork.Build(), ElementKind.Bus, "B11");
        form.Texts[1] = "eleven";
        FormState state = form.Evaluate();
        Assert.False(state.CanAccept);
        Assert.Contains(state.Problems, p => p.Contains("not a number", StringComparison.Ordinal));
    }

    [Fact]
    public void A_form_shows_the_validator_findings_for_the_element()
    {
        var form = new ElementForm(SampleNetwork.Build(), ElementKind.Load, "L1");
        form.Texts[1] = "NOWHERE";
        FormState state = form.Evaluate();
        Assert.Contains(state.Problems, p => p.StartsWith("error", StringComparison.Ordinal) && p.Contains("NOWHERE", StringComparison.Ordinal));
    }

    [Fact]
    public void The_form_names_fields_by_their_labels_not_by_file_keys()
    {
        var form = new ElementForm(SampleNetwork.Build(), ElementKind.Transformer, "T1");
        form.Texts[form.Fields.ToList().FindIndex(f => f.Name == "Step size")] = "1.25";
        form.Texts[form.Fields.ToList().FindIndex(f => f.Name == "Lowest position")] = "-8";
        form.Texts[form.Fields.ToList().FindIndex(f => f.Name == "Highest position")] = "8";
        form.Texts[form.Fields.ToList().FindIndex(f => f.Name == "Present position")] = "12";
        form.Texts[form.Fields.ToList().FindIndex(f => f.Name == "Impedance")] = "-10";
        FormState state = form.Evaluate();
        Assert.Contains(state.Problems, p => p.Contains("Present position: Present position 12 is outside the range [-8, 8]", StringComparison.Ordinal));
        Assert.Contains(state.Problems, p => p.StartsWith("error: Impedance %: Impedance % is -10", StringComparison.Ordinal));
        Assert.DoesNotContain(state.Problems, p => p.Contains("tap.position", StringComparison.Ordinal) || p.Contains("zPercent", StringComparison.Ordinal));
    }

    [Fact]
    public void A_new_element_gets_a_free_id_and_blank_optional_fields_mean_not_given()
    {
        var form = new ElementForm(SampleNetwork.Build(), ElementKind.Load, null);
        Assert.Equal("L2", form.Texts[0]);
        FormState state = form.Evaluate();
        Assert.True(state.CanAccept);
    }

    [Fact]
    public void Bus_results_mark_low_and_high_voltages_with_triangles()
    {
        var result = new LoadFlowResult
        {
            Buses =
            [
                new BusResult { Id = "A", VPu = 0.93, Violation = ViolationKind.Low, VMin = 0.95, VMax = 1.05 },
                new BusResult { Id = "B", VPu = 1.07, Violation = ViolationKind.High, VMin = 0.95, VMax = 1.05 },
            ],
        };
        TextTableSource table = ResultTables.Buses(result);
        Assert.Equal("0.9300▼", table.RowCells[0][2]);
        Assert.Equal("1.0700▲", table.RowCells[1][2]);
        IReadOnlyList<VoltageBarLine> bars = VoltageBars.Layout(result, 60);
        Assert.Contains("▼", bars[0].Text);
        Assert.Equal(ViolationKind.High, bars[1].Violation);
    }

    [Fact]
    public void The_status_line_keeps_the_summary_and_cuts_hints_to_fit()
    {
        string line = StatusLine.Compose("solved 3 it │ loss 0.721 MW │ 0 viol. │ scenario base", 80);
        Assert.Equal(80, line.Length);
        Assert.StartsWith("solved 3 it", line);
        Assert.Contains("F1 Keys", line);
    }

    [Fact]
    public void Wrapped_text_hangs_under_the_last_column_of_an_aligned_row_and_under_the_indent_otherwise()
    {
        string row = "  F2                 Save                  Save to the network file (or ask for a name)";
        IReadOnlyList<string> keys = TextPane.Wrap(row, 73);
        Assert.Equal(2, keys.Count);
        int column = row.IndexOf("Save to", StringComparison.Ordinal);
        Assert.Equal(column, keys[1].Length - keys[1].TrimStart().Length);
        Assert.True(keys.All(l => l.Length <= 73));
        // A sentence wraps under its own indent, two further in.
        IReadOnlyList<string> note = TextPane.Wrap("Note: steady-state I_k: I''k with the motors left out (far from generators)", 40);
        Assert.StartsWith("  ", note[1]);
        Assert.False(note[1].StartsWith("   ", StringComparison.Ordinal));
    }

    [Fact]
    public void The_Detail_tab_names_a_finding_by_the_field_label_as_the_form_does()
    {
        Network n = DemoNetwork.Read();
        Transformer t = n.Transformers.Single(x => x.Id == "CQ-T1");
        n = ElementLists.Replace(n, ElementKind.Transformer, t.Id, t with { ZPercent = -8 });
        string detail = ElementDetail.Describe(n, ElementKind.Transformer, t.Id);
        string label = BranchFields.Transformer.Single(f => f.Key == "zPercent").Header;
        Assert.Contains($"error: {label}:", detail);
        Assert.DoesNotContain("zPercent", detail);
    }

    [Fact]
    public void Help_lists_every_command_key()
    {
        string help = HelpDialog.Text();
        foreach (TuiCommand c in TuiCommands.All) Assert.Contains(c.KeyText, help);
    }
}
