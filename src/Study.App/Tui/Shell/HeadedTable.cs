// A few lines of heading (wrapped, scrolled when long) over a result table that takes the rest of the rows.
using Terminal.Gui.ViewBase;

namespace Study.App.Tui.Shell;

/// <summary>
/// The layout of most result tabs: what the result says in words, then its table. The heading takes
/// the rows its text needs up to <see cref="MaxHeadingRows"/> and scrolls beyond that (it takes focus
/// then), so a note is never cut; the table gets every other row.
/// </summary>
public sealed class HeadedTable : View
{
    private readonly TextPane heading = new() { CanFocus = false };

    public HeadedTable(params string[] headers)
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        CanFocus = true;
        Table = new ResultTable(headers);
        heading.Height = Dim.Func(_ => Math.Min(MaxHeadingRows, HeadingRows));
        Table.Y = Pos.Bottom(heading);
        Add(heading, Table);
    }

    public ResultTable Table { get; }

    public int MaxHeadingRows { get; set; } = 4;

    private int HeadingRows => heading.Content.Length == 0 ? 0 : TextPane.Wrap(heading.Content, Math.Max(1, Viewport.Width)).Count;

    public string Heading
    {
        get => heading.Content;
        set
        {
            heading.Content = value;
            SetNeedsLayout();
        }
    }

    protected override void OnSubViewsLaidOut(LayoutEventArgs args)
    {
        // A heading longer than its rows scrolls: it joins the Tab order so arrows can read the rest.
        heading.CanFocus = HeadingRows > heading.Frame.Height;
        base.OnSubViewsLaidOut(args);
    }
}
