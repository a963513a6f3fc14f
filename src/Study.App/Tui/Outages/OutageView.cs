// The Outages tab: one heading line per scenario and the legend, then the ranked outages of every scenario.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Outages;

/// <summary>
/// Shows what <see cref="OutageTables"/> lays out; rows that lose load or have no solution are coloured
/// as well as worded. Enter on a row raises <see cref="Opened"/> with that outage.
/// </summary>
public sealed class OutageView : View
{
    private readonly HeadedTable body = new(OutageTables.Headers) { MaxHeadingRows = 4 };
    private IReadOnlyList<OutageCase> cases = [];
    private OutageScreeningResult? result;

    public OutageView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        body.Heading = OutageTables.NotYet;
        Add(body);
        body.Table.RowScheme = RowScheme;
        body.Table.Accepted += (_, _) =>
        {
            if (body.Table.SelectedRow is int row && row < cases.Count) Opened?.Invoke(cases[row]);
        };
    }

    /// <summary>Enter on an outage row.</summary>
    public event Action<OutageCase>? Opened;

    public ResultTable Table => body.Table;

    public OutageScreeningResult? Result
    {
        get => result;
        set
        {
            result = value;
            cases = value is null ? [] : OutageTables.Cases(value);
            body.Heading = value is null ? OutageTables.NotYet : OutageTables.Heading(value);
            body.Table.Source = value is null ? TextTableSource.Empty(OutageTables.Headers) : OutageTables.Outages(value);
        }
    }

    private Scheme? RowScheme(int row)
    {
        if (row < 0 || row >= cases.Count) return null;
        OutageTier tier = OutageTiers.Of(cases[row]);
        if (tier is OutageTier.Secure) return null;
        Attr normal = GetAttributeForRole(VisualRole.Normal);
        return new Scheme(tier is OutageTier.LimitsBroken
            ? new Attr(ColorName16.BrightYellow, normal.Background)
            : new Attr(ColorName16.White, ColorName16.Red));
    }
}
