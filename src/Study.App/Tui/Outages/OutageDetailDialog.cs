// One outage opened: what it caused, then the bus voltages and branch flows with the element out.
using Study.App.Tui.LoadFlow;
using Study.App.Tui.Shell;
using Study.Core.LoadFlow;
using Study.Core.Studies;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Outages;

/// <summary>
/// A dialog over the main screen: the outage's tier, lost load and new violations; the highlights of
/// the post-outage load flow; its buses and its branches (Tab moves between the two tables, the focused
/// one taking two thirds of the rows). Enter or Esc closes.
/// </summary>
public static class OutageDetailDialog
{
    /// <summary>The dialog's views, built without running it (the tests draw it headless).</summary>
    public static Dialog Build(OutageCase outage, LoadFlowResult after)
    {
        var dialog = new Dialog { Title = $"Outage of {outage.Element}", Width = Dim.Percent(96), Height = Dim.Percent(94) };
        var body = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        var heading = new TextPane { X = 0, Y = 0, CanFocus = false, Content = OutageTables.Detail(outage) + "\n" + ResultTables.Highlights(after) };
        // Sized from the body's width, never its own: a view sized by its own viewport does not settle in a dialog.
        heading.Height = Dim.Func(_ => Math.Min(6, TextPane.Wrap(heading.Content, Math.Max(1, body.Viewport.Width)).Count));
        var buses = new ResultTable(ResultTables.BusHeaders) { X = 0, Y = Pos.Bottom(heading) };
        var branches = new ResultTable(ResultTables.BranchHeaders) { X = 0 };
        buses.Source = ResultTables.Buses(after);
        branches.Source = ResultTables.Branches(after);
        body.Add(heading, buses, branches);
        FocusSplit.Stack(body, buses, branches, () => body.Viewport.Height - heading.Frame.Height);
        dialog.Add(body);
        dialog.AddButton(new Button { Text = "Close" });
        buses.SetFocus();
        return dialog;
    }

    public static void Run(IApplication app, OutageCase outage, LoadFlowResult after)
    {
        Dialog dialog = Build(outage, after);
        app.Run(dialog);
        dialog.Dispose();
    }
}
