// Builds the menu bar from the command table, so every menu item shows the key that runs it.
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui;

/// <summary>Menu items run the same <see cref="MainCommands.Do"/> as the keys.</summary>
public static class MenuFactory
{
    public static MenuBar Build(MainCommands commands) => new(TuiCommands.Menus.Select(menu =>
        new MenuBarItem("_" + menu, TuiCommands.All.Where(c => c.Menu == menu)
            .Select(c => (View)new MenuItem(c.Title, c.Help, () => commands.Later(c.Action), c.Keys[0]))
            .ToList())));
}
