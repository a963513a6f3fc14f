// At 80×24 nothing a user must read is cut at an edge: menus with their descriptions and keys.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Terminal.Gui.Input;

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
}
