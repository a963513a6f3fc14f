// The Taps tab: the recommendation and finding, positions × scenarios, and the voltage curve with its legend.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Taps;

/// <summary>
/// Summary on top (it scrolls when long); table and curve side by side on a wide screen, stacked on a
/// narrow one with the focused of the two taking two thirds. The table opens on the recommended
/// position, drawn green; the legend under the curve wraps rather than being cut.
/// </summary>
public sealed class TapStudyView : View
{
    private const int WideFrom = 110;
    private const string NotYet = "No tap study yet: F8 studies every position of a transformer.";
    private readonly TextPane summary = new() { CanFocus = false, Content = NotYet };
    private readonly ResultTable table = new("Pos");
    private readonly View curvePane = new() { CanFocus = true };
    private readonly TapCurveView chart = new();
    private readonly TextPane legend = new() { CanFocus = false };
    private TapStudyResult? result;
    private TapSetting? setting;

    public TapStudyView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        summary.Height = Dim.Func(_ => Math.Min(Math.Max(2, Viewport.Height / 3), Wrapped(summary, Viewport.Width)));
        table.Y = Pos.Bottom(summary);
        table.Width = Dim.Func(_ => Wide ? Viewport.Width / 2 : Viewport.Width);
        // Stacked, the table takes no more rows than its positions need; the curve gets the rest.
        table.Height = Dim.Func(_ => Wide ? Math.Max(1, Viewport.Height - summary.Frame.Height)
            : FocusSplit.TopRows(Viewport.Height - summary.Frame.Height, curvePane.HasFocus, FocusSplit.Need(table)));
        curvePane.X = Pos.Func(_ => Wide ? Viewport.Width / 2 + 1 : 0);
        curvePane.Y = Pos.Func(_ => Wide ? summary.Frame.Height : table.Frame.Bottom);
        curvePane.Width = Dim.Fill();
        curvePane.Height = Dim.Fill();
        legend.Height = Dim.Func(_ => Wrapped(legend, curvePane.Viewport.Width));
        legend.Y = Pos.AnchorEnd();
        chart.Height = Dim.Fill(Dim.Func(_ => legend.Frame.Height));
        curvePane.Add(chart, legend);
        Add(summary, table, curvePane);
        table.RowScheme = RowScheme;
        FocusSplit.Relayout(this, table, curvePane);
    }

    public TapStudyResult? Result
    {
        get => result;
        set => Show(value, setting);
    }

    public ResultTable Table => table;

    /// <summary>Shows a result with how its tap stands now; the table's cursor goes to the recommended position.</summary>
    public void Show(TapStudyResult? value, TapSetting? now)
    {
        bool fresh = !ReferenceEquals(value, result);
        result = value;
        setting = now;
        summary.Content = value is null ? NotYet : TapStudyTables.Summary(value, now);
        if (fresh)
        {
            table.Source = value is null ? TextTableSource.Empty("Pos") : TapStudyTables.Positions(value);
            TapCurve? curve = value is null ? null : TapCurve.From(value);
            chart.Chart = curve;
            legend.Content = curve?.Legend() ?? "";
            if (value is not null && TapStudyTables.BestRow(value) is int best) table.SelectedRow = best;
        }
        SetNeedsLayout();
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        summary.CanFocus = Wrapped(summary, Viewport.Width) > summary.Frame.Height;
        if (result is not null && TapStudyTables.BestRow(result) is int best && table.SelectedRow == best) table.EnsureCursorIsVisible();
        base.OnSubViewsLaidOut(args);
    }

    private bool Wide => Viewport.Width >= WideFrom;

    private static int Wrapped(TextPane pane, int width) =>
        pane.Content.Length == 0 ? 0 : TextPane.Wrap(pane.Content, Math.Max(1, width)).Count;

    private Scheme? RowScheme(int row)
    {
        if (table.Source is not { } t || row < 0 || row >= t.Rows) return null;
        string fits = t.FullCells[row][2];
        if (fits == "no") return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(new Attr(fits == "best" ? ColorName16.BrightGreen : ColorName16.Green, normal.Background));
    }
}
