// What the fault dialog asks: fault kinds, method, level and where, and the engine request they make.
using Study.Core.Faults;
using Study.Core.Units;

namespace Study.App.Tui.Faults;

/// <summary>The fault question before it is asked; defaults are the engine's (IEC 60909 maximum, 3ph and slg).</summary>
public sealed class FaultForm(string? selectedBus)
{
    public static IReadOnlyList<FaultKind> AllKinds { get; } =
        [FaultKind.ThreePhase, FaultKind.LineToEarth, FaultKind.LineToLine, FaultKind.LineLineToEarth];

    public HashSet<FaultKind> Kinds { get; } = [.. FaultRequest.Default.Kinds];
    public FaultMethod Method { get; set; } = FaultRequest.Default.Method;
    public FaultLevel Level { get; set; } = FaultRequest.Default.Level;

    /// <summary>The bus under the cursor when the dialog opened; null when no bus is selected.</summary>
    public string? SelectedBus { get; } = selectedBus;

    /// <summary>True (the default): every bus; false: <see cref="SelectedBus"/> only, when the user asks for it.</summary>
    public bool AllBuses { get; set; } = true;

    /// <summary>t_min in seconds as typed, for I_b and i_DC at breakers without their own opening time; blank: the engine's 0.1 s.</summary>
    public string TMinText { get; set; } = "";

    /// <summary>T_k in seconds as typed, the fault duration for I_th; blank: the engine's 1 s.</summary>
    public string DurationText { get; set; } = "";

    public static string KindLabel(FaultKind kind) => kind switch
    {
        FaultKind.ThreePhase => "3ph  three-phase",
        FaultKind.LineToEarth => "slg  line to earth",
        FaultKind.LineToLine => "ll   line to line",
        _ => "dlg  two lines to earth",
    };

    public (FaultRequest? Request, string? Error) Build()
    {
        if (Kinds.Count == 0) return (null, "choose at least one fault kind");
        if (!AllBuses && SelectedBus is null) return (null, "no bus is selected: choose all buses, or select a bus in the Buses list first");
        if (!Seconds(TMinText, FaultRequest.Default.TMinS, out double tMin)) return (null, "t_min is in seconds, e.g. 0.1");
        if (!Seconds(DurationText, FaultRequest.Default.DurationS, out double tk)) return (null, "T_k is in seconds, e.g. 1");
        var request = new FaultRequest
        {
            Kinds = AllKinds.Where(Kinds.Contains).ToList(),
            Method = Method,
            Level = Level,
            Buses = AllBuses ? null : [SelectedBus!],
            TMinS = tMin,
            DurationS = tk,
        };
        try
        {
            request.Validate();
        }
        catch (Study.Core.Model.InputException e)
        {
            return (null, e.Message);
        }
        return (request, null);
    }

    private static bool Seconds(string text, double blank, out double value)
    {
        value = blank;
        return text.Trim().Length == 0
            || double.TryParse(text.Trim(), System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
    }
}
