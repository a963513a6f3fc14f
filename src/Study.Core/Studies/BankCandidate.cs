// A candidate bank for the choice study: the nameplate, losses and price a maker quotes.
using System.Diagnostics.CodeAnalysis;
using System.Text.Json.Serialization;
using Study.Core.Model;

namespace Study.Core.Studies;

/// <summary>
/// One bank a maker offers in place of the studied transformer. What it does not give (voltages, vector
/// group, earthing) it takes from the transformer it replaces. Losses are the guaranteed figures: no-load
/// loss in <see cref="NoLoad"/>, load loss <see cref="LoadLossKw"/> at rated current, per unit of the bank.
/// </summary>
public sealed record BankCandidate
{
    public BankCandidate() { }

    /// <summary>Used when reading a file: absent keys take the defaults stated here.</summary>
    [JsonConstructor, SetsRequiredMembers]
    internal BankCandidate(string id, int units = 1)
    {
        Id = id;
        Units = units;
    }

    public required string Id { get; init; }

    /// <summary>A line of description for reports ("ONAN, copper windings").</summary>
    public string? Description { get; init; }

    /// <summary>Rated power of one unit, MVA.</summary>
    public double Mva { get; init; }

    /// <summary>Identical units in parallel.</summary>
    public int Units { get; init; } = 1;

    public double ZPercent { get; init; }

    /// <summary>X/R of the short-circuit impedance; when absent it follows from the load loss: R = Pk / S_r.</summary>
    public double? Xr { get; init; }

    public TapChanger? Tap { get; init; }
    public NoLoadLoss? NoLoad { get; init; }

    /// <summary>Load loss at rated current of one unit, kW (guaranteed).</summary>
    public double LoadLossKw { get; init; }

    /// <summary>Purchase price, in the money of the loss rates.</summary>
    public double Price { get; init; }
}

/// <summary>The candidates file: the banks offered, and the transformer they replace when the file says so.</summary>
public sealed record BankCandidates
{
    public BankCandidates() { }

    [JsonConstructor, SetsRequiredMembers]
    internal BankCandidates(string format = FormatName, int version = 1, IReadOnlyList<BankCandidate>? candidates = null)
    {
        Format = format;
        Version = version;
        Candidates = candidates ?? [];
    }

    public const string FormatName = "study-candidates";

    public string Format { get; init; } = FormatName;
    public int Version { get; init; } = 1;

    /// <summary>The transformer the candidates replace; when given, it must match the study's.</summary>
    public string? Transformer { get; init; }

    public IReadOnlyList<BankCandidate> Candidates { get; init; } = [];

    /// <summary>Where each candidate starts in its file, for messages (not read from the file).</summary>
    [JsonIgnore]
    public IReadOnlyDictionary<string, int> Lines { get; init; } = new Dictionary<string, int>();

    [JsonIgnore]
    public string? Source { get; init; }
}
