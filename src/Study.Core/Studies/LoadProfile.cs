// A load profile over time: for each step its duration and the scale of every load (or of all loads at once).
namespace Study.Core.Studies;

/// <summary>One row of a profile: the time it starts (when the file gives one), how long it holds, and the scales.</summary>
/// <param name="Scales">One scale for every load (a single "scale" column), or one per entry of <see cref="LoadProfile.LoadIds"/>.</param>
public sealed record ProfileStep(DateTimeOffset? Time, double Hours, IReadOnlyList<double> Scales);

/// <summary>
/// The steps of a profile in time order. With <see cref="LoadIds"/> null every load takes the step's one
/// scale; otherwise the named loads take their own column and every other load keeps scale 1. A scale
/// multiplies the load's P and Q on top of the scenario's load scale.
/// </summary>
public sealed record LoadProfile
{
    public required IReadOnlyList<ProfileStep> Steps { get; init; }

    /// <summary>The loads the columns name, in column order; null for a single "scale" column.</summary>
    public IReadOnlyList<string>? LoadIds { get; init; }

    /// <summary>The 1-based character column of each load id in the header row, for messages.</summary>
    public IReadOnlyList<int>? LoadColumns { get; init; }

    /// <summary>The file it was read from, for messages and reports.</summary>
    public string? Source { get; init; }

    /// <summary>The whole duration, hours.</summary>
    public double Hours => Steps.Sum(s => s.Hours);
}
