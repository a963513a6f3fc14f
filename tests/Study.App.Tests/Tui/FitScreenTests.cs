// At 80×24 nothing a user must read is cut at an edge: menus with their descriptions and keys, the
// study dialogs with every label and option.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tests.Tui;

public sealed class FitScreenTests : IDisposable
{
    private readonly TempFolder temp = new();

    public void Dispose() => temp.Dispose();

    private EditSession Demo() => EditSession.Untitled(DemoNetwork.Read(), temp.File("user"));

    private static string Plain(string title) => title.Replace("_", "", StringComparison.Ordinal);

    [Theory]
    [InlineData("File")]
    [InlineData("Edit")]
    [InlineData("Study")]
    [InlineData("View")]
    [InlineData("Help")]
    public void Each_menu_at_80x24_shows_every_item_with_its_whole_description_and_key_on_one_row(string menu)
    {
        using var h = new Headless();
        EditSession session = Demo();
        MainWindow main = h.Main(session);
        string screen = "";
        h.Run(main,
            new Step("the main window", () => true, () => h.Keys(new Key(char.ToLowerInvariant(menu[0])).WithAlt)),
            new Step("the open menu", () => true, () =>
            {
                screen = h.Draw();
                h.Keys(Key.Esc);
            }));

        string[] rows = screen.Split('\n');
        foreach (TuiCommand c in TuiCommands.All.Where(c => c.Menu == menu))
        {
            string title = Plain(c.Title), key = c.Keys[0].ToString();
            // Title, then description, then key, whole, on the one row: a cut description or key fails.
            Assert.True(rows.Any(r => r.IndexOf(title, StringComparison.Ordinal) is int t and >= 0
                    && r.IndexOf(c.Help, t + title.Length, StringComparison.Ordinal) is int d and >= 0
                    && r.IndexOf(key, d + c.Help.Length, StringComparison.Ordinal) >= 0),
                $"{menu} menu: '{title}  {c.Help}  {key}' is not whole on one row:\n{screen}");
        }
        session.Close();
    }

    /// <summary>The key that opens each study dialog from the main window.</summary>
    private static Key DialogKey(string name) => name switch
    {
        "fault" => Key.F7,
        "taps" => Key.F8,
        "outages" => Key.U.WithAlt,
        "compare" => Key.C.WithAlt,
        "start" => Key.M.WithAlt,
        "profile" => Key.L.WithAlt,
        "choice" => Key.B.WithAlt,
        _ => Key.N.WithAlt,
    };

    /// <summary>
    /// Every text of a dialog that must be read whole: its title, labels, tick boxes, each option of a
    /// choice, each line of a list, the end of a text pane. Text fields scroll, so they are left out.
    /// </summary>
    public static IEnumerable<string> TextsToRead(View view)
    {
        if (view is Dialog && view.Title.Length > 0) yield return view.Title;
        switch (view)
        {
            case TextPane pane:
                // A pane wraps its text: its last word on screen shows that none was cut at the bottom.
                if (pane.Content.Trim().Length > 0) yield return pane.Content.Trim().Split(' ')[^1];
                yield break;
            case Button or TextField:
                yield break;
            case OptionSelector options:
                foreach (string label in options.Labels ?? []) yield return label;
                yield break;
            case ListView list:
                if (list.Source is { } source)
                    foreach (object? item in source.ToList()) yield return item?.ToString() ?? "";
                yield break;
            case Label or CheckBox:
                foreach (string line in view.Text.Split('\n')) if (line.Trim().Length > 0) yield return line.Trim();
                break;
        }
        foreach (View child in view.SubViews)
            foreach (string text in TextsToRead(child)) yield return text;
    }

    private static void AssertShownWhole(string[] texts, string screen)
    {
        string[] rows = screen.Split('\n');
        Assert.True(texts.Length > 1, "no texts read");
        string[] cut = texts.Where(t => !rows.Any(r => r.Contains(t, StringComparison.Ordinal))).ToArray();
        Assert.True(cut.Length == 0, $"'{texts[0]}' does not show whole: {string.Join(" | ", cut)}\n{screen}");
    }

    [Theory]
    [InlineData("fault")]
    [InlineData("taps")]
    [InlineData("outages")]
    [InlineData("compare")]
    [InlineData("start")]
    [InlineData("profile")]
    [InlineData("choice")]
    [InlineData("scenario")]
    public void Each_study_dialog_at_80x24_shows_every_label_and_option_whole(string name)
    {
        using var h = new Headless();
        EditSession session = EditSession.Open(DemoNetwork.PathOf, userFolder: temp.File("user"));
        MainWindow main = h.Main(session);
        var seen = new List<(View Dialog, string[] Texts, string Screen)>();
        // The tap study first asks which transformer; its list is a dialog of its own, checked too.
        int dialogs = name == "taps" ? 2 : 1;
        var steps = new List<Step> { new("the main window", () => true, () => h.Keys(DialogKey(name))) };
        for (int i = 0; i < dialogs; i++)
        {
            int at = i;
            steps.Add(new Step($"dialog {at + 1} of {name}", () => h.DialogUp && seen.Count == at && h.App.TopRunnableView is View v && !seen.Any(s => s.Dialog == v), () =>
            {
                View top = (View)h.App.TopRunnableView!;
                seen.Add((top, TextsToRead(top).ToArray(), h.Draw())); // read before the dialog closes and lets go of its views
                h.Keys(at + 1 < dialogs ? Key.Enter : Key.Esc);
            }));
        }
        h.Run(main, steps.ToArray());

        Assert.Equal(dialogs, seen.Count);
        foreach (var (_, texts, screen) in seen) AssertShownWhole(texts, screen);
        session.Close();
    }
}
