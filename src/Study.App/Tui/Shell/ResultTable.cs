// A read-only table of text cells that sorts by any column and keeps its arrow keys to itself.
using System.Globalization;
using System.Text.RegularExpressions;
using Study.App.Reports;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace Study.App.Tui.Shell;

/// <summary>
/// Every table of the screen: element lists and study results. Rows are addressed by their index in
/// the <see cref="Source"/> (the result's own order) whatever order they are shown in, so row colours,
/// the selected element and Enter keep meaning the same row after a sort. Arrow keys at an edge of the
/// table stay in it: focus moves between panes with Tab only.
/// </summary>
public sealed partial class ResultTable : TableView
{
    private TextTableSource source = TextTableSource.Empty();
    private int[] order = [];
    private int naturalWidth;
    private bool scrollPending;
    private int fittedWidth = -1;

    public ResultTable(params string[] headers)
    {
        Width = Dim.Fill();
        Height = Dim.Fill();
        FullRowSelect = true;
        Style.ShowHorizontalHeaderOverline = false;
        Style.ShowHorizontalBottomLine = false;
        // The headings stay on the first row when the rows scroll: a column of numbers means nothing without its unit.
        Style.AlwaysShowHeaders = true;
        Style.RowColorGetter = args => args.RowIndex >= 0 && args.RowIndex < order.Length ? RowScheme?.Invoke(order[args.RowIndex]) : null;
        Source = TextTableSource.Empty(headers);
    }

    /// <summary>The rows in their own order; setting it keeps the sort and the selected row (by index) where it can.</summary>
    public TextTableSource Source
    {
        get => source;
        set
        {
            int? keep = SelectedRow;
            source = value;
            if (SortColumn is int c && c >= source.Columns) SortColumn = null;
            Rebuild(keep);
        }
    }

    /// <summary>The colour of a row, by its index in <see cref="Source"/>; null for the normal colour.</summary>
    public Func<int, Scheme?>? RowScheme { get; set; }

    /// <summary>The column the rows are sorted by; null: the source's own order.</summary>
    public int? SortColumn { get; private set; }

    public bool Descending { get; private set; }

    /// <summary>The selected row as an index in <see cref="Source"/>; null when the table is empty.</summary>
    public int? SelectedRow
    {
        get
        {
            int shown = Value?.SelectedCell.Y ?? -1;
            return shown >= 0 && shown < order.Length ? order[shown] : null;
        }
        set
        {
            if (value is not int row) return;
            int shown = Array.IndexOf(order, row);
            if (shown < 0) return;
            SetSelection(Math.Max(0, Value?.SelectedCell.X ?? 0), shown, false);
            // Before the first layout there is no viewport to scroll in: the layout scrolls to it then.
            if (Viewport.Width > 0 && Viewport.Height > 0) EnsureCursorIsVisible();
            else scrollPending = true;
            SetNeedsDraw();
        }
    }

    /// <summary>Sorts by <paramref name="column"/>; the same column again reverses the order; null goes back to the source's order.</summary>
    public void SortBy(int? column)
    {
        int? keep = SelectedRow;
        if (column is null || column < 0 || column >= source.Columns) (SortColumn, Descending) = (null, false);
        else if (SortColumn == column) Descending = !Descending;
        else (SortColumn, Descending) = (column, false);
        Rebuild(keep);
    }

    /// <summary>
    /// The order of the source's rows sorted by one column: by the leading number where cells start with
    /// one (so 10 comes after 9, "−3.2" before "1"), else by text; blank and "—" cells last either way;
    /// equal cells keep the source's order.
    /// </summary>
    public static int[] Order(IReadOnlyList<string[]> cells, int column, bool descending)
    {
        var keys = cells.Select(r => SortKey(r[column])).ToArray();
        int Compare(int a, int b)
        {
            (bool blankA, double? na, string ta) = keys[a];
            (bool blankB, double? nb, string tb) = keys[b];
            if (blankA != blankB) return blankA ? 1 : -1;
            int c = na is double x && nb is double y ? x.CompareTo(y)
                : na is not null ? -1 : nb is not null ? 1
                : string.Compare(ta, tb, StringComparison.OrdinalIgnoreCase);
            if (descending) c = -c;
            return c != 0 ? c : a.CompareTo(b);
        }
        var rows = Enumerable.Range(0, cells.Count).ToArray();
        Array.Sort(rows, Compare);
        return rows;
    }

    private static (bool Blank, double? Number, string Text) SortKey(string cell)
    {
        string t = cell.Trim();
        if (t.Length == 0 || t == Numbers.Blank) return (true, null, "");
        Match m = LeadingNumber().Match(t.Replace('−', '-'));
        return m.Success && double.TryParse(m.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double v)
            ? (false, t == "∞" ? double.PositiveInfinity : v, t)
            : (false, t == "∞" ? double.PositiveInfinity : null, t);
    }

    [GeneratedRegex(@"^[+-]?\d+(\.\d+)?")]
    private static partial Regex LeadingNumber();

    private void Rebuild(int? keep)
    {
        order = SortColumn is int c ? Order(source.FullCells, c, Descending) : Enumerable.Range(0, source.Rows).ToArray();
        IReadOnlyList<string[]> cells = SortColumn is null ? source.RowCells : order.Select(i => source.FullCells[i]).ToList();
        string[] headers = source.ColumnNames.Select((h, i) => i == SortColumn ? h + (Descending ? " ↓" : " ↑") : h).ToArray();
        naturalWidth = NaturalWidth(headers, cells);
        FitLastColumn();
        Table = new TextTableSource(headers, cells);
        if (source.Rows > 0)
        {
            int shown = keep is int k && k < source.Rows ? Array.IndexOf(order, k) : 0;
            SetSelection(Math.Clamp(Value?.SelectedCell.X ?? 0, 0, Math.Max(0, source.Columns - 1)), Math.Max(0, shown), false);
        }
        Update();
    }

    /// <summary>Columns at the width of their widest cell, with one separator each: what the table needs to show whole.</summary>
    public static int NaturalWidth(IReadOnlyList<string> headers, IReadOnlyList<string[]> cells)
    {
        int width = 1;
        for (int c = 0; c < headers.Count; c++)
            width += 1 + Math.Max(headers[c].Length, cells.Count == 0 ? 0 : cells.Max(r => c < r.Length ? r[c].Length : 0));
        return width;
    }

    /// <summary>
    /// A table narrower than the view keeps its last column at its own width instead of stretching it
    /// across a wide screen; a wider one fills the view and scrolls (asking the last column not to
    /// expand then squeezes every column to its header).
    /// </summary>
    private bool FitLastColumn()
    {
        bool expand = naturalWidth > Viewport.Width;
        if (Style.ExpandLastColumn == expand) return false;
        Style.ExpandLastColumn = expand;
        return true;
    }

    protected override void OnViewportChanged(DrawEventArgs e)
    {
        base.OnViewportChanged(e);
        if (Viewport.Width <= 0 || Viewport.Height <= 0) return;
        if (Viewport.Width != fittedWidth)
        {
            fittedWidth = Viewport.Width;
            if (FitLastColumn()) Update();
        }
        if (scrollPending)
        {
            scrollPending = false;
            EnsureCursorIsVisible();
        }
    }

    /// <summary>Arrows and paging at an edge are the table's own: they never move focus to another pane.</summary>
    protected override bool OnKeyDownNotHandled(Key key) =>
        key == Key.CursorLeft || key == Key.CursorRight || key == Key.CursorUp || key == Key.CursorDown
        || key == Key.PageUp || key == Key.PageDown || key == Key.Home || key == Key.End
        || base.OnKeyDownNotHandled(key);
}
