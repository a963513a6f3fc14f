// What each command does on the main screen: edits through the session, studies through the runner.
using Study.App.Reports;
using Study.App.Tui.Editing;
using Study.Core.Cases;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Model.Validation;
using Terminal.Gui.App;
using Terminal.Gui.Input;

namespace Study.App.Tui.Shell;

/// <summary>Runs a <see cref="TuiAction"/>. Keys arrive through <see cref="OnKeyDown"/>, the one key handler.</summary>
public sealed class MainCommands
{
    /// <summary>How many errors the save warning lists before "and N more".</summary>
    private const int ListedErrors = 8;

    private readonly MainWindow main;

    public MainCommands(MainWindow main)
    {
        this.main = main;
        Studies = new StudyCommands(main);
    }

    private IApplication App => main.App;
    private EditSession Session => main.Session;

    public StudyCommands Studies { get; }

    /// <summary>The application-wide key handler: commands only while the main window is on top.</summary>
    public void OnKeyDown(object? sender, Key key)
    {
        if (App.TopRunnableView != main) return;
        if (key == Key.Esc)
        {
            key.Handled = true; // Esc must not close the main window; it stops a running study.
            if (main.Runner.IsRunning) main.Runner.Cancel();
            return;
        }
        if (key == Key.Tab || key == Key.Tab.WithShift)
        {
            key.Handled = true;
            main.FocusNextPane(back: key == Key.Tab.WithShift);
            return;
        }
        if (TuiCommands.ForKey(key) is { } command)
        {
            key.Handled = true;
            Do(command.Action);
        }
    }

    /// <summary>Runs the action on the next loop iteration (from menus, which are closing).</summary>
    public void Later(TuiAction action) => App.Invoke(() => Do(action));

    public void Do(TuiAction action)
    {
        main.Status.Message = null;
        switch (action)
        {
            case TuiAction.Open: Open(); break;
            case TuiAction.Save: Save(); break;
            case TuiAction.SaveAs: SaveAs(); break;
            case TuiAction.Quit: Quit(); break;
            case TuiAction.Add: Edit(null); break;
            case TuiAction.Edit: if (main.SelectedId is { } id) Edit(id); break;
            case TuiAction.Delete: Delete(); break;
            case TuiAction.Duplicate: Duplicate(); break;
            case TuiAction.Undo: Undo(); break;
            case TuiAction.Redo: Redo(); break;
            case TuiAction.LoadFlow: LoadFlow(); break;
            case TuiAction.Fault: Studies.Fault(); break;
            case TuiAction.TapStudy: Studies.TapStudy(); break;
            case TuiAction.ApplyTap: Studies.ApplyRecommendedTap(); break;
            case TuiAction.Outages: Studies.Outages(); break;
            case TuiAction.Compare: Studies.Compare(); break;
            case TuiAction.MotorStart: Start.StartStudy.Run(main); break;
            case TuiAction.Profile: Profile.ProfileStudy.Run(main); break;
            case TuiAction.BankChoice: Choice.ChoiceStudy.Run(main); break;
            case TuiAction.Scenario: ChooseScenario(); break;
            case TuiAction.Cancel: main.Runner.Cancel(); break;
            case TuiAction.ShowDetail: main.Results.Value = main.Results.DetailTab; break;
            case TuiAction.ShowBuses: main.Results.Value = main.Results.BusesTab; break;
            case TuiAction.ShowBranches: main.Results.Value = main.Results.BranchesTab; break;
            case TuiAction.ShowFaults: main.Results.Value = main.Results.FaultsTab; break;
            case TuiAction.ShowTapStudy: main.Results.Value = main.Results.TapStudyTab; break;
            case TuiAction.ShowOutages: main.Results.Value = main.Results.OutagesTab; break;
            case TuiAction.ShowOneLine: main.Results.Value = main.Results.OneLineTab; break;
            case TuiAction.ShowVoltageChart: main.Results.Value = main.Results.ChartTab; break;
            case TuiAction.ShowCompare: main.Results.Value = main.Results.CompareTab; break;
            case TuiAction.ShowStart: main.Results.Value = main.Results.StartTab; break;
            case TuiAction.ShowProfile: main.Results.Value = main.Results.ProfileTab; break;
            case TuiAction.ShowBankChoice: main.Results.Value = main.Results.BankChoiceTab; break;
            case TuiAction.SwitchCostAxis: main.Results.BankChoice.SwitchAxis(); break;
            case TuiAction.EnlargeResults: main.EnlargeResults = !main.EnlargeResults; break;
            case TuiAction.Sort: Sort(); break;
            case TuiAction.Help: HelpDialog.Run(App); break;
        }
    }

    private void Edit(string? id)
    {
        ElementKind kind = main.SelectedKind;
        var form = new ElementForm(Session.Network, kind, id);
        if (ElementDialog.Run(App, form) is not { } element) return;
        if (id is not null && !Session.Replace(kind, id, element))
        {
            main.Status.Message = $"no change to {ElementKinds.Label(kind)} {id}";
            return;
        }
        if (id is null) Session.Add(kind, element);
        main.Select(kind, ElementLists.Of(kind).IdOf(element));
        main.Status.Message = Session.UndoName;
    }

    private void Delete()
    {
        ElementKind kind = main.SelectedKind;
        if (main.SelectedId is not { } id) return;
        IReadOnlyList<ElementReference> refs = Session.ReferencesTo(kind, id);
        if (refs.Count == 0)
        {
            if (Prompts.Ask(App, "Delete", $"Delete {ElementKinds.Label(kind)} {id}?", "Cancel", "Delete") == 1)
            {
                Session.Delete(kind, id);
                main.Status.Message = Session.UndoName + " (Alt+Z undoes)";
            }
            return;
        }
        string list = string.Join("\n", refs.Take(12).Select(r => "  " + r)) + (refs.Count > 12 ? $"\n  … and {refs.Count - 12} more" : "");
        int? answer = Prompts.Ask(App, "Bus in use",
            $"Bus {id} is named by {refs.Count} element(s):\n{list}\n\nDelete the bus with the elements connected to it?",
            "Cancel", "Delete all");
        if (answer != 1) return;
        Session.Delete(kind, id, cascade: true);
        main.Status.Message = Session.UndoName + " (Alt+Z undoes)";
    }

    private void Duplicate()
    {
        if (main.SelectedId is not { } id) return;
        string copy = Session.Duplicate(main.SelectedKind, id);
        main.Select(main.SelectedKind, copy);
        main.Status.Message = Session.UndoName;
    }

    private void Undo()
    {
        string? what = Session.UndoName;
        main.Status.Message = Session.Undo() ? $"undid: {what}" : "nothing to undo";
    }

    private void Redo()
    {
        string? what = Session.RedoName;
        main.Status.Message = Session.Redo() ? $"redid: {what}" : "nothing to redo";
    }

    private void LoadFlow()
    {
        Network snapshot = Session.Network;
        string? scenario = Session.ActiveScenario;
        LoadFlowResult? warm = main.LastResult is { Converged: true } last && last.Scenario == scenario ? last : null;
        string? path = Session.Path;
        var request = new SolveRequest { Scenario = scenario, Options = LoadFlowOptions.Default with { WarmStart = warm } };
        // The study runs on the snapshot: if the network is edited meanwhile, the result shows as out of date at once.
        ResultStamp stamp = main.Now();
        main.Runner.Start("Load flow", cancel => StudyCase.Of(snapshot, path).Solve(request, cancel),
            result =>
            {
                main.ShowResult(result, stamp);
                main.Results.Value = main.Results.BusesTab;
                main.Status.Message = result.Converged ? null : "the load flow did not converge";
            },
            message =>
            {
                main.Fail(ResultKind.LoadFlow, message);
                Prompts.Tell(App, "Load flow", message);
            });
    }

    private void ChooseScenario()
    {
        var names = new List<string> { Labels.Scenario(null) + "  (no scaling)" };
        names.AddRange(Session.Network.Scenarios.Select(s => $"{s.Name}  load ×{Field.Format(s.LoadScale)}"));
        int current = Session.ActiveScenario is null ? 0
            : 1 + Session.Network.Scenarios.ToList().FindIndex(s => s.Name == Session.ActiveScenario);
        if (Prompts.Choose(App, "Scenario", names, current) is not int chosen) return;
        Session.ActiveScenario = chosen == 0 ? null : Session.Network.Scenarios[chosen - 1].Name;
        main.Refresh();
        main.Status.Message = $"studies now run in {Labels.Scenario(Session.ActiveScenario)}";
    }

    /// <summary>Sorts the table in focus (or the shown tab's first) by a column chosen from its headings.</summary>
    private void Sort()
    {
        ResultTable? table = main.Table.HasFocus ? main.Table : main.Results.CurrentTable();
        if (table is null || table.Source.Columns == 0)
        {
            main.Status.Message = "no table to sort here";
            return;
        }
        var items = new List<string> { "(the result's own order)" };
        items.AddRange(table.Source.ColumnNames.Select((h, i) => i == table.SortColumn ? $"{h}  (sorted {(table.Descending ? "↓" : "↑")}: again reverses)" : h));
        if (Prompts.Choose(App, "Sort by", items, table.SortColumn is int c ? c + 1 : 0) is not int chosen) return;
        table.SortBy(chosen == 0 ? null : chosen - 1);
        main.Status.Message = table.SortColumn is int col ? $"sorted by {table.Source.ColumnNames[col]} {(table.Descending ? "↓" : "↑")}" : "in the result's own order";
    }

    private void Open()
    {
        if (!SaveOrDiscardFirst()) return;
        if (Prompts.AskPath(App, "Open network", Session.Path ?? Directory.GetCurrentDirectory() + "/") is not { } path) return;
        try
        {
            EditSession next = EditSession.Open(path);
            Session.Close();
            main.UseSession(next);
            StudyTui.OfferRecovery(App, next);
            main.Status.Message = $"opened {next.Path}";
        }
        catch (InputException e)
        {
            Prompts.Tell(App, "Cannot open", e.Describe());
        }
    }

    /// <summary>True when saved (or nothing to save).</summary>
    private bool Save()
    {
        if (Session.NeedsPathToSave) return SaveAs();
        if (!ConfirmErrors()) return false;
        return Try(Session.Save);
    }

    private bool SaveAs()
    {
        if (!ConfirmErrors()) return false;
        if (Prompts.AskPath(App, "Save as", Session.SuggestedSavePath) is not { } path) return false;
        return Try(() => Session.SaveAs(path));
    }

    /// <summary>
    /// A network with errors may be saved (work in progress), but never without the user seeing them: the
    /// same errors <c>study check</c> lists, and the choice to go back and fix them.
    /// </summary>
    private bool ConfirmErrors()
    {
        List<Problem> errors = NetworkCheck.Of(Session.Network).Report.Errors.ToList();
        if (errors.Count == 0) return true;
        string list = string.Join("\n", errors.Take(ListedErrors).Select(p => "  " + p.Describe()))
            + (errors.Count > ListedErrors ? $"\n  … and {errors.Count - ListedErrors} more ('study check' lists them all)" : "");
        int? answer = Prompts.Ask(App, "The network has errors",
            $"{errors.Count} error(s): studies will refuse this network until they are fixed.\n{list}\n\nSave it anyway?",
            "Save anyway", "Cancel");
        return answer == 0;
    }

    private bool Try(Action write)
    {
        try
        {
            write();
            main.Status.Message = $"saved {Session.Path}";
            return true;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or InputException)
        {
            Prompts.Tell(App, "Not saved", e.Message);
            main.Status.Message = "not saved: " + e.Message;
            return false;
        }
    }

    private void Quit()
    {
        if (!SaveOrDiscardFirst()) return;
        main.Runner.Cancel();
        Session.Close();
        App.RequestStop();
    }

    /// <summary>The unsaved-changes guard: Save, Discard or Cancel. True when it is fine to go on.</summary>
    private bool SaveOrDiscardFirst()
    {
        if (!Session.Dirty) return true;
        int? answer = Prompts.Ask(App, "Unsaved changes", "The network has unsaved changes.", "Cancel", "Discard", "Save");
        return answer switch
        {
            2 => Save(),
            1 => true,
            _ => false,
        };
    }
}
