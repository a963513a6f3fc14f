// The Compare tab headless through the real main window: two scenarios of the demo, and an edit against the
// file as saved, each shown with the numbers `study compare` prints for the same inputs, then marked out of date.
using System.Text.Json;
using System.Text.RegularExpressions;
using Study.App.Tests.Cli;
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Io;
using Study.Core.Model;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using static Study.App.Reports.Numbers;

namespace Study.App.Tests.Tui;

public sealed class CompareTabTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    /// <summary>
    /// The demo with three limits drawn tighter (invented for the test), so that comparisons have violations
    /// to report: PS11's lower limit 0.98 pu (its winter-peak voltage is below it), CS04's upper limit
    /// 1.02 pu (its summer-night voltage is above it) and feeder CQ-CS rated 6 MVA (overloaded at winter peak).
    /// </summary>
    private string TightDemo()
    {
        Network n = DemoNetwork.Read();
        n = n with
        {
            Buses = n.Buses.Select(b => b.Id switch
            {
                "PS11" => b with { VMin = 0.98 },
                "CS04" => b with { VMax = 1.02 },
                _ => b,
            }).ToList(),
            Lines = n.Lines.Select(l => l.Id == "CQ-CS" ? l with { RatingMva = 6 } : l).ToList(),
        };
        string file = temp.File("tight.study.json");
        NetworkFile.Write(n, file);
        return file;
    }

    [Fact]
    public void Two_scenarios_of_the_demo_show_the_voltage_and_flow_changes_and_the_violations_study_compare_finds()
    {
        string file = TightDemo();
        CliOutcome cli = CliRun.Run("compare", file, "--scenarios", "winter-peak,summer-night", "--json");
        Assert.Equal(0, cli.ExitCode);
        using var expected = JsonDocument.Parse(cli.Out);

        using var h = new Headless(120, 60);
        EditSession session = EditSession.Open(file, userFolder: temp.File("user"));
        MainWindow main = h.Main(session);
        string shown = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.C.WithAlt)),
            new Step("the compare dialog", () => h.DialogUp, () =>
            {
                Pick(h, Selector.Before, "winter-peak");
                Pick(h, Selector.After, "summer-night");
                h.Keys(Key.Enter);
            }),
            new Step("the comparison", () => !h.DialogUp && main.Results.Comparison.Result is not null && !main.Runner.IsRunning, () =>
            {
                shown = h.Draw();
                // A later edit, and the tab seen again through its key.
                Load load = session.Network.Loads[0];
                session.Replace(ElementKind.Load, load.Id, load with { PMw = load.PMw + 1 });
                h.Keys(Key.D1.WithAlt, Key.D9.WithAlt);
            }),
            new Step("the edit shown", () => true, () => AssertOutOfDate(main, h.Draw())));

        Assert.Same(main.Results.CompareTab, main.Results.Value);
        AssertShows(shown, expected.RootElement, "winter-peak", "summer-night");
        Assert.DoesNotContain("OUT OF DATE", shown);
        session.Close();
    }

    [Fact]
    public void An_edit_compared_with_the_file_as_saved_shows_what_it_changed_as_study_compare_does()
    {
        string file = TightDemo();
        using var h = new Headless(120, 60);
        EditSession session = EditSession.Open(file, userFolder: temp.File("user"));
        MainWindow main = h.Main(session);
        main.Select(ElementKind.Transformer, "CQ-T1");
        string shown = "", suggested = "";
        bool beforeScenarioEnabled = true;
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(Key.F4)),
            new Step("the Edit transformer form", () => h.App.TopRunnableView is ElementDialog, () =>
            {
                // One step of buck on the Cold Quay bank: its 11 kV side falls by about 2.5 %.
                var form = (ElementDialog)h.App.TopRunnableView!;
                TextField position = form.Texts[BranchFields.Transformer.ToList().FindIndex(f => f.Header == "Present position")];
                position.SetFocus();
                position.Text = "";
                h.Type("1");
                h.Keys(Key.Enter);
            }),
            new Step("the edit made", () => !h.DialogUp, () => h.Keys(Key.C.WithAlt)),
            new Step("the compare dialog", () => h.DialogUp, () =>
            {
                Assert.False(Descendants(h.App.TopRunnableView!).OfType<TextField>().Single().Enabled);
                Pick(h, Selector.Mode, "another network file (the network before the change)");
                suggested = Descendants(h.App.TopRunnableView!).OfType<TextField>().Single().Text;
                // The before scenario is not used for a file: only the file row takes input now.
                Assert.True(Descendants(h.App.TopRunnableView!).OfType<TextField>().Single().Enabled);
                beforeScenarioEnabled = Descendants(h.App.TopRunnableView!).OfType<OptionSelector>().ElementAt((int)Selector.Before).Enabled;
                Pick(h, Selector.After, "summer-night");
                h.Keys(Key.Enter);
            }),
            new Step("the comparison", () => !h.DialogUp && main.Results.Comparison.Result is not null && !main.Runner.IsRunning, () =>
            {
                shown = h.Draw();
                h.Keys(Key.Z.WithAlt); // undo the tap change: the network is no longer the one compared
            }),
            new Step("the undo shown", () => true, () => AssertOutOfDate(main, h.Draw())));

        // The file before the change is the file as saved: the dialog offers it.
        Assert.Equal(file, suggested);
        Assert.False(beforeScenarioEnabled);
        Assert.Equal(0, TapPosition(session));

        // The same comparison through the command line: the saved file against the edited network written out.
        Assert.True(session.Redo());
        Assert.Equal(1, TapPosition(session));
        string after = temp.File("edited.study.json");
        NetworkFile.Write(session.Network, after);
        CliOutcome cli = CliRun.Run("compare", file, after, "--scenario", "summer-night", "--json");
        Assert.Equal(0, cli.ExitCode);
        using var expected = JsonDocument.Parse(cli.Out);
        AssertShows(shown, expected.RootElement, "summer-night", "summer-night");
        Assert.Contains("before: tight.study.json, summer-night → after: tight.study.json as edited, summer-night", Flatten(shown));
        Assert.Null(main.Results.CompareTab.Notice.Note); // redone, the network is the one compared again
        session.Close();
    }

    private static int TapPosition(EditSession s) => s.Network.Transformers.Single(t => t.Id == "CQ-T1").Tap!.Position;

    private enum Selector { Mode, Before, After }

    /// <summary>Moves to the option of the dialog's selector that reads <paramref name="label"/> and presses Space, as a user does.</summary>
    private static void Pick(Headless h, Selector which, string label)
    {
        OptionSelector selector = Descendants(h.App.TopRunnableView!).OfType<OptionSelector>().ElementAt((int)which);
        View option = selector.SubViews.Single(v => v.Text == label);
        option.SetFocus();
        h.Keys(Key.Space);
        Assert.Equal(selector.SubViews.ToList().IndexOf(option), selector.Value);
    }


    private static IEnumerable<View> Descendants(View v) => v.SubViews.SelectMany(c => new[] { c }.Concat(Descendants(c)));

    /// <summary>Every bus and branch row with the numbers of the command line's JSON, and its violations that appear and clear.</summary>
    private static void AssertShows(string screen, JsonElement cli, string beforeScenario, string afterScenario)
    {
        JsonElement[] buses = cli.GetProperty("buses").EnumerateArray().ToArray();
        JsonElement[] branches = cli.GetProperty("branches").EnumerateArray().ToArray();
        Assert.Equal(10, buses.Length);
        Assert.Equal(11, branches.Length);
        foreach (JsonElement b in buses)
        {
            string row = $@"│{Cell(b, "id")}\s*│[^│]*│\s*{Pu(b, "beforePu")}\s*│\s*{Pu(b, "afterPu")}\s*│\s*{Regex.Escape(Signed(b.GetProperty("deltaPu").GetDouble(), 4))}\s*│";
            Assert.True(Regex.IsMatch(screen, row), $"no row {row} in\n{screen}");
        }
        foreach (JsonElement b in branches)
        {
            double before = b.GetProperty("beforeMw").GetDouble(), after = b.GetProperty("afterMw").GetDouble();
            string row = $@"│{Cell(b, "id")}\s*│[^│]*│\s*{Regex.Escape(Fixed(before, 2))}\s*│\s*{Regex.Escape(Fixed(after, 2))}\s*│"
                + $@"\s*{Regex.Escape(Signed(after - before, 2))}\s*│"
                + $@"\s*{Regex.Escape(Fixed(b.GetProperty("beforeLoadingPercent").GetDouble(), 1))}\s*│"
                + $@"\s*{Regex.Escape(Fixed(b.GetProperty("afterLoadingPercent").GetDouble(), 1))}\s*│";
            Assert.True(Regex.IsMatch(screen, row), $"no row {row} in\n{screen}");
        }

        string flat = Flatten(screen);
        Assert.Contains($", {beforeScenario} → after: ", flat);
        Assert.Contains($", {afterScenario} losses {Fixed(cli.GetProperty("lossBeforeMw").GetDouble(), 3)} → {Fixed(cli.GetProperty("lossAfterMw").GetDouble(), 3)} MW", flat);
        JsonElement[] appeared = cli.GetProperty("violationsAppeared").EnumerateArray().ToArray();
        JsonElement[] cleared = cli.GetProperty("violationsCleared").EnumerateArray().ToArray();
        // The tightened limits see to it that each list has something in it.
        Assert.NotEmpty(appeared);
        Assert.NotEmpty(cleared);
        int split = flat.IndexOf($"that clear ({cleared.Length}): ", StringComparison.Ordinal);
        Assert.True(split >= 0, flat);
        int start = flat.IndexOf($"violations that appear ({appeared.Length}): ", StringComparison.Ordinal);
        Assert.True(start >= 0 && start < split, flat);
        string appearing = flat[start..split], clearing = flat[split..];
        foreach (JsonElement v in appeared) Assert.Matches(Described(v), appearing);
        foreach (JsonElement v in cleared) Assert.Matches(Described(v), clearing);
        foreach (JsonElement v in cleared) Assert.DoesNotMatch(Described(v), appearing);
    }

    /// <summary>A violation as the heading names it: the element, then its value (pu for a bus, % of rating for a branch).</summary>
    private static string Described(JsonElement v)
    {
        double value = v.GetProperty("value").GetDouble();
        bool bus = v.GetProperty("kind").GetString() == "bus";
        return $@"{Regex.Escape(v.GetProperty("element").GetString()!)}: [a-z ]*{Regex.Escape(Fixed(value, bus ? 4 : 1))} {(bus ? "pu" : "%")}";
    }

    private static void AssertOutOfDate(MainWindow main, string screen)
    {
        Assert.StartsWith("OUT OF DATE: the network was edited after this comparison. Alt+C runs it again.", main.Results.CompareTab.Notice.Note);
        Assert.Contains("OUT OF DATE: the network was edited after this comparison", screen);
        Assert.StartsWith(" RESULTS OUT OF DATE", screen.TrimEnd('\n').Split('\n')[^1]);
    }

    private static string Cell(JsonElement e, string key) => Regex.Escape(e.GetProperty(key).GetString()!);

    private static string Pu(JsonElement e, string key) => Regex.Escape(Fixed(e.GetProperty(key).GetDouble(), 4));

    /// <summary>The screen's text as one line: box characters and the wrap's indent taken out.</summary>
    private static string Flatten(string screen) => Regex.Replace(
        string.Join(" ", screen.Split('\n').Select(r => r.Trim('║', '│', ' ', '╔', '╗', '╚', '╝', '╭', '╮', '╰', '╯'))), @"\s+", " ");
}
