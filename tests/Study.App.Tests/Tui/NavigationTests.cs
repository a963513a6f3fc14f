// Keyboard navigation of the main screen, headless: from the kind list into the table and down to an element.
using Study.App.Tui.Editing;
using Study.App.Tui.Shell;
using Study.App.Tui;
using Study.Core.Model;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.Time;
using Terminal.Gui.ViewBase;

namespace Study.App.Tests.Tui;

public sealed class NavigationTests
{
    [Fact]
    public void Arrows_in_the_kind_list_then_Tab_and_arrows_in_the_table_select_the_fourth_transformer()
    {
        var time = new VirtualTimeProvider();
        using IApplication app = Application.Create(time);
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(80, 24);
        var session = EditSession.Untitled(DemoNetwork.Read(), Path.GetTempPath());
        var main = new MainWindow(app, session);
        app.Keyboard.KeyDown += main.Commands.OnKeyDown;
        SessionToken? token = app.Begin(main);
        app.LayoutAndDraw(true);
        for (int i = 0; i < 6; i++) app.InjectKey(Key.CursorDown);
        Assert.Equal(ElementKind.Transformer, main.SelectedKind);
        app.InjectKey(Key.Tab);
        for (int i = 0; i < 3; i++) app.InjectKey(Key.CursorDown);
        app.LayoutAndDraw(true);
        string focused = app.Navigation?.GetFocused()?.GetType().Name ?? "none";
        Assert.True(main.SelectedId == "CQ-T1", $"selected {main.SelectedId}, focus on {focused}");
        app.End(token!);
        main.Dispose();
    }
}
