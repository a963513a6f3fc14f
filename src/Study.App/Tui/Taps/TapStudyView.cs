// The Tap study tab: the finding and recommendations, positions × scenarios, and the voltage curve.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Taps;

/// <summary>Summary on top; table and chart side by side on a wide screen, stacked on a narrow one.</summary>
public sealed class TapStudyView : View
{
    private const int WideFrom = 110;
    private readonly TextPane summary = new() { CanFocus = false, Content = "No tap study yet (F8)." };
    private readonly TableView table = ResultsView.ResultTable(["Pos"]);
    private readonly TapCurveView chart = new();
    private readonly Label legend = new() { Text = "" };
    private TapStudyResult? result;

    public TapStudyView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        bool Wide() => Viewport.Width >= WideFrom;
        summary.Height = Dim.Func(_ => Math.Min(4, TextPane.Wrap(summary.Content, Math.Max(1, Viewport.Width)).Count));
        table.Y = Pos.Bottom(summary);
        table.Width = Dim.Func(_ => Wide() ? Viewport.Width / 2 : Viewport.Width);
        table.Height = Dim.Func(_ => Wide() ? Math.Max(1, Viewport.Height - summary.Frame.Height) : Math.Max(3, (Viewport.Height - summary.Frame.Height) * 2 / 5));
        chart.X = Pos.Func(_ => Wide() ? Viewport.Width / 2 + 1 : 0);
        chart.Y = Pos.Func(_ => Wide() ? summary.Frame.Height : table.Frame.Bottom);
        chart.Height = Dim.Fill(1);
        legend.X = Pos.Left(chart);
        legend.Y = Pos.AnchorEnd(1);
        legend.Width = Dim.Fill();
        Add(summary, table, chart, legend);
        table.Style.RowColorGetter = args => RowScheme(args.RowIndex);
    }

    public TapStudyResult? Result
    {
        get => result;
        set
        {
            result = value;
            summary.Content = value is null ? "No tap study yet (F8)." : TapStudyTables.Summary(value);
            table.Table = value is null ? TextTableSource.Empty("Pos") : TapStudyTables.Positions(value);
            table.Update();
            TapCurve? curve = value is null ? null : TapCurve.From(value);
            chart.Curve = curve;
            legend.Text = curve?.Legend() ?? "";
            SetNeedsLayout();
        }
    }

    private Scheme? RowScheme(int row)
    {
        if (table.Table is not TextTableSource t || row < 0 || row >= t.Rows) return null;
        string fits = t.RowCells[row][2];
        if (fits == "no") return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(new Attr(fits == "best" ? ColorName16.BrightGreen : ColorName16.Green, normal.Background));
    }
}
