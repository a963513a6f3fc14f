// What a tap study is asked: which transformer, which buses to watch, which band, which scenarios.
using Study.Core.Model;

namespace Study.Core.Studies;

/// <summary>The transformer whose tap is studied, the buses to watch, the band and the scenarios, and whether other taps are held.</summary>
public sealed record TapStudyRequest
{
    public required string TransformerId { get; init; }

    /// <summary>Buses whose voltage must stay in band; empty means the buses the transformer feeds at its lv voltage.</summary>
    public IReadOnlyList<string> WatchBuses { get; init; } = [];

    /// <summary>The band, pu; null means each watched bus's own vMin..vMax.</summary>
    public (double Low, double High)? Band { get; init; }

    /// <summary>Scenario names to solve; empty means every scenario of the network (the loads as entered when it has none); a null name is the loads as entered.</summary>
    public IReadOnlyList<string?> Scenarios { get; init; } = [];

    /// <summary>Hold every other on-load tap at its file position instead of letting it regulate.</summary>
    public bool HoldOtherTaps { get; init; }

    /// <summary>Checks what can be checked without the network: the band (the same words in every front end).</summary>
    /// <exception cref="InputException">The band is empty, not finite, or not in per unit.</exception>
    public void Validate()
    {
        if (Band is not { } band) return;
        string shown = $"{Show(band.Low)}..{Show(band.High)}";
        if (!double.IsFinite(band.Low) || !double.IsFinite(band.High))
            throw new InputException($"the band {shown} must be two finite numbers in per unit, e.g. 0.97..1.03");
        if (!(band.Low < band.High))
            throw new InputException($"the band {shown} is empty: give the low limit below the high limit, e.g. 0.97..1.03");
        if (band.Low <= 0 || band.High > 2)
            throw new InputException($"the band {shown} is not in per unit: give limits around 1, e.g. 0.97..1.03");
    }

    private static string Show(double v) => v.ToString("0.####", System.Globalization.CultureInfo.InvariantCulture);
}
