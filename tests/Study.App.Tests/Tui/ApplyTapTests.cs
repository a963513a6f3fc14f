// Alt+P after a tap study, headless: a tap moved to the recommended position is one undoable edit and the
// heading says so; a tap already on it is left alone, and the heading and the status line say that plainly.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.App.Tui.Taps;
using Study.Core.Cases;
using Study.Core.Io;
using Study.Core.Model;
using Study.Core.Studies;
using Terminal.Gui.Input;

namespace Study.App.Tests.Tui;

public sealed class ApplyTapTests : IDisposable
{
    private const string Bank = "CQ-T1";

    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    /// <summary>The position the tap study recommends for the bank, asked as the dialog asks it by default.</summary>
    private static int Recommended(Network n) =>
        StudyCase.Of(n).Taps(new TapStudyForm(n, Bank, null).Build().Request!).Recommended[0].Position;

    private static int Position(Network n) => n.Transformers.Single(t => t.Id == Bank).Tap!.Position;

    /// <summary>The demo saved with the bank's tap at <paramref name="position"/> (null: as the demo has it), opened.</summary>
    private EditSession Open(int? position)
    {
        Network n = DemoNetwork.Read();
        if (position is int p)
            n = ElementLists.Replace(n, ElementKind.Transformer, Bank, n.Transformers.Single(t => t.Id == Bank) with
            {
                Tap = n.Transformers.Single(t => t.Id == Bank).Tap! with { Position = p },
            });
        string file = temp.File("net.study.json");
        NetworkFile.Write(n, file);
        return EditSession.Open(file, userFolder: temp.File("user"));
    }

    /// <summary>F8 on the bank, Enter in the dialog, then Alt+P once the study is shown; what the Taps tab says after it.</summary>
    private static (string Heading, string? Told) StudyThenApply(Headless h, MainWindow main)
    {
        string heading = "";
        string? told = null;
        main.Select(ElementKind.Transformer, Bank);
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F8)),
            new Step("the tap-study dialog", () => h.DialogUp, () => h.Keys(Key.Enter)),
            new Step("the tap study", () => !h.DialogUp && main.Results.TapStudyResult is not null && !main.Runner.IsRunning, () => h.Keys(Key.P.WithAlt)),
            new Step("Alt+P done", () => true, () =>
            {
                if (h.DialogUp)
                {
                    told = h.DialogText();
                    h.Keys(Key.Enter);
                }
            }),
            new Step("the main window again", () => !h.DialogUp, () => heading = Headless.TextOf(main.Results.TapStudy)));
        return (heading, told);
    }

    [Fact]
    public void Alt_P_moves_the_tap_to_the_recommended_position_as_one_undoable_edit_and_the_heading_says_it_was_set()
    {
        using var h = new Headless(120, 40);
        EditSession session = Open(null);
        int best = Recommended(session.Network);
        Assert.NotEqual(best, Position(session.Network)); // the demo's bank is not on it

        MainWindow main = h.Main(session);
        (string heading, string? told) = StudyThenApply(h, main);

        Assert.Null(told);
        Assert.Equal(best, Position(session.Network));
        Assert.Equal($"set {Bank} tap to {Labels.Position(best)}", session.UndoName);
        Assert.Contains($"recommended {Labels.Position(best)} ", heading);
        Assert.Contains("set to the recommended position (Alt+Z undoes)", heading);
        Assert.DoesNotContain("already", heading);
        Assert.Null(main.StampOf(ResultKind.Taps)!.WhyOutOfDate(session.Network, session.ActiveScenario));
        Assert.Contains($"{Bank} tap set to {Labels.Position(best)}", main.Status.Line(120));
        session.Close();
    }

    [Fact]
    public void Alt_P_on_a_tap_already_on_the_recommended_position_changes_nothing_and_the_heading_says_it_was_already_there()
    {
        using var h = new Headless(120, 40);
        EditSession session = Open(Recommended(DemoNetwork.Read()));
        Network before = session.Network;
        int best = Position(before);
        MainWindow main = h.Main(session);
        (string heading, string? told) = StudyThenApply(h, main);

        Assert.Equal(best, main.Results.TapStudyResult!.Recommended[0].Position);
        Assert.Same(before, session.Network);
        Assert.False(session.CanUndo);
        Assert.False(session.Dirty);
        Assert.Contains($"already on the recommended position {Labels.Position(best)}: nothing was changed", told);
        Assert.Contains("already on the recommended position: nothing to change", heading);
        Assert.DoesNotContain("set to the recommended position", heading);
        Assert.DoesNotContain("Alt+Z", heading);
        Assert.Contains("nothing was changed", main.Status.Line(120));
        Assert.False(main.AnyOutOfDate);
        session.Close();
    }
}
