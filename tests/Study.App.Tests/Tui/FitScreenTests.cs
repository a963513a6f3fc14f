// At 80×24 nothing a user must read is cut at an edge: menus with their descriptions and keys, the
// study dialogs with every label and option, the edit forms with every label, hint and per-unit step,
// and a long value in a field not being edited from its start.
using System.Text.RegularExpressions;
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.Core.Model;
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

    /// <summary>A form editing the kind's first element on the demo; for a kind the demo lacks, one is made and added first.</summary>
    private static ElementForm FormOf(Network n, ElementKind kind)
    {
        if (ElementLists.Ids(n, kind).FirstOrDefault() is { } id) return new ElementForm(n, kind, id);
        var add = new ElementForm(n, kind, null);
        // An invented 132/33/11 kV three-winding bank, enough data for its per-unit steps.
        foreach (var (key, text) in new[] { ("hv", "WRB132"), ("mv", "WRB33"), ("lv", "CQ11"), ("hvKv", "132"), ("mvKv", "33"), ("lvKv", "11"),
                     ("mvaHv", "40"), ("mvaMv", "40"), ("mvaLv", "20"), ("zHmPercent", "12"), ("zHlPercent", "18"), ("zMlPercent", "6"), ("zBaseMva", "40") })
            if (add.FieldOf(key) is int field) add.Texts[field] = text;
        object element = add.Evaluate().Element ?? throw new InvalidOperationException(string.Join("; ", add.Evaluate().Problems));
        return new ElementForm(ElementLists.Add(n, kind, element), kind, ElementLists.Of(kind).IdOf(element));
    }

    /// <summary>The form at 80×24 with each field in turn focused (the fields scroll to it), one screen per field.</summary>
    private static List<string> ScreensOf(ElementForm form)
    {
        using var h = new Headless();
        var dialog = new ElementDialog(h.App, form);
        var screens = new List<string>();
        h.Run(dialog, new Step("the form", () => true, () =>
        {
            foreach (TextField text in dialog.Texts)
            {
                text.SetFocus();
                screens.Add(h.Draw());
            }
        }));
        return screens;
    }

    [Theory]
    [InlineData(ElementKind.Bus)]
    [InlineData(ElementKind.Supply)]
    [InlineData(ElementKind.Generator)]
    [InlineData(ElementKind.Load)]
    [InlineData(ElementKind.Shunt)]
    [InlineData(ElementKind.Line)]
    [InlineData(ElementKind.Transformer)]
    [InlineData(ElementKind.ThreeWindingTransformer)]
    [InlineData(ElementKind.Motor)]
    [InlineData(ElementKind.Breaker)]
    [InlineData(ElementKind.Scenario)]
    public void Each_edit_form_at_80x24_shows_every_label_and_hint_whole_and_its_per_unit_steps_in_labels(ElementKind kind)
    {
        ElementForm form = FormOf(DemoNetwork.Read(), kind);
        List<string> screens = ScreensOf(form);
        string[] rows = screens.SelectMany(s => s.Split('\n')).ToArray();
        foreach (ElementField field in form.Fields)
        {
            string hint = ElementDialog.Hint(field);
            Assert.True(rows.Any(r => r.Contains(field.Header, StringComparison.Ordinal)), $"label '{field.Header}' is cut:\n{screens[^1]}");
            Assert.True(hint.Length == 0 || rows.Any(r => r.Contains(hint, StringComparison.Ordinal)), $"hint '{hint}' is cut:\n{screens[^1]}");
        }

        // No number is named by its file key in the working: a camel-case or dotted key ("loadPercent",
        // "lockedRotor.powerFactor") reads as its label.
        FormState state = form.Evaluate();
        if (kind != ElementKind.Scenario) Assert.NotEmpty(state.Preview);
        foreach (ElementField field in form.Fields.Where(f => f.Numeric && f.Key is { } k && (k.Contains('.') || k.Any(char.IsUpper))))
        {
            var key = new Regex($@"(?<![\w.]){Regex.Escape(field.Key!)}(?!\w)");
            Assert.DoesNotContain(state.Preview, line => key.IsMatch(line));
        }
    }

    [Fact]
    public void The_motor_and_transformer_forms_work_their_per_unit_values_in_labels_with_units()
    {
        Network n = DemoNetwork.Read();
        string motor = ScreensOf(new ElementForm(n, ElementKind.Motor, "M-CS-COMP"))[0];
        Assert.Contains("load = Running load %", motor);
        Assert.DoesNotContain("loadPercent", motor);
        string bank = ScreensOf(new ElementForm(n, ElementKind.Transformer, "CQ-T1"))[0];
        Assert.Contains("Impedance % / 100", bank);
        Assert.DoesNotContain("zPercent", bank);

        // The steps name the same numbers the form holds: 10 % on the bank's own base, 0.1 pu.
        FormState state = new ElementForm(n, ElementKind.Transformer, "CQ-T1").Evaluate();
        Assert.Contains("z (own base) = Impedance % / 100 = 10 / 100 = 0.1 pu", state.Preview);
    }

    [Fact]
    public void A_long_name_shows_its_start_when_its_field_is_not_being_edited()
    {
        Network n = DemoNetwork.Read();
        const string name = "Cold Quay 33 kV substation board";
        n = n with { Buses = n.Buses.Select(b => b.Id == "CQ33" ? b with { Name = name } : b).ToList() };
        var form = new ElementForm(n, ElementKind.Bus, "CQ33");
        int field = form.FieldOf("name")!.Value;
        using var h = new Headless();
        var dialog = new ElementDialog(h.App, form);
        string opened = "", left = "", typed = "";
        h.Run(dialog, new Step("the form", () => true, () =>
        {
            opened = h.Draw();
            // Typed afresh (a field selects its text when it takes the keyboard, so typing replaces it), then left.
            dialog.Texts[field].SetFocus();
            h.Type(name.ToUpperInvariant());
            typed = dialog.Texts[field].Text;
            dialog.Texts[0].SetFocus();
            left = h.Draw();
            dialog.Texts[field].Text = name; // unchanged again, so the form closes without asking
        }));

        string Row(string screen) => screen.Split('\n').Single(r => r.Contains("Name ", StringComparison.Ordinal));
        Assert.Contains("Name                 Cold Quay 33", Row(opened));
        Assert.Equal(name.ToUpperInvariant(), typed);
        Assert.Contains("Name                 COLD QUAY 33", Row(left));
    }

    [Fact]
    public void The_motor_forms_per_unit_working_longer_than_the_screen_is_reached_by_Tab_and_scrolled_to_its_last_step()
    {
        var form = new ElementForm(DemoNetwork.Read(), ElementKind.Motor, "M-CS-COMP");
        using var h = new Headless();
        var dialog = new ElementDialog(h.App, form);
        string first = "", last = "";
        h.Run(dialog, new Step("the form", () => true, () =>
        {
            dialog.Texts[^1].SetFocus();
            first = h.Draw();
            h.Keys(Key.Tab, Key.End);
            last = h.Draw();
        }));

        // The last step (the locked-rotor reactance) lies below the 80×24 screen until scrolled to.
        Assert.DoesNotContain("x_LR", first);
        Assert.Contains("x_LR = |z_M| · sin φ_LR", last);
        Assert.Contains("4.26211 pu", last);
    }
}
