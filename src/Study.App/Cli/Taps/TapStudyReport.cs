// The report of `study taps`: the finding, a table per position and scenario, and a text chart.
using System.Text;
using Study.App.Cli.Solve;
using Study.App.Reports;
using Study.Core.LoadFlow;
using Study.Core.Model;
using Study.Core.Studies;
using static Study.App.Reports.Numbers;

namespace Study.App.Cli.Taps;

public static class TapStudyReport
{
    private const int ChartWidth = 48;

    public static ReportDocument Build(string path, Network network, TapStudyResult r, LoadFlowOptions? options = null)
    {
        var doc = new ReportDocument($"Tap study: transformer {r.Transformer} in {LoadFlowReport.Title(network, path)}");
        string band = r.Band is { } b ? $"{Fixed(b.Low, 3)}–{Fixed(b.High, 3)} pu" : "each bus's vMin–vMax";
        string scenarios = r.Scenarios.Count == 1 && r.Scenarios[0] is null ? "as entered" : "scenarios " + string.Join(", ", r.Scenarios);
        LoadFlowReport.AddInputs(doc, path, network, scenarios, options ?? LoadFlowOptions.Default);
        doc.Input("transformer", $"{r.Transformer}, positions {r.Min}..{r.Max} at {Fixed(r.StepPercent, 2)} % a step");
        doc.Input("watched buses", string.Join(", ", r.WatchBuses));
        doc.Input("band", band);
        doc.Text($"positions {r.Min}..{r.Max} at {Fixed(r.StepPercent, 2)} % a step (file position {r.FilePosition}); "
               + $"watching {string.Join(", ", r.WatchBuses)}; band {band}; {scenarios}");
        doc.SpacedText($"Finding: {r.Finding}");
        if (r.Notes.Count > 0) doc.List(r.Notes.Select(n => "note: " + n));
        if (r.Recommended.Count > 0) doc.Table(TapStudyColumns.Recommended, TapStudyColumns.Ranked(r), spaceBefore: true);
        doc.Heading("Every position (▼ below the band, ▲ above)").Table(TapStudyColumns.Points(r), r.Points);
        return doc.Add(new ReportFigure(Chart(r)) { SpaceBefore = true });
    }

    /// <summary>
    /// Watched voltages against position: one row per position, the spread of watched voltages in
    /// each scenario drawn as a run of that scenario's digit, band edges as '|'.
    /// </summary>
    public static string Chart(TapStudyResult r)
    {
        var converged = r.Points.Where(p => p.Converged && p.Watched.Count > 0).ToList();
        if (converged.Count == 0) return "";
        double low = r.Band?.Low ?? converged.SelectMany(p => p.Watched).Min(w => w.LowPu);
        double high = r.Band?.High ?? converged.SelectMany(p => p.Watched).Max(w => w.HighPu);
        double vMin = Math.Min(low, converged.Min(p => p.Watched.Min(w => w.VPu)));
        double vMax = Math.Max(high, converged.Max(p => p.Watched.Max(w => w.VPu)));
        double pad = (vMax - vMin) * 0.05 + 1e-4;
        vMin -= pad;
        vMax += pad;
        int Column(double v) => Math.Clamp((int)Math.Round((v - vMin) / (vMax - vMin) * (ChartWidth - 1)), 0, ChartWidth - 1);
        var scenarios = r.Scenarios.Select(s => s ?? "as entered").ToList();
        var sb = new StringBuilder();
        sb.Append("Watched voltage against position (pu); ");
        sb.Append(string.Join(", ", scenarios.Select((s, i) => $"{i + 1} = {s}")));
        sb.Append($"; | = band {Fixed(low, 3)}–{Fixed(high, 3)}\n");
        string axis = $"{Fixed(vMin, 3)}".PadRight(ChartWidth / 2) + $"{Fixed(vMax, 3)}".PadLeft(ChartWidth - ChartWidth / 2);
        sb.Append("  position  ").Append(axis).Append('\n');
        foreach (int position in r.Points.Select(p => p.Position).Distinct())
        {
            char[] row = Enumerable.Repeat(' ', ChartWidth).ToArray();
            row[Column(low)] = '|';
            row[Column(high)] = '|';
            for (int s = 0; s < r.Scenarios.Count; s++)
            {
                TapStudyPoint? p = converged.FirstOrDefault(x => x.Position == position && x.Scenario == r.Scenarios[s]);
                if (p is null) continue;
                int a = Column(p.Watched.Min(w => w.VPu)), b = Column(p.Watched.Max(w => w.VPu));
                for (int c = a; c <= b; c++) row[c] = (char)('1' + s % 9);
            }
            sb.Append($"  {position,8}  ").Append(new string(row).TrimEnd()).Append('\n');
        }
        return sb.ToString();
    }
}
