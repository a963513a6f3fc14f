// The Outages tab: one heading line per scenario, then the ranked outages of every scenario.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Outages;

/// <summary>Shows what <see cref="OutageTables"/> lays out; rows that lose load or do not converge are coloured as well as worded.</summary>
public sealed class OutageView : View
{
    private readonly TextPane heading = new() { CanFocus = false, Content = OutageTables.NotYet };
    private readonly TableView table = ResultsView.ResultTable(OutageTables.Headers);
    private IReadOnlyList<OutageCase> cases = [];
    private OutageScreeningResult? result;

    public OutageView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        heading.Height = Dim.Func(_ => Math.Min(4, TextPane.Wrap(heading.Content, Math.Max(1, Viewport.Width)).Count));
        table.Y = Pos.Bottom(heading);
        table.Height = Dim.Fill();
        Add(heading, table);
        table.Style.RowColorGetter = args => RowScheme(args.RowIndex);
    }

    public OutageScreeningResult? Result
    {
        get => result;
        set
        {
            result = value;
            cases = value is null ? [] : OutageTables.Cases(value);
            heading.Content = value is null ? OutageTables.NotYet : OutageTables.Heading(value);
            table.Table = value is null ? TextTableSource.Empty(OutageTables.Headers) : OutageTables.Outages(value);
            table.Update();
            SetNeedsLayout();
        }
    }

    private Scheme? RowScheme(int row)
    {
        if (row < 0 || row >= cases.Count) return null;
        OutageTier tier = OutageTiers.Of(cases[row]);
        if (tier is OutageTier.Secure) return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(tier is OutageTier.Stressed
            ? new Attr(ColorName16.BrightYellow, normal.Background)
            : new Attr(ColorName16.White, ColorName16.Red));
    }
}
