// The Faults tab: the caution fixed at the top, the notes in full, then fault levels and breaker duty.
using Study.App.Reports;
using Study.App.Tui.Shell;
using Study.Core.Faults;
using Study.Core.Model;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;
using Attr = Terminal.Gui.Drawing.Attribute;

namespace Study.App.Tui.Faults;

/// <summary>
/// The caution is its own pane above everything and never scrolls. Under it the heading says how the
/// faults were calculated and gives every note and missing datum in full (it scrolls when long). The
/// levels (with the breaking and thermal currents) and every check of every breaker share the rest, the focused table taking two thirds. Breaker rows over
/// their rating are marked "▲ OVER" (and coloured); rows above 90 % "△ near".
/// </summary>
public sealed class FaultView : View
{
    private const string NotYet = "No fault study yet: F7 asks where and which faults.";
    private readonly TextPane caution = new() { CanFocus = false, Content = CautionText(FaultStudy.Caution) };
    private readonly TextPane heading = new() { CanFocus = false, Content = NotYet };
    private readonly ResultTable levels = new(FaultTables.LevelHeaders);
    private readonly ResultTable breakers = new(FaultTables.BreakerHeaders);
    private FaultResult? result;
    private IReadOnlyList<DutyCheck> checks = [];

    public FaultView()
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        caution.Height = Dim.Func(_ => Wrapped(caution));
        heading.Y = Pos.Bottom(caution);
        heading.Height = Dim.Func(_ => Math.Min(HeadingRows, Wrapped(heading)));
        levels.Y = Pos.Bottom(heading);
        Add(caution, heading, levels, breakers);
        FocusSplit.Stack(this, levels, breakers, () => Viewport.Height - caution.Frame.Height - heading.Frame.Height);
        breakers.RowScheme = BreakerScheme;
    }

    /// <summary>Rows the heading may take before it scrolls: a third of the tab, at least two.</summary>
    private int HeadingRows => Math.Max(2, Viewport.Height / 3);

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
        heading.Content = value is null ? NotYet : FaultTables.Heading(value, network);
        levels.Source = value is null ? TextTableSource.Empty(FaultTables.LevelHeaders) : FaultTables.Levels(value);
        breakers.Source = value is null ? TextTableSource.Empty(FaultTables.BreakerHeaders) : FaultTables.Breakers(value);
        SetNeedsLayout();
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        heading.CanFocus = Wrapped(heading) > heading.Frame.Height;
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
