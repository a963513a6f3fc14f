// The Faults tab: the caution fixed at the top, a summary line, fault levels and breaker duty, the notes in full below.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Faults;
using Study.Core.Model;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Faults;

/// <summary>
/// The caution is its own pane above everything and never scrolls; a summary line under it says how the
/// faults were calculated and how many breakers are over. The levels (with the breaking and thermal
/// currents) and every check of every breaker share the rows, the focused table taking two thirds. Below
/// them, how the time-dependent currents were taken and every note and missing datum in full: shown
/// whole when they fit in a quarter of the tab; otherwise folded to one row that says how many lines
/// wait there, and opened (up to two thirds of the tab, scrolling) when Tab reaches them. Breaker rows
/// over their rating are marked "▲ OVER" (and coloured); rows above 90 % "△ near".
/// </summary>
public sealed class FaultView : View
{
    private const string NotYet = "No fault study yet: F7 asks where and which faults.";
    private readonly TextPane caution = new() { CanFocus = false, Content = CautionText(FaultStudy.Caution) };
    private readonly TextPane summary = new() { CanFocus = false, Content = NotYet };
    private readonly ResultTable levels = new(FaultTables.LevelHeaders);
    private readonly ResultTable breakers = new(FaultTables.BreakerHeaders);
    private readonly TextPane notes = new() { CanFocus = false, FoldLabel = "method and notes" };
    private FaultResult? result;
    private IReadOnlyList<DutyCheck> checks = [];

    public FaultView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        caution.Height = Dim.Func(_ => Wrapped(caution));
        summary.Y = Pos.Bottom(caution);
        summary.Height = Dim.Func(_ => Math.Min(2, Wrapped(summary)));
        levels.Y = Pos.Bottom(summary);
        notes.Y = Pos.AnchorEnd();
        notes.Height = Dim.Func(_ => NotesRows);
        Add(caution, summary, levels, breakers, notes);
        FocusSplit.Stack(this, levels, breakers, () => Room - NotesRows);
        notes.HasFocusChanged += (_, _) => SetNeedsLayout();
        breakers.RowScheme = BreakerScheme;
    }

    /// <summary>Rows under the caution and the summary, for the tables and the notes.</summary>
    private int Room => Math.Max(0, Viewport.Height - caution.Frame.Height - summary.Frame.Height);

    /// <summary>The notes whole when they fit in a quarter of the room; else one folded row, or two thirds while being read.</summary>
    private int NotesRows
    {
        get
        {
            int full = notes.Content.Length == 0 ? 0 : Wrapped(notes);
            if (full <= Math.Max(2, Room / 4)) return full;
            return notes.HasFocus ? Math.Min(full, Room * 2 / 3) : 1;
        }
    }

    public FaultResult? Result
    {
        get => result;
        set => Show(value, null);
    }

    /// <summary>Shows a result; <paramref name="network"/> (the one studied) lets notes name the form fields that change them.</summary>
    public void Show(FaultResult? value, Network? network)
    {
        result = value;
        checks = value is null ? [] : FaultTables.Checks(value);
        caution.Content = CautionText(value?.Caution ?? FaultStudy.Caution);
        summary.Content = value is null ? NotYet : FaultTables.Summary(value);
        notes.Content = value is null ? "" : FaultTables.Notes(value, network);
        levels.Source = value is null ? TextTableSource.Empty(FaultTables.LevelHeaders) : FaultTables.Levels(value);
        breakers.Source = value is null ? TextTableSource.Empty(FaultTables.BreakerHeaders) : FaultTables.Breakers(value);
        SetNeedsLayout();
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        // Tab reaches the notes only when some are hidden; focused, they stay reachable until Tab leaves.
        notes.CanFocus = notes.HasFocus || Wrapped(notes) > notes.Frame.Height;
        base.OnSubViewsLaidOut(args);
    }

    private int Wrapped(TextPane pane) => TextPane.Wrap(pane.Content, Math.Max(1, Viewport.Width)).Count;

    private static string CautionText(string caution) => "Caution: " + caution;

    private Scheme? BreakerScheme(int row)
    {
        if (row < 0 || row >= checks.Count) return null;
        DutyStatus s = checks[row].Status;
        if (s is not (DutyStatus.Over or DutyStatus.Warning)) return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(s == DutyStatus.Over
            ? new Attr(ColorName16.White, ColorName16.Red)
            : new Attr(ColorName16.BrightYellow, normal.Background));
    }
}
