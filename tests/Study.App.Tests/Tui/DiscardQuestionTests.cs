// Esc in an edit form, headless at 80×24: changed fields are discarded only on D; Enter or Esc at the question
// keeps editing with what was typed; a form left as it opened closes at once.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Model;
using Terminal.Gui.Input;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class DiscardQuestionTests : IDisposable
{
    private const string Bus = "CQ11";

    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private EditSession Demo() => EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));

    private static ElementDialog? Form(Headless h) => h.App.TopRunnableView as ElementDialog;

    /// <summary>The discard question: a dialog on top that is not the form.</summary>
    private static bool Asking(Headless h) => h.App.TopRunnableView is Dialog d && d is not ElementDialog;

    private static int VMinField => NodeFields.Bus.ToList().FindIndex(f => f.Name == "Vmin");

    /// <summary>Replaces the form's Vmin with 0.97, typed key by key.</summary>
    private static void ChangeVMin(Headless h)
    {
        TextField field = Form(h)!.Texts[VMinField];
        field.SetFocus();
        field.Text = "";
        h.Type("0.97");
    }

    [Fact]
    public void D_at_the_question_discards_the_change_and_leaves_the_network_undo_and_results_as_they_were()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        Network before = session.Network;
        string? question = null;
        string after = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F5)),
            new Step("the load flow", () => main.LastResult is not null && !main.Runner.IsRunning, () =>
            {
                main.Select(ElementKind.Bus, Bus);
                h.Keys(Key.F4);
            }),
            new Step("the Edit bus form", () => Form(h) is not null, () =>
            {
                ChangeVMin(h);
                h.Keys(Key.Esc);
            }),
            new Step("the question", () => Asking(h), () =>
            {
                question = h.DialogText();
                h.Keys(Key.D);
            }),
            new Step("the main window again", () => !h.DialogUp, () => after = h.Draw()));

        Assert.Contains($"Edit bus {Bus}: the fields you changed will be lost", question);
        Assert.Contains("D discards them", question);
        Assert.Same(before, session.Network);
        Assert.False(session.Dirty);
        Assert.False(session.CanUndo);
        Assert.Null(session.UndoName);
        Assert.False(main.AnyOutOfDate);
        Assert.DoesNotContain("OUT OF DATE", after);
        session.Close();
    }

    [Theory]
    [InlineData("Enter")]
    [InlineData("Esc")]
    public void Enter_or_Esc_at_the_question_keeps_the_form_open_with_the_typed_value(string answer)
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        Network before = session.Network;
        main.Select(ElementKind.Bus, Bus);
        ElementDialog? opened = null, kept = null;
        string keptText = "", keptScreen = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F4)),
            new Step("the Edit bus form", () => Form(h) is not null, () =>
            {
                opened = Form(h);
                ChangeVMin(h);
                h.Keys(Key.Esc);
            }),
            new Step("the question", () => Asking(h), () => h.Keys(answer == "Enter" ? Key.Enter : Key.Esc)),
            new Step("the form again", () => Form(h) is not null, () =>
            {
                kept = Form(h);
                keptText = kept!.Texts[VMinField].Text;
                keptScreen = h.Draw();
                h.Keys(Key.Esc); // and this time discard, so the run ends
            }),
            new Step("the question again", () => Asking(h), () => h.Keys(Key.D)),
            new Step("the main window again", () => !h.DialogUp, () => { }));

        Assert.Same(opened, kept); // the same form, not a fresh one
        Assert.Equal("0.97", keptText);
        Assert.Contains("0.97", keptScreen);
        Assert.DoesNotContain("Discard changes?", keptScreen);
        Assert.Same(before, session.Network);
        Assert.False(session.CanUndo);
        session.Close();
    }

    [Fact]
    public void Esc_on_a_form_left_as_it_opened_closes_it_without_asking()
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        Network before = session.Network;
        main.Select(ElementKind.Bus, Bus);
        bool asked = false;
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F4)),
            new Step("the Edit bus form", () => Form(h) is not null, () => h.Keys(Key.Esc)),
            new Step("the form gone", () => Form(h) is null, () => asked = h.DialogUp));

        Assert.False(asked);
        Assert.Same(before, session.Network);
        Assert.False(session.CanUndo);
        session.Close();
    }
}
