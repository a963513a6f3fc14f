// The Start tab: the caution fixed at the top, the finding, then the started motors and every bus before and during.
using Study.App.Tui.Shell;
using Study.Core.Faults;
using Study.Core.Studies;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Start;

/// <summary>
/// Laid out like the Faults tab: the caution never scrolls, the heading takes the rows its text needs
/// (a third of the tab at most), and the motors and buses share the rest, the focused table taking two
/// thirds. A motor below its minimum is worded "▼ BELOW" and drawn white on red.
/// </summary>
public sealed class StartView : View
{
    private readonly TextPane caution = new() { CanFocus = false, Content = "Caution: " + FaultStudy.Caution };
    private readonly TextPane heading = new() { CanFocus = false, Content = StartTables.NotYet };
    private readonly ResultTable motors = new(StartTables.MotorHeaders);
    private readonly ResultTable buses = new(StartTables.BusHeaders);
    private MotorStartResult? result;

    public StartView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        caution.Height = Dim.Func(_ => Wrapped(caution));
        heading.Y = Pos.Bottom(caution);
        heading.Height = Dim.Func(_ => Math.Min(Math.Max(2, Viewport.Height / 3), Wrapped(heading)));
        motors.Y = Pos.Bottom(heading);
        Add(caution, heading, motors, buses);
        FocusSplit.Stack(this, motors, buses, () => Viewport.Height - caution.Frame.Height - heading.Frame.Height);
        motors.RowScheme = MotorScheme;
    }

    public ResultTable Motors => motors;

    public ResultTable Buses => buses;

    public MotorStartResult? Result
    {
        get => result;
        set
        {
            result = value;
            caution.Content = "Caution: " + (value?.Caution ?? FaultStudy.Caution);
            heading.Content = value is null ? StartTables.NotYet : StartTables.Heading(value);
            motors.Source = value is null ? Study.App.Reports.TextTableSource.Empty(StartTables.MotorHeaders) : StartTables.Motors(value);
            buses.Source = value is null ? Study.App.Reports.TextTableSource.Empty(StartTables.BusHeaders) : StartTables.Buses(value);
            SetNeedsLayout();
        }
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        heading.CanFocus = Wrapped(heading) > heading.Frame.Height;
        base.OnSubViewsLaidOut(args);
    }

    private int Wrapped(TextPane pane) => TextPane.Wrap(pane.Content, Math.Max(1, Viewport.Width)).Count;

    private Scheme? MotorScheme(int row)
    {
        if (result is null || row < 0 || row >= result.Started.Count || result.Started[row].Ok) return null;
        return new Scheme(new Attr(ColorName16.White, ColorName16.Red));
    }
}
