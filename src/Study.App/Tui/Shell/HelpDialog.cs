// The help screen: every key, read from the command table so it cannot drift from what the keys do.
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>Lists every command key, grouped by menu, then the navigation keys.</summary>
public static class HelpDialog
{
    public static string Text()
    {
        var lines = new List<string>();
        int titleWidth = TuiCommands.All.Max(c => c.Title.Replace("_", "", StringComparison.Ordinal).Length);
        foreach (string menu in TuiCommands.Menus)
        {
            lines.Add(menu);
            foreach (TuiCommand c in TuiCommands.All.Where(c => c.Menu == menu))
                lines.Add($"  {c.KeyText,-18} {c.Title.Replace("_", "", StringComparison.Ordinal).PadRight(titleWidth)} {c.Help}");
        }
        lines.Add("Moving around");
        foreach ((string keys, string help) in TuiCommands.Navigation) lines.Add($"  {keys,-18} {help}");
        return string.Join("\n", lines);
    }

    public static void Run(IApplication app)
    {
        var dialog = new Dialog { Title = "Keys", Width = Dim.Percent(96), Height = Dim.Percent(94) };
        var text = new TextPane { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(1), Content = Text() };
        dialog.Add(text);
        dialog.AddButton(new Button { Text = "OK" });
        // The text takes the focus so that arrows and PgUp/PgDn scroll it at once; Enter or Esc closes.
        text.SetFocus();
        app.Run(dialog);
        dialog.Dispose();
    }
}
