// The edit forms keep what was typed and refuse invalid data, headless at 80×24 as a user meets them.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class FormDialogTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private EditSession Demo() => EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));

    private static ElementDialog? Form(Headless h) => h.App.TopRunnableView as ElementDialog;

    [Fact]
    public void Enter_on_a_new_bus_with_letters_in_Base_kV_keeps_the_form_open_on_that_field_and_adds_nothing_until_fixed()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        int buses = session.Network.Buses.Count;
        string? refused = null, focusedLabel = null;
        bool stillOpen = false;
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.Tab, Key.InsertChar)),
            new Step("the Add bus form", () => Form(h) is not null, () =>
            {
                ElementDialog form = Form(h)!;
                form.Texts[1].SetFocus();
                form.Texts[1].Text = "";
                h.Type("eleven");
                h.Keys(Key.Enter);
            }),
            new Step("the refusal", () => Form(h) is { } f && f.StatusText.StartsWith("Not accepted", StringComparison.Ordinal), () =>
            {
                ElementDialog form = Form(h)!;
                stillOpen = true;
                refused = form.StatusText;
                focusedLabel = form.Texts.ToList().FindIndex(t => t.HasFocus) is int i and >= 0 ? NodeFields.Bus[i].Header : null;
                string screen = h.Draw();
                Assert.Contains("! Base kV", screen); // the field in error is marked, not only coloured
                Assert.Contains("eleven", screen);    // what was typed is still there
                form.Texts[1].Text = "";
                h.Type("11");
                h.Keys(Key.Enter);
            }),
            new Step("the form closing", () => !h.DialogUp, () => { }));

        Assert.True(stillOpen);
        Assert.Equal("Not accepted: Base kV: 'eleven' is not a number", refused);
        Assert.Equal("Base kV", focusedLabel);
        Assert.Equal(buses + 1, session.Network.Buses.Count);
        Assert.Equal(11, session.Network.Buses[^1].Kv);
        Assert.Contains("add bus", main.Status.Line(80));
        session.Close();
    }

    [Fact]
    public void Esc_after_a_change_asks_first_keep_editing_loses_nothing_and_an_unchanged_form_closes_leaving_the_load_as_it_was()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        Load before = session.Network.Loads[0];
        string? question = null;
        string unchanged = new ElementForm(session.Network, ElementKind.Load, before.Id).Texts[2];
        main.Select(ElementKind.Load, before.Id);
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F4)),
            new Step("the Edit load form", () => Form(h) is not null, () =>
            {
                ElementDialog form = Form(h)!;
                form.Texts[2].SetFocus();
                h.Type("5");
                h.Keys(Key.Esc);
            }),
            new Step("the question", () => h.App.TopRunnableView is Dialog d && d is not ElementDialog, () =>
            {
                question = h.DialogText();
                h.Keys(Key.Enter); // the default: keep editing
            }),
            new Step("the form again", () => Form(h) is not null, () =>
            {
                Assert.EndsWith("5", Form(h)!.Texts[2].Text);
                h.Keys(Key.Esc);
            }),
            new Step("the question again", () => h.App.TopRunnableView is Dialog d && d is not ElementDialog, () => h.Keys(Key.Esc)), // Esc keeps editing too
            new Step("the form a third time", () => Form(h) is not null, () =>
            {
                // Back as it was, the form closes on Esc without asking.
                Form(h)!.Texts[2].Text = unchanged;
                h.Keys(Key.Esc);
            }),
            new Step("the main window again", () => !h.DialogUp, () => { }));

        Assert.Contains("the fields you changed will be lost", question);
        Assert.Same(before, session.Network.Loads[0]);
        Assert.False(session.Dirty);
        session.Close();
    }

    [Theory]
    [InlineData(ElementKind.Load, "Bus", "NOWHERE", "bus")]
    [InlineData(ElementKind.Transformer, "Impedance %", "-8", "zPercent")]
    [InlineData(ElementKind.Transformer, "Vector group", "Dyn 11", "vectorGroup")]
    public void A_form_the_validator_finds_an_error_in_cannot_be_accepted_and_says_what_study_check_says(
        ElementKind kind, string label, string text, string key)
    {
        Network n = DemoNetwork.Read();
        string id = kind == ElementKind.Load ? n.Loads[0].Id : "CQ-T1";
        var form = new ElementForm(n, kind, id);
        int field = form.Fields.ToList().FindIndex(f => f.Header == label);
        Assert.True(field >= 0, $"no field {label}");
        form.Texts[field] = text;
        FormState state = form.Evaluate();
        Assert.NotNull(state.Element);
        Assert.False(state.CanAccept);
        Assert.Contains(field, state.BadFields);

        // The same rule, through the pipeline `study check` runs, finds the same problem.
        Network edited = ElementLists.Replace(n, kind, id, state.Element!);
        Problem p = Assert.Single(NetworkCheck.Of(edited).Report.Errors, x => x.ElementId == id && x.Field == key);
        Assert.Contains(state.Problems, s => s.StartsWith($"error: {label}: ", StringComparison.Ordinal)
            && s.EndsWith(form.InLabels(p.Message), StringComparison.Ordinal));
    }

    [Fact]
    public void Saving_a_network_with_errors_lists_them_and_cancel_writes_nothing()
    {
        string file = temp.File("net.study.json");
        File.Copy(DemoNetwork.PathOf, file);
        DateTime written = File.GetLastWriteTimeUtc(file);
        using var h = new Headless();
        EditSession session = EditSession.Open(file, userFolder: temp.File("user"));
        Load load = session.Network.Loads[0];
        session.Replace(ElementKind.Load, load.Id, load with { Bus = "NOWHERE" });
        MainWindow main = h.Main(session);
        string? warning = null;
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F2)),
            new Step("the warning", () => h.DialogUp, () =>
            {
                warning = h.DialogText();
                h.Keys(Key.Enter); // Cancel is the default
            }),
            new Step("the main window again", () => !h.DialogUp, () => { }));

        Assert.Contains("1 error(s)", warning);
        Assert.Contains($"load {load.Id} (bus)", warning);
        Assert.Contains("NOWHERE", warning);
        Assert.Equal(written, File.GetLastWriteTimeUtc(file));
        Assert.True(session.Dirty);
        session.Close();
    }

    [Fact]
    public void A_bus_is_picked_from_the_list_by_typing_the_start_of_its_id()
    {
        IReadOnlyList<FieldOption> buses = Field.BusOptions(DemoNetwork.Read());
        Assert.Equal(["CQ33", "CQ11"], OptionPicker.Matching(buses, "cq").Select(o => o.Value));
        // Then the words: the bus whose name says "pumping".
        Assert.Equal("PS11", Assert.Single(OptionPicker.Matching(buses, "pumping")).Value);
        Assert.Contains("11 kV · Cold Quay 11 kV board", buses.Single(b => b.Value == "CQ11").Description);
        Assert.Equal("[F4 list]", ElementDialog.Hint(NodeFields.Load[1]));
        Assert.Equal("[required]", ElementDialog.Hint(NodeFields.Bus[1]));
    }
}
