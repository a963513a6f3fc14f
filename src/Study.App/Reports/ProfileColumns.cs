// The columns of the profile-study result records: buses, transformers, the energy balance and the steps.
using Study.Core.Studies;

namespace Study.App.Reports;

/// <summary>One line of the energy balance: what it is and how many MWh.</summary>
public sealed record EnergyRow(string Quantity, double Mwh);

/// <summary>One step of the profile with its values, for steps.csv.</summary>
public sealed record ProfileStepRow(int Step, ProfileSeries Series)
{
    public DateTimeOffset? Time => Series.Times[Step];
}

public static class ProfileColumns
{
    public static ColumnSpec<ProfileBus> Buses { get; } = new ColumnSpec<ProfileBus>()
        .Text("id", "bus", b => b.Id)
        .Number("vMinPu", "lowest V", "pu", b => b.VMinPu, 4, mark: b => b.VMinPu < b.BandLowPu ? Marks.Low : " ")
        .Number("vMaxPu", "highest V", "pu", b => b.VMaxPu, 4, mark: b => b.VMaxPu > b.BandHighPu ? Marks.High : " ")
        .Shown("band pu", b => $"{Numbers.Fixed(b.BandLowPu, 2)}–{Numbers.Fixed(b.BandHighPu, 2)}", Align.Right)
        .Number("hoursOutside", "hours outside band", "h", b => b.HoursOutside, 2);

    public static ColumnSpec<ProfileTransformer> Transformers { get; } = new ColumnSpec<ProfileTransformer>()
        .Text("id", "transformer", t => t.Id)
        .Words("onLoad", "changer", t => t.OnLoad, t => t.OnLoad ? "on-load" : "fixed")
        .Integer("tapOperations", "tap operations", null, t => t.TapOperations)
        .Words("positionsUsed", "positions used", t => string.Join(' ', t.PositionsUsed),
            t => t.PositionsUsed.Count == 0 ? "" : string.Join(", ", t.PositionsUsed.Select(Labels.Position)))
        .Number("peakPctOfRating", "peak % of rating", null, t => t.PeakPctOfRating, 1, mark: t => t.PeakPctOfRating > 100 ? " " + Marks.High : "")
        .Number("loadLossMwh", "load loss", "MWh", t => t.LoadLossMwh, 2)
        .Number("noLoadLossMwh", "no-load loss", "MWh", t => t.NoLoadLossMwh, 2)
        .Number("lossMwh", "loss", "MWh", t => t.LossMwh, 2);

    public static ColumnSpec<EnergyRow> Energy { get; } = new ColumnSpec<EnergyRow>()
        .Text("quantity", "energy", e => e.Quantity)
        .Number("mwh", "", "MWh", e => e.Mwh, 2);

    public static IReadOnlyList<EnergyRow> EnergyRows(ProfileEnergy e) =>
    [
        new("delivered by supplies", e.DeliveredMwh), new("generated", e.GeneratedMwh), new("consumed by loads and shunts", e.ConsumedMwh),
        new("lost", e.LossMwh), new("  load (I²R) loss", e.LoadLossMwh), new("  no-load loss", e.NoLoadLossMwh),
    ];

    /// <summary>Every step: its time, length, whether it converged, the loss, the watched voltages and the tap positions.</summary>
    public static ColumnSpec<ProfileStepRow> Steps(ProfileSeries s)
    {
        var spec = new ColumnSpec<ProfileStepRow>()
            .Integer("step", "step", null, r => r.Step + 1)
            .Words("time", "time", r => r.Time?.UtcDateTime.ToString("yyyy-MM-ddTHH:mm:ssZ", System.Globalization.CultureInfo.InvariantCulture),
                r => r.Time?.UtcDateTime.ToString("yyyy-MM-dd HH:mm", System.Globalization.CultureInfo.InvariantCulture) ?? Numbers.Blank)
            .Number("hours", "hours", "h", r => s.Hours[r.Step], 4)
            .CsvOnly("converged", r => s.Converged[r.Step])
            .Number("lossMw", "loss", "MW", r => Finite(s.LossMw[r.Step]), 3);
        for (int w = 0; w < s.WatchedBuses.Count; w++)
        {
            int bus = w;
            spec.Number($"{s.WatchedBuses[w]}.vPu", s.WatchedBuses[w], "pu", r => Finite(s.Voltages[r.Step][bus]), 4);
        }
        for (int t = 0; t < s.Taps.Count; t++)
        {
            int tap = t;
            spec.Integer($"{s.Taps[t]}.position", s.Taps[t], null, r => s.Positions[r.Step][tap]);
        }
        return spec;
    }

    public static IEnumerable<ProfileStepRow> StepRows(ProfileSeries s) => Enumerable.Range(0, s.Hours.Count).Select(i => new ProfileStepRow(i, s));

    private static double? Finite(double v) => double.IsFinite(v) ? v : null;
}
