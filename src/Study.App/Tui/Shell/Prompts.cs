// Small modal questions: yes/no choices, a file path, a choice from a list.
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>The modal questions the main window asks. Esc always answers "cancel" (null).</summary>
public static class Prompts
{
    /// <summary>
    /// Adds Cancel and Run to a study dialog and runs it. Run (the button, or Enter from any field) reads
    /// the fields into the form and keeps the dialog open, with the form's message in
    /// <paramref name="status"/>, until the form is valid: a question is never dropped in silence.
    /// True when the user ran it with a valid form.
    /// </summary>
    public static bool RunStudyDialog(IApplication app, Dialog dialog, Label status, Action read, Func<string?> error, View? focus = null)
    {
        dialog.AddButton(new Button { Text = "Cancel" });
        var run = new Button { Text = "Run" };
        dialog.AddButton(run);
        dialog.IsRunningChanging += (_, e) =>
        {
            if (e.NewValue || dialog.Result != 1) return;
            read();
            if (error() is not { } message) return;
            e.Cancel = true;
            dialog.Result = null;
            status.Text = "Not run: " + message;
        };
        (focus ?? run).SetFocus();
        app.Run(dialog);
        read();
        bool accepted = dialog.Result == 1 && error() is null;
        dialog.Dispose();
        return accepted;
    }

    /// <summary>Index of the chosen button, null on Esc. The last button is the default.</summary>
    public static int? Ask(IApplication app, string title, string text, params string[] buttons) =>
        MessageBox.Query(app, title, text, buttons);

    public static void Tell(IApplication app, string title, string text) => MessageBox.Query(app, title, text, "OK");

    /// <summary>Asks for a file path, starting from <paramref name="initial"/>; null when cancelled or blank.</summary>
    public static string? AskPath(IApplication app, string title, string initial)
    {
        var dialog = new Dialog { Title = title, Width = Dim.Percent(90), Height = 7 };
        var label = new Label { X = 0, Y = 0, Text = "File:" };
        var path = new EntryField { X = 6, Y = 0, Width = Dim.Fill(), Text = initial };
        dialog.Add(label, path);
        dialog.AddButton(new Button { Text = "Cancel" });
        dialog.AddButton(new Button { Text = "OK" });
        path.SetFocus();
        app.Run(dialog);
        string? chosen = dialog.Result == 1 && path.Text.Trim().Length > 0 ? path.Text.Trim() : null;
        dialog.Dispose();
        return chosen;
    }

    /// <summary>Index of the chosen item, null on Esc.</summary>
    public static int? Choose(IApplication app, string title, IReadOnlyList<string> items, int selected)
    {
        var dialog = new Dialog { Title = title, Width = Math.Min(60, Math.Max(30, items.Max(i => i.Length) + 8)), Height = Math.Min(20, items.Count + 7) };
        var list = new ListView { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(1) };
        list.SetSource(new System.Collections.ObjectModel.ObservableCollection<string>(items));
        list.SelectedItem = selected;
        list.Accepting += (_, _) => { };
        dialog.Add(list);
        dialog.AddButton(new Button { Text = "Cancel" });
        dialog.AddButton(new Button { Text = "OK" });
        list.SetFocus();
        app.Run(dialog);
        int? chosen = dialog.Result == 1 ? list.SelectedItem : null;
        dialog.Dispose();
        return chosen;
    }
}
