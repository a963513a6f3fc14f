// What a tap study is asked: which transformer, which buses to watch, which band, which scenarios.
using Study.Core.Model;

namespace Study.Core.Studies;

public sealed record TapStudyRequest
{
    public required string TransformerId { get; init; }

    /// <summary>Buses whose voltage must stay in band; empty means the buses the transformer feeds at its lv voltage.</summary>
    public IReadOnlyList<string> WatchBuses { get; init; } = [];

    /// <summary>The band, pu; null means each watched bus's own vMin..vMax.</summary>
    public (double Low, double High)? Band { get; init; }

    /// <summary>Scenarios to solve; empty means "loads as entered" (one case).</summary>
    public IReadOnlyList<Scenario> Scenarios { get; init; } = [];

    /// <summary>Hold every other on-load tap at its file position instead of letting it regulate.</summary>
    public bool HoldOtherTaps { get; init; }
}
