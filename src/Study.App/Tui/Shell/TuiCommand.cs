// Every command of the terminal UI, with its key and menu wording: the one table menus, keys and help read.
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>What the user can ask for.</summary>
public enum TuiAction
{
    Open, Save, SaveAs, Quit,
    Add, Edit, Delete, Duplicate, Undo, Redo,
    LoadFlow, Fault, TapStudy, ApplyTap, Outages, Compare, MotorStart, Profile, BankChoice, Scenario, Cancel,
    ShowDetail, ShowBuses, ShowBranches, ShowFaults, ShowTapStudy, ShowOutages, ShowOneLine, ShowVoltageChart, ShowCompare, ShowStart, ShowProfile, ShowBankChoice, SwitchCostAxis, EnlargeResults, Sort,
    Help,
}

/// <summary>A command: action, the keys that run it, its menu and help wording.</summary>
public sealed record TuiCommand(TuiAction Action, string Menu, string Title, string Help, params Key[] Keys)
{
    public string KeyText => string.Join(", ", Keys.Select(k => k.ToString()));
}

/// <summary>The command table. Keys are F-keys, Alt-letters and editing keys: text fields keep Ctrl-letters.</summary>
public static class TuiCommands
{
    public static IReadOnlyList<TuiCommand> All { get; } =
    [
        new(TuiAction.Open, "File", "_Open…", "A network file or an IEEE Common Format case", Key.F3, Key.O.WithAlt),
        new(TuiAction.Save, "File", "_Save", "Save to the network file (or ask for a name)", Key.F2),
        new(TuiAction.SaveAs, "File", "Save _As…", "Save under a new name", Key.A.WithAlt),
        new(TuiAction.Quit, "File", "_Quit", "Quit (asks about unsaved changes)", Key.Q.WithAlt, Key.Q.WithCtrl),
        new(TuiAction.Add, "Edit", "_Add…", "Add an element of the selected kind", Key.InsertChar),
        new(TuiAction.Edit, "Edit", "_Edit…", "Edit the selected element (Enter in the table)", Key.F4),
        new(TuiAction.Delete, "Edit", "_Delete…", "Delete the selected element", Key.DeleteChar),
        new(TuiAction.Duplicate, "Edit", "D_uplicate", "Copy the selected element under a new id", Key.D.WithAlt),
        new(TuiAction.Undo, "Edit", "Und_o", "Undo the last edit", Key.Z.WithAlt, Key.Z.WithCtrl),
        new(TuiAction.Redo, "Edit", "_Redo", "Redo the last undone edit", Key.Y.WithAlt, Key.Y.WithCtrl),
        new(TuiAction.LoadFlow, "Study", "_Load flow", "Solve the load flow in the active scenario", Key.F5),
        new(TuiAction.Fault, "Study", "_Fault…", "Fault at a bus or at all buses", Key.F7),
        new(TuiAction.TapStudy, "Study", "_Tap study…", "Every tap position, in each scenario", Key.F8),
        new(TuiAction.ApplyTap, "Study", "_Apply recommended tap", "Best position of the last tap study", Key.P.WithAlt),
        new(TuiAction.Outages, "Study", "_Outage screening…", "N-1: each line and transformer out, ranked", Key.U.WithAlt),
        new(TuiAction.Compare, "Study", "Co_mpare…", "Two scenarios, or the file before a change", Key.C.WithAlt),
        new(TuiAction.MotorStart, "Study", "Motor _start…", "The voltage dip when motors start, at every bus", Key.M.WithAlt),
        new(TuiAction.Profile, "Study", "Load _profile…", "A load flow per step of a profile CSV", Key.L.WithAlt),
        new(TuiAction.BankChoice, "Study", "_Bank choice…", "Candidate banks ranked by total owning cost", Key.B.WithAlt),
        new(TuiAction.Scenario, "Study", "_Scenario…", "The scenario studies run in (kept per file)", Key.N.WithAlt),
        new(TuiAction.Cancel, "Study", "_Cancel study", "Stop the study that is running", Key.Esc),
        new(TuiAction.ShowDetail, "View", "_Detail", "Selected element: fields, problems, per unit", Key.D1.WithAlt),
        new(TuiAction.ShowBuses, "View", "_Buses", "Bus voltages of the last load flow", Key.D2.WithAlt),
        new(TuiAction.ShowBranches, "View", "B_ranches", "Branch flows, loading and losses", Key.D3.WithAlt),
        new(TuiAction.ShowFaults, "View", "_Faults", "Fault levels and breaker duty", Key.D4.WithAlt),
        new(TuiAction.ShowTapStudy, "View", "_Taps", "Tap-study results and curve", Key.D5.WithAlt),
        new(TuiAction.ShowOneLine, "View", "_One-line", "Text one-line view of the network", Key.D6.WithAlt),
        new(TuiAction.ShowVoltageChart, "View", "_Chart", "Bus voltages against the band", Key.D7.WithAlt),
        new(TuiAction.ShowOutages, "View", "O_utages", "Outage-screening results", Key.D8.WithAlt),
        new(TuiAction.ShowCompare, "View", "Co_mpare", "Before/after comparison", Key.D9.WithAlt),
        new(TuiAction.ShowStart, "View", "Motor s_tart", "Motor-start dips and terminal voltages", Key.D0.WithAlt),
        new(TuiAction.ShowProfile, "View", "_Profile", "Profile chart over time and the energy table", Key.F11),
        new(TuiAction.ShowBankChoice, "View", "Ban_k choice", "Candidate banks, what binds each, cost chart", Key.F12),
        new(TuiAction.SwitchCostAxis, "View", "Bank chart a_xis", "Cost chart against breaker duty or margin", Key.X.WithAlt),
        new(TuiAction.EnlargeResults, "View", "_Enlarge results", "Results take the screen, or give it back", Key.R.WithAlt),
        new(TuiAction.Sort, "View", "_Sort table…", "Sort the table by a column (again: reverse)", Key.F9),
        new(TuiAction.Help, "Help", "_Keys", "This list of keys", Key.F1),
    ];

    public static IReadOnlyList<string> Menus { get; } = ["File", "Edit", "Study", "View", "Help"];

    public static TuiCommand Of(TuiAction action) => All.First(c => c.Action == action);

    public static TuiCommand? ForKey(Key key) => All.FirstOrDefault(c => c.Keys.Any(k => k == key));

    /// <summary>Keys that are not commands of our own but that a user needs, for the help screen.</summary>
    public static IReadOnlyList<(string Keys, string Help)> Navigation { get; } =
    [
        ("Tab, Shift+Tab", "Move between the element list, the table and the results (and the tables of a result)"),
        ("Arrows, PgUp, PgDn", "Move in a list or table (they never leave it)"),
        ("Enter", "Edit the selected element; on an outage, open it; in a form, accept"),
        ("F4, Alt+Down", "In a form: list the values of the field (buses, choices) to pick from"),
        ("Esc", "In a form or dialog, cancel (asks when fields changed); on the main screen, stop a running study"),
        ("Alt+F, Alt+E, Alt+S, Alt+V, Alt+H", "Open the File, Edit, Study, View or Help menu"),
    ];
}

/// <summary>Menu items run the same <see cref="MainCommands.Do"/> as the keys.</summary>
public static class MenuFactory
{
    public static MenuBar Build(MainCommands commands) => new(TuiCommands.Menus.Select(menu =>
        new MenuBarItem("_" + menu, TuiCommands.All.Where(c => c.Menu == menu)
            .Select(c => (View)new MenuItem(c.Title, c.Help, () => commands.Later(c.Action), c.Keys[0]))
            .ToList())));
}
