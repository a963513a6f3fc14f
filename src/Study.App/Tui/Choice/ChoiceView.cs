// The Bank tab: the caution fixed on top, the findings and notes, the candidates table and the cost chart.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Cases;
using Study.Core.Faults;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Choice;

/// <summary>
/// The caution never scrolls (the duty figures stand here). On a wide screen (from <see cref="WideFrom"/>
/// columns) the table and the chart stand side by side; on a narrow one they are stacked and the one with
/// focus takes two thirds. Failing rows are drawn in red and say "FAILS …"; the recommended one in green
/// with "★". F9 sorts by any column; Alt+X switches the chart between max breaker duty and voltage margin.
/// </summary>
public sealed class ChoiceView : View
{
    public const int WideFrom = 120;
    private readonly TextPane caution = new() { CanFocus = false, Content = "Caution: " + FaultStudy.Caution };
    private readonly TextPane heading = new() { CanFocus = false, Content = ChoiceTables.NotYet };
    private readonly ResultTable table = new(ChoiceTables.Headers);
    private readonly View chartPane = new() { CanFocus = true };
    private readonly CostChartView chart = new();
    private readonly TextPane legend = new() { CanFocus = false };
    private BankChoiceResult? result;

    public ChoiceView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        caution.Height = Dim.Func(_ => Wrapped(caution, Viewport.Width));
        heading.Y = Pos.Bottom(caution);
        heading.Height = Dim.Func(_ => Math.Min(Math.Max(2, Viewport.Height / 4), Wrapped(heading, Viewport.Width)));
        table.Y = Pos.Bottom(heading);
        table.Width = Dim.Func(_ => Wide ? Viewport.Width * 3 / 5 : Viewport.Width);
        table.Height = Dim.Func(_ => Wide ? Math.Max(1, Rest) : FocusSplit.TopRows(Rest, chartPane.HasFocus, FocusSplit.Need(table)));
        chartPane.X = Pos.Func(_ => Wide ? Viewport.Width * 3 / 5 + 1 : 0);
        chartPane.Y = Pos.Func(_ => Wide ? caution.Frame.Height + heading.Frame.Height : table.Frame.Bottom);
        chartPane.Width = Dim.Fill();
        chartPane.Height = Dim.Fill();
        legend.Y = Pos.AnchorEnd();
        legend.Height = Dim.Func(_ => Wrapped(legend, chartPane.Viewport.Width));
        chart.Height = Dim.Fill(Dim.Func(_ => legend.Frame.Height));
        chartPane.Add(chart, legend);
        Add(caution, heading, table, chartPane);
        table.RowScheme = RowScheme;
        FocusSplit.Relayout(this, table, chartPane);
    }

    public BankChoiceResult? Result => result;

    public ResultTable Table => table;

    public CostAxis Axis { get; private set; } = CostAxis.Duty;

    public CostChart? Chart => chart.Chart;

    public void Show(BankChoiceResult? value)
    {
        result = value;
        caution.Content = "Caution: " + (value?.Caution ?? FaultStudy.Caution);
        heading.Content = value is null ? ChoiceTables.NotYet : ChoiceTables.Heading(value);
        table.Source = value is null ? TextTableSource.Empty(ChoiceTables.Headers) : ChoiceTables.Candidates(value);
        Redraw();
    }

    /// <summary>The chart's other axis: max breaker duty or voltage margin.</summary>
    public void SwitchAxis()
    {
        Axis = Axis == CostAxis.Duty ? CostAxis.Margin : CostAxis.Duty;
        Redraw();
    }

    private void Redraw()
    {
        CostChart? c = result is null ? null : CostChart.Of(result, Axis);
        chart.Chart = c;
        legend.Content = c?.Legend(result!.Recommended) ?? "";
        SetNeedsLayout();
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        heading.CanFocus = Wrapped(heading, Viewport.Width) > heading.Frame.Height;
        base.OnSubViewsLaidOut(args);
    }

    private bool Wide => Viewport.Width >= WideFrom;

    private int Rest => Viewport.Height - caution.Frame.Height - heading.Frame.Height;

    private static int Wrapped(TextPane pane, int width) =>
        pane.Content.Length == 0 ? 0 : TextPane.Wrap(pane.Content, Math.Max(1, width)).Count;

    private Scheme? RowScheme(int row)
    {
        if (result is null || row < 0 || row >= result.Candidates.Count) return null;
        CandidateAssessment c = result.Candidates[row];
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        if (!c.Feasible) return new Scheme(new Attr(ColorName16.BrightRed, normal.Background));
        return c.Id == result.Recommended ? new Scheme(new Attr(ColorName16.BrightGreen, normal.Background)) : null;
    }
}
