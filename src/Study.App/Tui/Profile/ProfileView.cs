// The Profile tab: the findings, the charts of watched voltages and tap positions against time, and the tables.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Studies;
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Profile;

/// <summary>
/// On a wide screen (from <see cref="WideFrom"/> columns) the tables (energy, transformers, buses) stand
/// on the left and the two charts on the right; on a narrow one the charts stand above the tables and take
/// seven tenths of the rows, the tables the rest (Tab walks them; F9 sorts). The voltage chart takes two
/// thirds of the chart rows, the tap chart the rest.
/// </summary>
public sealed class ProfileView : View
{
    public const int WideFrom = 120;
    private readonly TextPane heading = new() { CanFocus = false, Content = ProfileTables.NotYet };
    private readonly View charts = new() { CanFocus = true };
    private readonly TimeChartView voltages = new();
    private readonly TextPane voltageLegend = new() { CanFocus = false };
    private readonly TimeChartView taps = new();
    private readonly TextPane tapLegend = new() { CanFocus = false };
    private readonly View tables = new() { CanFocus = true };
    private readonly ResultTable energy = new(ProfileTables.EnergyHeaders);
    private readonly ResultTable transformers = new(ProfileTables.TransformerHeaders);
    private readonly ResultTable buses = new(ProfileColumns.Buses.Headings);
    private ProfileResult? result;

    public ProfileView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        heading.Height = Dim.Func(_ => Math.Min(Math.Max(2, Viewport.Height / 6), Wrapped(heading, Viewport.Width)));

        tables.X = 0;
        tables.Y = Pos.Func(_ => Wide ? heading.Frame.Height : charts.Frame.Bottom);
        tables.Width = Dim.Func(_ => Wide ? Viewport.Width / 2 : Viewport.Width);
        tables.Height = Dim.Fill();
        energy.Height = Dim.Func(_ => Math.Min(EnergyNeed, Math.Max(3, tables.Viewport.Height / 2)));
        transformers.Y = Pos.Bottom(energy);
        transformers.Height = Dim.Func(_ => Math.Min(FocusSplit.Need(transformers), Math.Max(3, tables.Viewport.Height - energy.Frame.Height) / 2 + 1));
        buses.Y = Pos.Bottom(transformers);
        buses.Height = Dim.Fill();
        tables.Add(energy, transformers, buses);

        charts.X = Pos.Func(_ => Wide ? Viewport.Width / 2 + 1 : 0);
        charts.Y = Pos.Bottom(heading);
        charts.Width = Dim.Fill();
        charts.Height = Dim.Func(_ => Wide ? Math.Max(1, Viewport.Height - heading.Frame.Height) : (Viewport.Height - heading.Frame.Height) * 7 / 10);
        voltages.Height = Dim.Func(_ => Math.Max(3, (charts.Viewport.Height - voltageLegend.Frame.Height - tapLegend.Frame.Height) * 2 / 3));
        voltageLegend.Y = Pos.Bottom(voltages);
        voltageLegend.Height = Dim.Func(_ => Wrapped(voltageLegend, charts.Viewport.Width));
        taps.Y = Pos.Bottom(voltageLegend);
        taps.Height = Dim.Fill(Dim.Func(_ => tapLegend.Frame.Height));
        tapLegend.Y = Pos.AnchorEnd();
        tapLegend.Height = Dim.Func(_ => Wrapped(tapLegend, charts.Viewport.Width));
        charts.Add(voltages, voltageLegend, taps, tapLegend);

        Add(heading, tables, charts);
    }

    public ProfileResult? Result => result;

    public ResultTable Energy => energy;

    public TimeChartView VoltageChart => voltages;

    public TimeChartView TapChart => taps;

    /// <summary>Shows a profile result and the CSV it came from; null clears the tab.</summary>
    public void Show(ProfileResult? value, string csv = "")
    {
        result = value;
        heading.Content = value is null ? ProfileTables.NotYet : ProfileTables.Heading(value, csv);
        energy.Source = value is null ? TextTableSource.Empty(ProfileTables.EnergyHeaders) : ProfileTables.Energy(value);
        transformers.Source = value is null ? TextTableSource.Empty(ProfileTables.TransformerHeaders) : ProfileTables.Transformers(value);
        buses.Source = value is null ? TextTableSource.Empty(ProfileColumns.Buses.Headings) : ProfileTables.Buses(value);
        TimeChart? v = value is null ? null : TimeChart.Voltages(value), t = value is null ? null : TimeChart.Taps(value);
        voltages.Chart = v;
        taps.Chart = t;
        voltageLegend.Content = v?.Legend("pu, low and high per interval") ?? "";
        tapLegend.Content = t?.Legend("tap position") ?? "";
        SetNeedsLayout();
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        heading.CanFocus = Wrapped(heading, Viewport.Width) > heading.Frame.Height;
        base.OnSubViewsLaidOut(args);
    }

    private bool Wide => Viewport.Width >= WideFrom;

    private int EnergyNeed => FocusSplit.Need(energy);

    private static int Wrapped(TextPane pane, int width) =>
        pane.Content.Length == 0 ? 0 : TextPane.Wrap(pane.Content, Math.Max(1, width)).Count;
}
