// The Faults tab: the caution fixed at the top, then fault levels and breaker duty in their own tables.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Faults;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Faults;

/// <summary>
/// The caution is its own pane above the tables and never scrolls with them. Breaker rows over their
/// rating are marked "▲ OVER" (and coloured); rows above 90 % are marked "△ near".
/// </summary>
public sealed class FaultView : View
{
    private readonly TextPane caution = new() { CanFocus = false, Content = CautionText(FaultStudy.Caution) };
    private readonly TextPane heading = new() { CanFocus = false, Content = "No fault study yet (F7)." };
    private readonly TableView levels = ResultsView.ResultTable(FaultTables.LevelHeaders);
    private readonly TableView breakers = ResultsView.ResultTable(FaultTables.BreakerHeaders);
    private FaultResult? result;

    public FaultView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        caution.Height = Dim.Func(_ => TextPane.Wrap(caution.Content, Math.Max(1, Viewport.Width)).Count);
        heading.Y = Pos.Bottom(caution);
        heading.Height = Dim.Func(_ => Math.Min(2, TextPane.Wrap(heading.Content, Math.Max(1, Viewport.Width)).Count));
        levels.Y = Pos.Bottom(heading);
        levels.Height = Dim.Func(_ => Math.Max(3, (Viewport.Height - caution.Frame.Height - heading.Frame.Height) * 3 / 5));
        breakers.Y = Pos.Bottom(levels);
        breakers.Height = Dim.Fill();
        Add(caution, heading, levels, breakers);
        breakers.Style.RowColorGetter = args => BreakerScheme(args.RowIndex);
    }

    public FaultResult? Result
    {
        get => result;
        set
        {
            result = value;
            caution.Content = CautionText(value?.Caution ?? FaultStudy.Caution);
            heading.Content = value is null ? "No fault study yet (F7)." : FaultTables.Heading(value);
            levels.Table = value is null ? TextTableSource.Empty(FaultTables.LevelHeaders) : FaultTables.Levels(value);
            breakers.Table = value is null ? TextTableSource.Empty(FaultTables.BreakerHeaders) : FaultTables.Breakers(value);
            levels.Update();
            breakers.Update();
            SetNeedsLayout();
        }
    }

    private static string CautionText(string caution) => "Caution: " + caution;

    private Scheme? BreakerScheme(int row)
    {
        if (result is null || row < 0 || row >= result.Breakers.Count) return null;
        DutyStatus s = result.Breakers[row].Status;
        if (s is not (DutyStatus.Over or DutyStatus.Warning)) return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(s == DutyStatus.Over
            ? new Attr(ColorName16.White, ColorName16.Red)
            : new Attr(ColorName16.BrightYellow, normal.Background));
    }
}
