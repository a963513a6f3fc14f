// Choices on one dialog row: side by side when they fit, typed or listed with F4 when they are many.
using Study.App.Tui.Profile;
using Study.App.Tui.Shell;
using Study.Core.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class OneOfRowTests
{
    /// <summary>The demo with twelve more scenarios (load 50 % to 105 %), as a study of many load levels has.</summary>
    private static Network ManyScenarios()
    {
        Network n = DemoNetwork.Read();
        return n with { Scenarios = [.. n.Scenarios, .. Enumerable.Range(1, 12).Select(i => new Scenario { Name = $"load-level-{i}", LoadScale = 0.45 + 0.05 * i })] };
    }

    [Fact]
    public void A_few_choices_stand_side_by_side_as_options()
    {
        var row = new OneOfRow(null, "scenario", ["as entered", "winter-peak", "summer-night"], 1, 14, 0);
        Assert.True(row.SideBySideShown);
        Assert.IsType<OptionSelector>(row.Input);
        Assert.Equal(1, row.Index);
        Assert.Equal("winter-peak", row.Text);
        Assert.Null(row.Error);
    }

    [Fact]
    public void Many_scenarios_in_the_profile_dialog_are_typed_or_picked_with_F4_and_a_wrong_name_is_named()
    {
        Network n = ManyScenarios();
        var form = new ProfileForm(n, "winter-peak", DemoNetwork.PathOf);
        using var h = new Headless();
        Dialog dialog = ProfileDialog.Build(form, out _, out Action read, out View _, out Func<string?> check, h.App);
        OneOfRowProbe probe = new(dialog);
        string shown = "", picker = "";
        h.Run(dialog,
            new Step("the dialog", () => true, () =>
            {
                shown = h.Draw();
                probe.Field.SetFocus();
                h.Keys(Key.F4);
            }),
            new Step("the list of scenarios", () => h.App.TopRunnableView is Dialog d && d.Title == "Choose the scenario", () =>
            {
                picker = h.Draw();
                h.Type("load-level-7");
                h.Keys(Key.Enter);
            }),
            new Step("the dialog again", () => h.App.TopRunnableView == dialog, read));

        Assert.Contains($"F4 lists the {n.Scenarios.Count + 1} scenarios", shown);
        Assert.DoesNotContain("load-level-3", shown);      // not laid side by side past the frame
        Assert.Contains("winter-peak", shown);               // the active scenario is the one offered
        Assert.Contains("load-level-1", picker);
        Assert.Equal("load-level-7", form.Scenario);
        Assert.Null(check());

        probe.Field.Text = "no-such-level";
        read();
        Assert.Equal("'no-such-level' is not a scenario of this network (F4 lists them)", check());
        Assert.Equal("load-level-7", form.Scenario); // a wrong name picks nothing in silence
    }

    /// <summary>The text field of a dialog's chooser row: the one that shows a scenario name.</summary>
    private sealed class OneOfRowProbe(Dialog dialog)
    {
        public TextField Field { get; } = dialog.SubViews.OfType<TextField>().Single(t => t.Text == "winter-peak");
    }
}
