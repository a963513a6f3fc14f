// Enter on an edit form nobody changed is not an edit, headless at 80×24: no undo entry, the file not marked
// modified, the results still current, and the element exactly as it was (no value rounded by the text fields).
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Model;
using Terminal.Gui.Input;

namespace Study.App.Tests.Tui;

public sealed class UnchangedFormTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    /// <summary>One element of each kind the demo has.</summary>
    public static TheoryData<ElementKind, string> Elements() => new()
    {
        { ElementKind.Bus, "CQ11" },
        { ElementKind.Supply, DemoNetwork.Read().Supplies[0].Id },
        { ElementKind.Generator, DemoNetwork.Read().Generators[0].Id },
        { ElementKind.Load, "LD-CS-REFRIG" },
        { ElementKind.Shunt, DemoNetwork.Read().Shunts[0].Id },
        { ElementKind.Line, "CQ-CS" },
        { ElementKind.Transformer, "GT1" },
        { ElementKind.Motor, DemoNetwork.Read().Motors[0].Id },
        { ElementKind.Breaker, DemoNetwork.Read().Breakers[0].Id },
        { ElementKind.Scenario, "winter-peak" },
    };

    [Theory]
    [MemberData(nameof(Elements))]
    public void Enter_on_an_unchanged_form_changes_nothing(ElementKind kind, string id)
    {
        string file = temp.File("net.study.json");
        File.Copy(DemoNetwork.PathOf, file);
        using var h = new Headless();
        EditSession session = EditSession.Open(file, userFolder: temp.File("user"));
        MainWindow main = h.Main(session);
        Network before = session.Network;
        object element = ElementLists.Find(before, kind, id)!;
        string screen = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F5)),
            new Step("the load flow", () => main.LastResult is not null && !main.Runner.IsRunning, () =>
            {
                main.Select(kind, id);
                h.Keys(Key.F4);
            }),
            new Step("the edit form", () => h.App.TopRunnableView is ElementDialog, () => h.Keys(Key.Enter)),
            new Step("the main window again", () => !h.DialogUp, () => screen = h.Draw()));

        Assert.Same(before, session.Network);
        Assert.Same(element, ElementLists.Find(session.Network, kind, id));
        Assert.False(session.CanUndo);
        Assert.False(session.Dirty);
        Assert.False(main.AnyOutOfDate);
        Assert.DoesNotContain("OUT OF DATE", screen);
        Assert.Matches(@"╡(▶ )?net\.study\.json╞", screen); // the title has no "*" for unsaved changes
        Assert.Contains($"no change to {ElementKinds.Label(kind)} {id}", main.Status.Line(80));
        session.Close();
    }

    [Fact]
    public void A_value_finer_than_the_field_shows_is_kept_when_the_form_is_accepted_unchanged()
    {
        // 0.1234567890123456 shows as 0.123456789012 (twelve significant digits); accepting the form must not write that back.
        Network n = DemoNetwork.Read();
        Load load = n.Loads[0] with { QMvar = 0.1234567890123456 };
        n = ElementLists.Replace(n, ElementKind.Load, load.Id, load);
        var form = new ElementForm(n, ElementKind.Load, load.Id);
        Assert.Equal("0.123456789012", form.Texts[NodeFields.Load.ToList().FindIndex(f => f.Name == "Q")]);
        Assert.Same(load, form.Evaluate().Element);
    }
}
